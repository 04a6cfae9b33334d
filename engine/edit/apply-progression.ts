/**
 * Pitch-side feedback on a station: too easy steps the area one step harder, too hard one step
 * easier (the direction per activity comes from the rule set), within the rule's bounds.
 */
import type { Plan, RuleSetDocument, StationVerdict } from '../../shared/types';
import { checkPlan } from '../check-plan';
import { compileRuleSet } from '../club-rules/compile-rule-set';
import { describeArea } from '../planning/areas';
import { defaultRuleSet } from '../rule-sets';
import { stepArea } from './area-step';
import type { EditOutcome } from './edit-outcome';
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
  const phase = plan.phases[phaseIndex];
  const station = phase?.stations.find((s) => s.id === stationId);
  if (!phase || !station) throw new RangeError(`No station ${stationId} in phase ${phaseIndex}`);
  const ruleId = `progression.${station.activityKind}`;
  const unchanged = (effect: string, refused: string | null): EditOutcome => ({
    plan: { ...plan, trace: [...plan.trace, { ruleId, fired: false, effect }] },
    refused,
  });
  if (verdict === 'right')
    return unchanged(`${station.title}: about right, area stays ${describeArea(station.area)}`, null);
  const smallerIsHarder = params.kinds[station.activityKind].harderWhenArea === 'smaller';
  const size = (verdict === 'too-easy') === smallerIsHarder ? 'smaller' : 'larger';
  const step = stepArea(plan, phaseIndex, stationId, size, ruleSet);
  if (!step.ok) return unchanged(`${station.title}: ${words(verdict)}. ${step.reason}`, step.reason);
  const phases = plan.phases.map((p, i) => (i === phaseIndex ? { ...p, stations: step.stations } : p));
  const refreshed = refreshPlan(plan, phases, params);
  const result = {
    ...refreshed,
    trace: [
      ...plan.trace,
      {
        ruleId,
        fired: true,
        effect: `${station.title} ${words(verdict)}: area ${describeArea(step.from)} → ${describeArea(step.to)}`,
      },
    ],
  };
  return {
    plan: {
      ...result,
      warnings: [
        ...result.warnings,
        ...checkPlan(result, ruleSet).map((c) => ({ ...c, code: `check:${c.code}` })),
      ],
    },
    refused: null,
  };
}

function words(verdict: StationVerdict): string {
  return verdict === 'too-easy' ? 'too easy' : verdict === 'too-hard' ? 'too hard' : 'about right';
}
