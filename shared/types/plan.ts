/** The timed plan Conewise proposes. Produced by engine/, stored by server/, drawn by src/. */
import type { Equipment, PlanRequest } from './plan-request';

export const ACTIVITY_KINDS = [
  'ball-mastery',
  'passing-finishing',
  'keep-ball',
  'pairs',
  'small-sided-game',
  'movement-prep',
] as const;
export type ActivityKind = (typeof ACTIVITY_KINDS)[number];

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
  goalkeeper?: string[];
  /** Order in which players take turns or swap roles. */
  rotation?: string[];
}

export interface GoalPlacement extends Point {
  /** Which way the goal mouth faces, in degrees: 0 = along +y. */
  facing: number;
  kind: 'goal' | 'gate';
}

export interface Station {
  id: string;
  activityId: string;
  activityKind: ActivityKind;
  /** A short name of our own for the activity, shown on cards. */
  title: string;
  playerIds: string[];
  /** 1 when an adult joins the group to make numbers work. */
  coachJoins: 0 | 1;
  roles: StationRoles;
  area: Area;
  /** Metres from the space's origin corner to the station's nearest corner. */
  position: Point;
  equipment: Equipment;
  /** Cone positions in metres, in the space's coordinates. */
  conePositions: Point[];
  /** Goals or cone gates in the space's coordinates. */
  goalPositions?: GoalPlacement[];
  progressions: { easier: string[]; harder: string[] };
  coachingPoints: string[];
  /** What the players do, in a sentence or two. */
  description: string;
  /** Players beyond the activity's active slots (at most one by the club's rule). */
  waiting?: number;
}

export interface Phase {
  name: string;
  activityId: string;
  startMinute: number;
  endMinute: number;
  stations: Station[];
  /** Relative intensity 1 (gentle) … 5 (match pace). */
  intensity?: number;
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
