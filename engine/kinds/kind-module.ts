/**
 * What one activity kind owns: its set-ups, who plays which role or side, the targets and
 * markings it needs, where everyone starts, its balls and bibs, who waits, and how its touches
 * are counted. One file per kind implements this; `registry.ts` holds them.
 */
import type {
  ActivityDefinition,
  AgeBand,
  Level,
  PositionRole,
  PresentPlayer,
  RuleParameters,
  Station,
  StationKind,
  StationRoles,
} from '../../shared/types';
import type { SizeRule } from '../planning/size-rule';

/** A set-up a kind can draw; activities name one in `layout`. */
export interface KindLayout {
  id: string;
  /** A coach's words for it, for the library and the club's activity form. */
  label: string;
}

/** The targets a set-up needs at the station's ends (goals where the bag has them, else gates). */
export interface TargetSpec {
  /** 0: none; 1: at the far end; 2: one at each end. */
  ends: 0 | 1 | 2;
  /** Optional targets (a breakout gate) come after every other station's markings. */
  optional?: boolean;
  /** Goalkeepers may stand in these goals (two ends: one keeper each or none). */
  keepers: boolean;
}

/** One group about to become a station. */
export interface GroupInput {
  activity: ActivityDefinition;
  layout: string;
  /** The group in order; goalkeepers who are in goal here are listed in `keepers`. */
  players: PresentPlayer[];
  /** Who is in goal here (already checked: a real goal stands at each keeper's end). */
  keepers: string[];
  coachJoins: 0 | 1;
  params: RuleParameters;
  level: Level;
  band: AgeBand;
}

export interface RoleOutcome {
  roles: StationRoles;
  /** The numbers in a coach's shorthand: "4v1", "3v3 + keepers". */
  format: string;
  /** Coaching points that follow from the roles (added after the activity's own). */
  points?: string[];
}

/** Station-local metres: `u` across (0…across), `v` along towards the far end (0…along). */
export interface LocalPoint {
  u: number;
  v: number;
}

export interface LocalPosition extends LocalPoint {
  id: string;
  role: PositionRole;
}

export interface LocalZone extends LocalPoint {
  /** Across and along sizes. */
  across: number;
  along: number;
  label: string;
}

/** A gate the set-up itself needs (beyond its end targets), as its centre on an edge. */
export interface LocalGate extends LocalPoint {
  /** The edge the gate sits on, which fixes which way it faces. */
  edge: 'far' | 'near' | 'left' | 'right';
}

/** Everything a kind draws for one station, in local metres. */
export interface Drawing {
  /** Cones the activity cannot run without (start cones, lane ends, a triangle). */
  essential: LocalPoint[];
  /** The area's outline (corners), all or none. */
  outline: LocalPoint[];
  /** Nice to have (extra gates in a ball-mastery grid). */
  extra: LocalPoint[];
  /** Gates of two cones the set-up needs besides its end targets. */
  gates?: LocalGate[];
  zones?: LocalZone[];
  lines?: { from: LocalPoint; to: LocalPoint; label?: string }[];
  positions: LocalPosition[];
  /** What to mark the area with when the bag runs out of cones. */
}

/** The frame a station is drawn in: its size across and along. */
export interface FrameSize {
  across: number;
  along: number;
}

export interface BallNeed {
  /** Balls for nobody to wait for one. */
  needed: number;
  /** Extra balls that keep it flowing (after every station has what it needs). */
  spare: number;
}

export interface KindModule {
  readonly kind: StationKind;
  readonly layouts: readonly KindLayout[];
  /** Goalkeepers face shots here when they are in goal (they warm up as goalkeepers first). */
  readonly facesShots: boolean;
  targets(layout: string): TargetSpec;
  /**
   * Group sizes the kind allows for an activity (the club's table and the activity's range);
   * null when they do not meet.
   */
  sizes(params: RuleParameters, level: Level, band: AgeBand, activity: ActivityDefinition): SizeRule | null;
  roles(input: GroupInput): RoleOutcome;
  balls(activity: ActivityDefinition, station: Pick<Station, 'playerIds' | 'coachJoins' | 'roles'>): BallNeed;
  bibs(station: Pick<Station, 'roles'>): number;
  /** Players who cannot be active at once, given the balls the station has. */
  waiting(station: Station, activity: ActivityDefinition): number;
  draw(frame: FrameSize, station: Station, layout: string): Drawing;
}
