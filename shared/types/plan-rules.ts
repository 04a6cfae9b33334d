/**
 * The club rule set: plain JSON the server stores per club and version, the lead edits,
 * and the engine compiles. Parameter tables plus json-rules-engine rules.
 */
import type { ActivityKind, StationKind } from './plan';
import type { AgeGroup, Focus, Level, PlanKind } from './plan-request';

export const AGE_BANDS = ['U6-U8', 'U9-U10', 'U11-U12', 'U13-U14', 'U15-adult'] as const;
export type AgeBand = (typeof AGE_BANDS)[number];

export interface GroupSize {
  min: number;
  preferred: number;
  max: number;
}

export interface KeepBallFormat {
  attackers: number;
  defenders: number;
}

export interface KeepBallLevel {
  /** Allowed formats, most preferred first. */
  formats: KeepBallFormat[];
  maxAttackersPerDefender: number;
}

/** Side lengths (m) for a reference group size; scaled with the square root of group size. */
export interface AreaSize {
  width: number;
  length: number;
  forPlayers: number;
  /** Bounds on the width (the across side); length keeps the table's proportion. */
  minWidth: number;
  maxWidth: number;
  /** Metres the width changes per progression step. */
  step: number;
}

/** The part of a session a slot fills; a training theme re-fills `technical` and `opposed`. */
export const SLOT_ROLES = [
  'movement',
  'arrival',
  'duel',
  'passing',
  'finishing',
  'possession',
  'technical',
  'opposed',
  'game',
  'finish',
  'cool-down',
] as const;
export type SlotRole = (typeof SLOT_ROLES)[number];

/** One part of a session's shape: which kinds can fill it, its share of the time, what goes first. */
export interface SessionSlot {
  role: SlotRole;
  name: string;
  /** Kinds that can fill the slot, most preferred first. */
  kinds: StationKind[];
  /** Relative share of the minutes. */
  share: number;
  /** Lower numbers are kept first when time is short. */
  priority: number;
  /** A cap on the slot's minutes (the rest goes to slots without one). */
  maxMinutes?: number;
}

/** What a training theme puts in the technical and opposed parts of a session. */
export interface ThemeKinds {
  technical: StationKind[];
  opposed: StationKind[];
}

/** The small-sided format for an age band: players per side, goalkeepers included. */
export interface GameFormat {
  maxPerSide: number;
  minPerSide: number;
  /** Whether games at this age have goalkeepers (US Soccer 2016: none in 4v4). */
  goalkeepers: boolean;
}

/** Children per adult, for players up to an age. */
export interface SupervisionRatio {
  upToAge: number;
  childrenPerAdult: number;
}

export const BALL_USES = ['each', 'pair', 'group', 'none'] as const;
/** How an activity uses balls: one each, one per pair, a few per group, or none. */
export type BallUse = (typeof BALL_USES)[number];

export interface ActivityDefinition {
  id: string;
  kind: StationKind;
  title: string;
  /** One line for menus and the library. */
  summary: string;
  /** What the players do, in a sentence or two. */
  description: string;
  coachingPoints: string[];
  /** Ways to make it easier, in a coach's words. */
  easier: string[];
  /** Ways to make it harder. */
  harder: string[];
  /** The age groups it suits, youngest and oldest. */
  ages: { from: AgeGroup; to: AgeGroup };
  levels: Level[];
  /** Focuses this activity serves; preferred when the request names them. */
  focus: Focus[];
  /** 1 gentle … 5 match pace; phases are ordered by it. */
  intensity: number;
  balls: BallUse;
  /** Whether sides wear bibs. */
  bibs?: boolean;
  /** One of the kind's set-ups (its first when absent), drawn by the kind's module. */
  layout?: string;
  /** Players in one group (station), within the club's group sizes for the kind. */
  players: { min: number; max: number };
  /** Set on activities a club added itself. */
  origin?: 'club';
  /** A retired activity is kept for old plans but never chosen or offered. */
  retired?: boolean;
}

export interface KindRules {
  /** Which way the area moves to make the activity harder. */
  harderWhenArea: 'smaller' | 'larger';
  /** Kinds tried, in order, when this one cannot be played. */
  substitutes: StationKind[];
  /** Whether groups of this kind may be rotated to a different side for layout. */
  rotatable: boolean;
}

export interface TouchRate {
  /** Estimated touches per player per minute with a ball to hand. */
  perMinute: number;
  /** Share of the minutes a player is on the ball or in play. */
  activeShare: number;
  /** Touches per minute for players in other roles (a goalkeeper handles, a defender presses). */
  byRole?: { goalkeeper?: number; defender?: number; server?: number };
}

export interface RuleParameters {
  ageGroups: Record<AgeGroup, { index: number; band: AgeBand; allowedKinds: ActivityKind[] }>;
  groupSizes: Record<StationKind, Record<Level, GroupSize>>;
  keepBall: Record<Level, KeepBallLevel>;
  /**
   * Keep-ball needs room (square metres per player, the shortest side); from an age every group
   * plays the two-defender formats of the advanced level (5v2, 6v2).
   */
  keepBallLimits: { minM2PerPlayer: number; minSideM: number; twoDefendersFromAge: number };
  areas: Record<StationKind, Record<AgeBand, AreaSize>>;
  /** Multiplier on area sides by level (beginners get more room). */
  areaLevelScale: Record<Level, number>;
  sessionShapes: Record<PlanKind, Record<AgeBand, SessionSlot[]>>;
  themes: Record<Focus, ThemeKinds>;
  gameFormats: Record<AgeBand, GameFormat>;
  timing: {
    minPhaseMinutes: number;
    /** Longest stretch without a drinks break. */
    drinksEveryMinutes: number;
    /** The same at or above the heat threshold. */
    heatDrinksEveryMinutes: number;
    drinksMinutes: number;
    /** How quickly one adult puts out or lifts cones, and moves a goal. */
    conesPerMinute: number;
    goalMovesPerMinute: number;
  };
  kinds: Record<StationKind, KindRules>;
  touchRates: Record<StationKind, TouchRate>;
  touchTarget: { active: boolean; minPerPlayer: number; maxPerPlayer: number; fromMinutes: number };
  cautions: { heatC: number; coldC: number };
  /** The most intense activity chosen (the heat rule lowers it). */
  intensity: { max: number };
  supervision: { ratios: SupervisionRatio[]; minAdults: number; stationsPerAdult: number; source: string };
  layout: { bufferM: number; shotClearanceM: number; gateWidthM: number };
  allocation: { coachPenalty: number; fallbackStationPenalty: number };
  /** How strongly the planner avoids activities the team used lately (0 = not at all). */
  variety: { recentPenalty: number };
  /** Share multiplier per kind when a focus rule fires (1 = as the shape says). */
  focusBoost: Record<StationKind, number>;
  activities: ActivityDefinition[];
}

export type RuleCondition =
  | { all: RuleCondition[] }
  | { any: RuleCondition[] }
  | { not: RuleCondition }
  | { fact: string; operator: string; value: unknown; path?: string };

export type RuleEvent =
  | { type: 'set-parameter'; params: { path: string; value: unknown; effect: string } }
  | { type: 'forbid-activity'; params: { kind?: ActivityKind; activityId?: string; reason: string } }
  | { type: 'require-activity'; params: { kind: StationKind; reason: string } }
  | { type: 'warning'; params: { code: string; message: string } }
  | { type: 'caution'; params: { code: string; message: string; source?: string } }
  | {
      type: 'progression-step';
      params: { kind: StationKind; direction: 'harder' | 'easier' | 'keep'; reason: string };
    };

export interface ClubRule {
  id: string;
  description: string;
  conditions: { all: RuleCondition[] } | { any: RuleCondition[] };
  event: RuleEvent;
}

export interface RuleSetDocument {
  id: string;
  version: number;
  name: string;
  parameters: RuleParameters;
  rules: ClubRule[];
}
