/**
 * Pitch-side feedback on a station: too easy steps the area one step harder, too hard one step
 * easier (the direction per activity comes from the rule set), within the rule's bounds.
 */
import type { Plan, RuleSetDocument, StationVerdict } from '../../shared/types';
import { checkPlan } from '../check-plan';
import { compileRuleSet } from '../club-rules/compile-rule-set';
import { insideSpace, overlaps, rectOf } from '../geometry';
import { describeArea } from '../planning/areas';
import { packStations } from '../planning/layout';
import { steppedArea } from '../planning/progressions';
import { defaultRuleSet } from '../rule-sets';
import { refreshPlan } from './rebuild';

export function applyProgression(
  plan: Plan,
  phaseIndex: number,
  stationId: string,
  verdict: StationVerdict,
  ruleSet: RuleSetDocument = defaultRuleSet,
): Plan {
  const params = compileRuleSet(ruleSet).document.parameters;
  const phase = plan.phases[phaseIndex];
  const station = phase?.stations.find((s) => s.id === stationId);
  if (!phase || !station) throw new RangeError(`No station ${stationId} in phase ${phaseIndex}`);
  const band = params.ageGroups[plan.request.ageGroup].band;
  const ruleId = `progression.${station.activityKind}`;
  const unchanged = (effect: string): Plan => ({
    ...plan,
    trace: [...plan.trace, { ruleId, fired: false, effect }],
  });
  if (verdict === 'right')
    return unchanged(`${station.title}: about right, area stays ${describeArea(station.area)}`);
  const direction = verdict === 'too-easy' ? 'harder' : 'easier';
  const total = station.playerIds.length + station.coachJoins;
  const next = steppedArea(
    params,
    station.activityKind,
    band,
    station.area,
    direction,
    plan.request.space,
    total,
  );
  if (!next) {
    return unchanged(
      `${station.title}: ${words(verdict)}, but the area is already at the club's limit (${describeArea(station.area)})`,
    );
  }
  let stations = phase.stations.map((s) => (s.id === stationId ? { ...s, area: next } : s));
  const rects = stations.map((s) => rectOf(s.position, s.area));
  const index = stations.findIndex((s) => s.id === stationId);
  const clash =
    !insideSpace(rects[index], plan.request.space) ||
    rects.some((r, j) => j !== index && overlaps(r, rects[index]));
  if (clash) {
    const placed = packStations(
      stations.map((s) => s.area),
      plan.request.space,
      params.layout.bufferM,
      stations.map((s) => params.kinds[s.activityKind].rotatable),
    );
    if (!placed) {
      return unchanged(
        `${station.title}: ${words(verdict)}, but a ${describeArea(next)} area does not fit beside the other stations`,
      );
    }
    stations = stations.map((s, i) => ({ ...s, area: placed[i].area, position: placed[i].position }));
  }
  const phases = plan.phases.map((p, i) => (i === phaseIndex ? { ...p, stations } : p));
  const refreshed = refreshPlan(plan, phases, params);
  const result = {
    ...refreshed,
    trace: [
      ...plan.trace,
      {
        ruleId,
        fired: true,
        effect: `${station.title} ${words(verdict)}: area ${describeArea(station.area)} → ${describeArea(next)}`,
      },
    ],
  };
  return {
    ...result,
    warnings: [
      ...result.warnings,
      ...checkPlan(result, ruleSet).map((c) => ({ ...c, code: `check:${c.code}` })),
    ],
  };
}

function words(verdict: StationVerdict): string {
  return verdict === 'too-easy' ? 'too easy' : verdict === 'too-hard' ? 'too hard' : 'about right';
}
