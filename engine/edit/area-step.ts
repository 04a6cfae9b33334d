/**
 * One step of a station's area, larger or smaller: the new area and layout, or the reason in a
 * coach's words why it cannot step. The coach's resize, pitch-side "too easy / too hard" and the
 * plan page's limits on its buttons all ask this one function, so they never disagree.
 */
import type { Area, Plan, RuleParameters, RuleSetDocument, Station, StationKind } from '../../shared/types';
import { compileRuleSet } from '../club-rules/compile-rule-set';
import { insideSpace, rectOf, roomBetween } from '../geometry';
import { boundedTable } from '../planning/areas';
import { packStations } from '../planning/layout';
import { steppedArea, widthSide } from '../planning/progressions';
import { defaultRuleSet } from '../rule-sets';
import { editWords } from './edit-words';
import { stationAt } from './plan-context';

export type AreaSize = 'larger' | 'smaller';

/** The step that makes a kind's activity harder or easier: the rule set says which size is harder. */
export function sizeFor(params: RuleParameters, kind: StationKind, direction: 'harder' | 'easier'): AreaSize {
  const harder = params.kinds[kind].harderWhenArea;
  return direction === 'harder' ? harder : harder === 'smaller' ? 'larger' : 'smaller';
}

/** The stepped phase's stations (the stepped one first to change), or why the area stays. */
export type AreaStep =
  | { ok: true; from: Area; to: Area; stations: Station[] }
  | { ok: false; reason: string };

/** Whether the area can step `size`, and the phase's stations after it (re-packed when needed). */
export function stepArea(
  plan: Plan,
  phaseIndex: number,
  stationId: string,
  size: AreaSize,
  ruleSet: RuleSetDocument = defaultRuleSet,
): AreaStep {
  const params = compileRuleSet(ruleSet).document.parameters;
  const station = stationAt(plan, phaseIndex, stationId);
  const phase = plan.phases[phaseIndex];
  const band = params.ageGroups[plan.request.ageGroup].band;
  const kind = station.activityKind;
  const direction = size === sizeFor(params, kind, 'harder') ? 'harder' : 'easier';
  const total = station.playerIds.length + station.coachJoins;
  const space = plan.request.space;
  const next = steppedArea(params, kind, band, station.area, direction, space, total);
  if (!next) {
    const table = boundedTable(params, kind, band, total);
    const side = widthSide(station.area);
    const byRules = size === 'larger' ? side >= table.maxWidth : side <= table.minWidth;
    return {
      ok: false,
      reason: editWords.areaLimit(size, byRules ? 'rules' : 'space', station.area),
    };
  }
  let stations = phase.stations.map((s) => (s.id === stationId ? { ...s, area: next } : s));
  const rects = stations.map((s) => rectOf(s.position, s.area));
  const index = stations.findIndex((s) => s.id === stationId);
  const clash =
    !insideSpace(rects[index], space) ||
    rects.some((r, j) => j !== index && !roomBetween(r, rects[index], params.layout.bufferM));
  if (clash) {
    const placed = packStations(
      stations.map((s) => s.area),
      space,
      params.layout.bufferM,
      stations.map((s) => params.kinds[s.activityKind].rotatable),
    );
    if (!placed) return { ok: false, reason: editWords.areaNoRoom(next) };
    stations = stations.map((s, i) => ({ ...s, area: placed[i].area, position: placed[i].position }));
  }
  return { ok: true, from: station.area, to: next, stations };
}

/** Why each station's area cannot step larger or smaller (null where it can), by "phase:station". */
export type AreaLimits = Record<string, Record<AreaSize, string | null>>;

/** The limits the plan page shows on its area buttons, from the same steps the edit takes. */
export function areaLimits(plan: Plan, ruleSet: RuleSetDocument = defaultRuleSet): AreaLimits {
  const limits: AreaLimits = {};
  plan.phases.forEach((phase, phaseIndex) => {
    for (const station of phase.stations) {
      const why = (size: AreaSize) => {
        const step = stepArea(plan, phaseIndex, station.id, size, ruleSet);
        return step.ok ? null : step.reason;
      };
      limits[`${phaseIndex}:${station.id}`] = { larger: why('larger'), smaller: why('smaller') };
    }
  });
  return limits;
}
