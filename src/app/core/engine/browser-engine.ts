import { Injectable } from '@angular/core';
import type {
  ActivityKind,
  Notice,
  Plan,
  PlayerMove,
  RuleSetDocument,
  StationVerdict,
} from '../../../../shared/types';
import type { PlanEdit, RosterChange } from '../../../../shared/types/plan-edit';

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

/** Why each station's area cannot step larger or smaller (null where it can), by "phase:station". */
export type AreaLimits = Partial<Record<string, Record<'larger' | 'smaller', string | null>>>;

/**
 * What the plan page and pitch-side need from the engine, running in the browser. `rules` is the
 * rule set the plan was made with (the club's); null means the engine's own, used until the club's
 * arrive.
 */
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
  /** The rest of the session re-planned for a late arrival or an early leaver, and who moves. */
  replan(
    plan: Plan,
    change: RosterChange,
    rules: RuleSetDocument | null,
  ): Promise<{ plan: Plan; moves: PlayerMove[] }>;
  /** A station stepped easier or harder, or the same plan and why it cannot step, in a coach's words. */
  progression(
    plan: Plan,
    phaseIndex: number,
    stationId: string,
    verdict: StationVerdict,
    rules: RuleSetDocument | null,
  ): { plan: Plan; refused: string | null };
  /** Players who came and went home early, from the plan's roster changes. */
  leftEarlyIds(plan: Plan): Set<string>;
}

/**
 * Loads the engine on first use, so it stays out of the initial bundle; the plan page re-checks
 * each edit with it at once, before the server saves it, and pitch-side re-plans and steps stations
 * with it, offline too.
 */
@Injectable({ providedIn: 'root' })
export class BrowserEngine {
  private loading: Promise<BrowserEngineApi> | null = null;

  /** The engine; a failed load (no network, not cached yet) is tried again on the next call. */
  load(): Promise<BrowserEngineApi> {
    this.loading ??= import('./engine-adapter')
      .then((m) => m.createEngineAdapter())
      .catch((error: unknown) => {
        this.loading = null;
        throw error;
      });
    return this.loading;
  }
}
