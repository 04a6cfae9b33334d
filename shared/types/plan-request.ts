/** What a coach tells Conewise before a session: who is here, the kit, the space and the time. */

export const AGE_GROUPS = [
  'U6',
  'U7',
  'U8',
  'U9',
  'U10',
  'U11',
  'U12',
  'U13',
  'U14',
  'U15',
  'U16',
  'U17',
  'U18',
  'adult',
] as const;
export type AgeGroup = (typeof AGE_GROUPS)[number];

export const LEVELS = ['beginner', 'intermediate', 'advanced'] as const;
export type Level = (typeof LEVELS)[number];

export const PLAN_KINDS = ['match-warm-up', 'training'] as const;
export type PlanKind = (typeof PLAN_KINDS)[number];

/** What a session works on; a training session takes the first as its theme. */
export const FOCUSES = [
  'passing',
  'receiving',
  'dribbling',
  '1v1',
  'finishing',
  'pressing',
  'possession',
  'transition',
  'goalkeeping',
  'speed',
] as const;
export type Focus = (typeof FOCUSES)[number];

export interface PresentPlayer {
  id: string;
  name?: string;
  goalkeeper?: boolean;
}

export interface Equipment {
  balls: number;
  cones: number;
  bibs: number;
  /** Small or pop-up goals. */
  goals: number;
}

/** Metres of grass the coach may use: width across, length along. */
export interface Space {
  width: number;
  length: number;
}

/** How a station went last time, fed back into the next plan of the same team. */
export interface FeedbackFact {
  activityKind: string;
  /** The activity the verdict was given on: it steers that activity only (absent: the whole kind). */
  activityId?: string;
  verdict: 'too-easy' | 'right' | 'too-hard';
  /** Area side the station ran with, in metres, when known. */
  areaWidth?: number;
  areaLength?: number;
  /** How many were in that group (players plus a coach who joined), when known. */
  groupSize?: number;
}

export interface PlanRequest {
  ageGroup: AgeGroup;
  level: Level;
  players: PresentPlayer[];
  coaches: number;
  equipment: Equipment;
  space: Space;
  minutes: number;
  kind: PlanKind;
  focus?: Focus[];
  conditions?: { temperatureC?: number };
  /** The team's recent station feedback, newest first. */
  recentFeedback?: FeedbackFact[];
  /** Activities the team used lately, newest first: others are preferred where they fit. */
  recentActivityIds?: string[];
  /** Activities the coach wants in this plan: used wherever they fit. */
  pinnedActivityIds?: string[];
  seed?: string;
}
