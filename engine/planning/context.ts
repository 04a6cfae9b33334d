/** Everything one plan build needs, computed once per request. */
import type {
  AgeBand,
  Focus,
  ForbiddenActivity,
  Notice,
  PlanRequest,
  PresentPlayer,
  RuleParameters,
  Supervision,
  TraceEntry,
} from '../../shared/types';
import type { Rng } from '../random';
import type { RuleOutcome } from '../club-rules/evaluate-rules';

export interface BuildContext {
  request: PlanRequest;
  params: RuleParameters;
  band: AgeBand;
  forbidden: ForbiddenActivity[];
  outcome: RuleOutcome;
  rng: Rng;
  warnings: Notice[];
  trace: TraceEntry[];
  supervision: Supervision;
  /** Players who may go in goal today (flagged, the age plays with keepers, a goal in the bag). */
  keepers: PresentPlayer[];
  /** At or below the club's cold threshold: nobody waits. */
  cold: boolean;
  /** At or above the heat threshold: drinks breaks and lower intensity. */
  hot: boolean;
  /** Focuses that steer the choice of activities: the theme first, then the request's. */
  focus: Focus[];
  recent: ReadonlySet<string>;
  pinned: ReadonlySet<string>;
}

export function addWarning(
  ctx: { warnings: Notice[] },
  code: string,
  message: string,
  source?: string,
): void {
  if (!ctx.warnings.some((w) => w.code === code && w.message === message))
    ctx.warnings.push(source ? { code, message, source } : { code, message });
}
