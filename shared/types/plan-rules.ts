/**
 * The club rule set: plain JSON the server stores per club and version, the lead edits,
 * and the engine compiles. Parameter tables plus json-rules-engine rules.
 */
import type { ActivityKind } from './plan';
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

export interface PhaseTemplateEntry {
  kind: ActivityKind;
  name: string;
  /** Relative share of the minutes. */
  share: number;
  /** Lower numbers are kept first when time is short. */
  priority: number;
}

export interface ActivityDefinition {
  id: string;
  kind: ActivityKind;
  title: string;
  description: string;
  coachingPoints: string[];
  /** 1 gentle … 5 match pace; phases are ordered by it. */
  intensity: number;
  /** Focuses this activity serves; preferred when the request names them. */
  focus: Focus[];
}

export interface KindRules {
  /** Players who can be busy at once; more than this wait. */
  activeSlots: number;
  ballsPerPlayer: number;
  minBallsPerStation: number;
  /** 'none' | 'one' needs a goal or gate | 'two' one at each end | 'breakout' optional gate. */
  goals: 'none' | 'one' | 'two' | 'breakout';
  /** Which way the area moves to make the activity harder. */
  harderWhenArea: 'smaller' | 'larger';
  /** Kinds tried, in order, when this one cannot be played. */
  substitutes: ActivityKind[];
  /** Whether groups of this kind may be rotated to a different side for layout. */
  rotatable: boolean;
}

export interface TouchRate {
  /** Estimated touches per player per minute with a ball to hand. */
  perMinute: number;
  /** Share of the minutes a player is on the ball or in play. */
  activeShare: number;
}

export interface RuleParameters {
  ageGroups: Record<AgeGroup, { index: number; band: AgeBand; allowedKinds: ActivityKind[] }>;
  groupSizes: Record<ActivityKind, Record<Level, GroupSize>>;
  keepBall: Record<Level, KeepBallLevel>;
  areas: Record<ActivityKind, Record<AgeBand, AreaSize>>;
  /** Multiplier on area sides by level (beginners get more room). */
  areaLevelScale: Record<Level, number>;
  phaseTemplates: Record<PlanKind, Record<AgeBand, PhaseTemplateEntry[]>>;
  timing: { minPhaseMinutes: number };
  kinds: Record<ActivityKind, KindRules>;
  touchRates: Record<ActivityKind, TouchRate>;
  touchTarget: { active: boolean; minPerPlayer: number; maxPerPlayer: number; fromMinutes: number };
  cautions: { heatC: number; coldC: number };
  layout: { bufferM: number; shotClearanceM: number; gateWidthM: number };
  allocation: { coachPenalty: number; fallbackStationPenalty: number };
  /** Share multiplier per kind when a focus rule fires (1 = as the template says). */
  focusBoost: Record<ActivityKind, number>;
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
  | { type: 'require-activity'; params: { kind: ActivityKind; reason: string } }
  | { type: 'warning'; params: { code: string; message: string } }
  | { type: 'caution'; params: { code: string; message: string; source?: string } }
  | {
      type: 'progression-step';
      params: { kind: ActivityKind; direction: 'harder' | 'easier' | 'keep'; reason: string };
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
