/** Everything one plan build needs, computed once per request. */
import type {
  AgeBand,
  ForbiddenActivity,
  Notice,
  PlanRequest,
  RuleParameters,
  TraceEntry,
} from '../../shared/types';
import type { Rng } from '../random';
import type { RuleOutcome } from '../rules/evaluate-rules';

export interface BuildContext {
  request: PlanRequest;
  params: RuleParameters;
  band: AgeBand;
  forbidden: ForbiddenActivity[];
  outcome: RuleOutcome;
  rng: Rng;
  warnings: Notice[];
  trace: TraceEntry[];
}

export function addWarning(ctx: { warnings: Notice[] }, code: string, message: string): void {
  if (!ctx.warnings.some((w) => w.code === code && w.message === message))
    ctx.warnings.push({ code, message });
}
