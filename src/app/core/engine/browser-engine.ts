import { Injectable } from '@angular/core';
import type { ActivityKind, Notice, Plan, RuleSetDocument } from '../../../../shared/types';
import type { PlanEdit } from '../../../../shared/types/plan-edit';

/** An activity of the plan's rules, and whether the coach may swap a phase to it (and why not). */
export interface ActivityOption {
  id: string;
  kind: ActivityKind;
  title: string;
  /** One line for the menu. */
  summary: string;
  allowed: boolean;
  /** Why it cannot be used for this plan, when it cannot. */
  reason?: string;
}

/**
 * What the plan page needs from the engine, running in the browser. `rules` is the rule set the
 * plan was made with (the club's); null means the engine's own, used until the club's arrive.
 */
/** Why each station's area cannot step larger or smaller (null where it can), by "phase:station". */
export type AreaLimits = Partial<Record<string, Record<'larger' | 'smaller', string | null>>>;

export interface BrowserEngineApi {
  /** The edited plan, or the same plan and why the edit cannot be made, in a coach's words. */
  tryEdit(
    plan: Plan,
    edit: PlanEdit,
    rules: RuleSetDocument | null,
  ): Promise<{ plan: Plan; refused: string | null }>;
  /** The limits of each station's area buttons, from the same step the edit takes. */
  areaLimits(plan: Plan, rules: RuleSetDocument | null): AreaLimits;
  /** Problems the edited plan has (empty when it holds every rule). */
  checkPlan(plan: Plan, rules: RuleSetDocument | null): Notice[];
  /** The rules' activities for this plan's players, age, kit and space: allowed or not, and why. */
  activities(plan: Plan, rules: RuleSetDocument | null): ActivityOption[];
}

/**
 * Loads the engine on first use, so it stays out of the initial bundle; the plan page re-checks
 * each edit with it at once, before the server saves it.
 */
@Injectable({ providedIn: 'root' })
export class BrowserEngine {
  private loading: Promise<BrowserEngineApi> | null = null;

  load(): Promise<BrowserEngineApi> {
    this.loading ??= import('./engine-adapter').then((m) => m.createEngineAdapter());
    return this.loading;
  }
}
