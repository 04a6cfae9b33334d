/** The timed plan Conewise proposes. Produced by engine/, stored by server/, drawn by src/. */
import type { Equipment, Focus, PlanRequest } from './plan-request';

/**
 * The plan's `activityKind` contract: what a station (or, for `break`, a whole phase) is. Each
 * kind has one module in `engine/kinds/` that owns its roles, markings, start positions, kit,
 * touches, waiting and area steps.
 */
export const ACTIVITY_KINDS = [
  'ball-mastery',
  'tag-game',
  'duel',
  'receiving-turning',
  'passing-pattern',
  'passing-finishing',
  'shooting-game',
  'keep-ball',
  'directional-possession',
  'transition',
  'small-sided-game',
  'goalkeeping',
  'speed',
  'movement-prep',
  'cool-down',
  'break',
] as const;
export type ActivityKind = (typeof ACTIVITY_KINDS)[number];

/** Kinds played at stations: every kind but the drinks break, which is a phase of its own. */
export type StationKind = Exclude<ActivityKind, 'break'>;
export const STATION_KINDS = ACTIVITY_KINDS.filter((k): k is StationKind => k !== 'break');

/** Game-like kinds: two sides, `roles.teams` set, goalkeepers listed in `roles.goalkeeper`. */
export const GAME_LIKE_KINDS: readonly StationKind[] = [
  'small-sided-game',
  'duel',
  'directional-possession',
  'transition',
];

export interface Point {
  x: number;
  y: number;
}

export interface Area {
  width: number;
  length: number;
}

export interface StationRoles {
  attackers?: string[];
  defenders?: string[];
  /** Who is in goal (only where a real goal stands). */
  goalkeeper?: string[];
  /** The two sides of a game-like station, goalkeepers included: side A wears bibs. */
  teams?: [string[], string[]];
  /** Players who feed the ball (to a goalkeeper, a receiver, a shooter) and rotate in. */
  servers?: string[];
  /** Players who play for whichever side has the ball. */
  neutrals?: string[];
  /** Order in which players take turns or swap roles. */
  rotation?: string[];
}

export interface GoalPlacement extends Point {
  /** Which way the goal mouth faces, in degrees: 0 = along +y. */
  facing: number;
  kind: 'goal' | 'gate';
}

/** A marked zone inside a station (end zone, safe corner, lane), in the space's coordinates. */
export interface Zone extends Point, Area {
  label: string;
}

/** A marked line (start line, halfway), in the space's coordinates. */
export interface MarkedLine {
  from: Point;
  to: Point;
  label?: string;
}

export const POSITION_ROLES = [
  'player',
  'attacker',
  'defender',
  'goalkeeper',
  'team-a',
  'team-b',
  'server',
  'neutral',
  'coach',
] as const;
/** How a start position is drawn: the legend of the plan page and the printed card. */
export type PositionRole = (typeof POSITION_ROLES)[number];

/** Where one player (or a joining coach, id `coach`) stands at the start, in the space's coordinates. */
export interface StartPosition extends Point {
  id: string;
  role: PositionRole;
}

export interface Station {
  id: string;
  activityId: string;
  activityKind: StationKind;
  /** A short name of our own for the activity, shown on cards. */
  title: string;
  playerIds: string[];
  /** 1 when an adult joins the group to make numbers work or to serve a goalkeeper. */
  coachJoins: 0 | 1;
  roles: StationRoles;
  /** The station's numbers in a coach's shorthand: "4v1", "3v3 + keepers", "1v1 in 3 lanes". */
  format?: string;
  area: Area;
  /** Metres from the space's origin corner to the station's nearest corner. */
  position: Point;
  equipment: Equipment;
  /** Cone positions in metres, in the space's coordinates. */
  conePositions: Point[];
  /** Goals or cone gates in the space's coordinates. */
  goalPositions?: GoalPlacement[];
  zones?: Zone[];
  lines?: MarkedLine[];
  /** Where everyone starts; the plan page and the printed card draw these. */
  positions: StartPosition[];
  progressions: { easier: string[]; harder: string[] };
  coachingPoints: string[];
  /** What the players do, in a sentence or two. */
  description: string;
  /** Players who cannot be active at once, given the places and the balls (0 is the aim). */
  waiting?: number;
  /** Things to know for this station on the day: markers to use instead, who plays out and why. */
  notes?: string[];
}

/** Putting out and lifting kit between two phases. */
export interface Changeover {
  conesPlaced: number;
  conesLifted: number;
  goalsMoved: number;
  /** Minutes set aside for it at the start of the phase (0 when done during a drinks break). */
  minutes: number;
}

export interface Phase {
  name: string;
  activityId: string;
  /** The phase's main kind; `break` phases have no stations. */
  activityKind: ActivityKind;
  startMinute: number;
  endMinute: number;
  stations: Station[];
  /** Relative intensity 1 (gentle) … 5 (match pace). */
  intensity?: number;
  /** The part of the session it fills: warm-up, technical, opposed, game, cool-down… */
  slot?: string;
  /** Set-up work before this phase can start. */
  changeover?: Changeover;
}

export interface Notice {
  code: string;
  message: string;
  source?: string;
}

export interface TraceEntry {
  ruleId: string;
  description?: string;
  fired: boolean;
  /** What the rule changed, in words a head of coaching reads. */
  effect?: string;
}

/** Children per adult against the recommended ratio, and the station limit it gives. */
export interface Supervision {
  children: number;
  adults: number;
  /** Adults the ratio calls for; absent for adult teams. */
  recommendedAdults?: number;
  /** The ratio applied, as "1:8". */
  ratio?: string;
  /** Most stations running at once (stations per adult × adults, at least one adult's worth). */
  maxStations: number;
  source?: string;
}

export interface Plan {
  request: PlanRequest;
  phases: Phase[];
  equipmentNeeded: Equipment;
  equipmentAvailable: Equipment;
  /** Estimated touches per player id over the whole plan (an estimate from per-activity rates). */
  touches: Record<string, number>;
  /** Share (0–1) of player-minutes on the ball or in play. */
  activeShare: number;
  warnings: Notice[];
  cautions: Notice[];
  trace: TraceEntry[];
  ruleSet: { id: string; version: number };
  seed: string;
  /** Says that touches and activeShare are estimates from the rule set's per-activity rates. */
  estimateNote?: string;
  /** Activities the club rules ruled out for this request, and why (for the swap menu). */
  forbiddenActivities?: ForbiddenActivity[];
  /** Pitch-side arrivals and departures; phases that ended before a change keep the old roster. */
  rosterChanges?: RosterChangeRecord[];
  /** The training session's theme (its first focus, or one chosen for variety). */
  theme?: Focus;
  supervision?: Supervision;
}

export interface RosterChangeRecord {
  fromMinute: number;
  added: string[];
  removed: string[];
}

export interface ForbiddenActivity {
  kind?: ActivityKind;
  activityId?: string;
  reason: string;
}
