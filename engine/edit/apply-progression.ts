/**
 * Pitch-side feedback on a station: too easy steps the area one step harder, too hard one step
 * easier (the direction per activity comes from the rule set), within the rule's bounds.
 */
import '../../shared/i18n/localize';
import type { Plan, RuleSetDocument, StationVerdict } from '../../shared/types';
import { compileRuleSet } from '../club-rules/compile-rule-set';
import { describeArea } from '../planning/areas';
import { defaultRuleSet } from '../rule-sets';
import { sizeFor, stepArea } from './area-step';
import type { EditOutcome } from './edit-outcome';
import { stationAt } from './plan-context';
import { withChecks } from './plan-checks';
import { refreshPlan } from './rebuild';

export function applyProgression(
  plan: Plan,
  phaseIndex: number,
  stationId: string,
  verdict: StationVerdict,
  ruleSet: RuleSetDocument = defaultRuleSet,
): Plan {
  return progressionOutcome(plan, phaseIndex, stationId, verdict, ruleSet).plan;
}

/** The stepped plan, or the same plan and why its area stays (in a coach's words). */
export function progressionOutcome(
  plan: Plan,
  phaseIndex: number,
  stationId: string,
  verdict: StationVerdict,
  ruleSet: RuleSetDocument = defaultRuleSet,
): EditOutcome {
  const params = compileRuleSet(ruleSet).document.parameters;
  const station = stationAt(plan, phaseIndex, stationId);
  const ruleId = `progression.${station.activityKind}`;
  const unchanged = (effect: string, refused: string | null): EditOutcome => ({
    plan: { ...plan, trace: [...plan.trace, { ruleId, fired: false, effect }] },
    refused,
  });
  if (verdict === 'right')
    return unchanged(
      $localize`:pitch-side feedback, an activity was about right so its area stays, e.g. 20 × 30 m:${station.title}:activity:: about right, area stays ${describeArea(station.area)}:area:`,
      null,
    );
  const size = sizeFor(params, station.activityKind, verdict === 'too-easy' ? 'harder' : 'easier');
  const step = stepArea(plan, phaseIndex, stationId, size, ruleSet);
  if (!step.ok)
    return unchanged(
      verdict === 'too-easy'
        ? $localize`:pitch-side feedback, an activity was too easy but its area cannot change, and why:${station.title}:activity:: too easy. ${step.reason}:reason:`
        : $localize`:pitch-side feedback, an activity was too hard but its area cannot change, and why:${station.title}:activity:: too hard. ${step.reason}:reason:`,
      step.reason,
    );
  const phases = plan.phases.map((p, i) => (i === phaseIndex ? { ...p, stations: step.stations } : p));
  const refreshed = refreshPlan(plan, phases, params);
  const effect = steppedWords(station.title, verdict, describeArea(step.from), describeArea(step.to));
  return {
    plan: withChecks({ ...refreshed, trace: [...plan.trace, { ruleId, fired: true, effect }] }, ruleSet),
    refused: null,
  };
}

/** The trace line of a stepped area: "Rondo square too easy: area 12 × 12 m → 10 × 10 m". */
function steppedWords(title: string, verdict: 'too-easy' | 'too-hard', from: string, to: string): string {
  return verdict === 'too-easy'
    ? $localize`:pitch-side feedback, an activity was too easy so its area changed, e.g. 12 × 12 m → 10 × 10 m:${title}:activity: too easy: area ${from}:areaBefore: → ${to}:areaAfter:`
    : $localize`:pitch-side feedback, an activity was too hard so its area changed, e.g. 10 × 10 m → 12 × 12 m:${title}:activity: too hard: area ${from}:areaBefore: → ${to}:areaAfter:`;
}
