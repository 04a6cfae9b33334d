/**
 * What the club's feedback rules decide for each verdict the team gave, per activity kind.
 * The facts hold one verdict per kind (the newest), so the rules' first run answers for those;
 * when two activities of a kind were judged differently (one too easy, another too hard), the
 * rules run again with the other verdicts, at most twice more, and only their steps are kept.
 */
import type { FeedbackFact, StationKind } from '../../shared/types';
import type { CompiledRuleSet } from './compile-rule-set';
import { evaluateRules, type ProgressionStep } from './evaluate-rules';
import type { Facts } from './facts';

/** Steps by `kind:verdict`. */
export type VerdictSteps = Map<string, ProgressionStep>;

export const verdictKey = (kind: string, verdict: string) => `${kind}:${verdict}`;

export async function stepsByVerdict(
  compiled: CompiledRuleSet,
  facts: Facts,
  feedback: readonly FeedbackFact[] | undefined,
  steps: Partial<Record<StationKind, ProgressionStep>>,
): Promise<VerdictSteps> {
  const out: VerdictSteps = new Map();
  for (const [kind, step] of Object.entries(steps)) {
    const verdict = facts[`feedback:${kind}`];
    if (typeof verdict === 'string' && step) out.set(verdictKey(kind, verdict), step);
  }
  const others = new Map<string, string[]>();
  for (const fb of feedback ?? []) {
    const list = others.get(fb.activityKind) ?? [];
    if (fb.verdict !== facts[`feedback:${fb.activityKind}`] && !list.includes(fb.verdict)) {
      list.push(fb.verdict);
      others.set(fb.activityKind, list);
    }
  }
  for (let round = 0; round < 2; round++) {
    const asked = [...others].filter(([, verdicts]) => verdicts[round]);
    if (!asked.length) break;
    const alternative: Facts = { ...facts };
    for (const [kind, verdicts] of asked) alternative[`feedback:${kind}`] = verdicts[round];
    const outcome = await evaluateRules(compiled, alternative);
    for (const [kind, verdicts] of asked) {
      const step = outcome.steps[kind as StationKind];
      if (step) out.set(verdictKey(kind, verdicts[round]!), step);
    }
  }
  return out;
}
