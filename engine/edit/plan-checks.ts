/**
 * The engine's re-check of an edited plan, kept with the plan as notices: each problem
 * `checkPlan` finds is a warning whose code carries the `check:` prefix, so the next edit can
 * drop the old ones and check again.
 */
import type { Notice, Plan, RuleSetDocument } from '../../shared/types';
import { checkPlan } from '../check-plan';

const CHECK_PREFIX = 'check:';

/** The plan with what `checkPlan` finds in it added to its warnings. */
export function withChecks(plan: Plan, ruleSet: RuleSetDocument): Plan {
  const checks = checkPlan(plan, ruleSet).map((c) => ({ ...c, code: `${CHECK_PREFIX}${c.code}` }));
  return { ...plan, warnings: [...plan.warnings, ...checks] };
}

/** Whether a warning is one `withChecks` added (and the next edit checks again). */
export function isCheckNotice(notice: Notice): boolean {
  return notice.code.startsWith(CHECK_PREFIX);
}
