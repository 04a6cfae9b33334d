/** Recomputes what depends on a plan's stations after an edit: markings, kit, steps, changeovers, totals. */
import type { ActivityDefinition, Notice, Phase, Plan, RuleParameters, Station } from '../../shared/types';
import { layoutOf } from '../kinds/registry';
import { activityById } from '../planning/activities';
import { changeoverBetween } from '../planning/changeover';
import { isDerivedNotice } from '../planning/derived-notices';
import { effectiveParameters } from '../planning/effective-parameters';
import { equipPhase } from '../planning/kit';
import { markPhase } from '../planning/markings';
import { progressionsFor } from '../planning/progressions';
import { summarize } from '../planning/summary';
import { isCheckNotice } from './plan-checks';

/**
 * The activity a station runs: from the rule set, or (for an activity the club has since
 * removed) one rebuilt from what the station itself says, so old plans still refresh.
 */
export function activityOfStation(params: RuleParameters, station: Station): ActivityDefinition {
  const known = activityById(params, station.activityId);
  if (known && known.kind === station.activityKind) return known;
  const sameKind = params.activities.find((a) => a.kind === station.activityKind);
  return {
    id: station.activityId,
    kind: station.activityKind,
    title: station.title,
    summary: station.description,
    description: station.description,
    coachingPoints: station.coachingPoints,
    easier: [],
    harder: [],
    ages: { from: 'U6', to: 'adult' },
    levels: ['beginner', 'intermediate', 'advanced'],
    focus: [],
    intensity: sameKind?.intensity ?? 3,
    balls: sameKind?.balls ?? 'group',
    layout: sameKind ? layoutOf(sameKind) : undefined,
    players: { min: 1, max: 60 },
  };
}

/** At or below the club's cold threshold. */
function isCold(plan: Plan, params: RuleParameters): boolean {
  const t = plan.request.conditions?.temperatureC;
  return t !== undefined && t <= params.cautions.coldC;
}

/**
 * The plan with `phases` in place and what they imply written again: the notices the stations
 * imply and the last re-check are dropped (the caller checks the result again).
 */
export function refreshPlan(plan: Plan, phases: Phase[], ruleParams: RuleParameters): Plan {
  const params = effectiveParameters(ruleParams, plan.request);
  const band = params.ageGroups[plan.request.ageGroup].band;
  const warnings: Notice[] = plan.warnings.filter((w) => !isDerivedNotice(w) && !isCheckNotice(w));
  const fresh = phases.map((p) => ({ ...p, stations: p.stations.map((s) => ({ ...s })) }));
  let lastPlayed: Phase | undefined;
  let breakSince = false;
  for (const phase of fresh) {
    if (phase.activityKind === 'break') {
      breakSince = true;
      continue;
    }
    const activities = phase.stations.map((s) => activityOfStation(params, s));
    const previousGoals = lastPlayed
      ? lastPlayed.stations.flatMap((s) => (s.goalPositions ?? []).filter((g) => g.kind === 'goal'))
      : [];
    markPhase(
      phase.stations,
      activities,
      params,
      plan.request.equipment,
      warnings,
      phase.name,
      previousGoals,
    );
    equipPhase(
      phase.stations,
      activities,
      plan.request.equipment,
      warnings,
      phase.name,
      isCold(plan, params),
    );
    phase.stations.forEach((s, i) => {
      s.progressions = progressionsFor(s, activities[i], params, band, plan.request.space);
    });
    phase.changeover = changeoverBetween(
      lastPlayed,
      phase,
      params,
      plan.request.kind === 'training',
      breakSince || !lastPlayed,
    );
    lastPlayed = phase;
    breakSince = false;
  }
  const totals = summarize(fresh, params, plan.request.minutes, warnings);
  return { ...plan, phases: fresh, ...totals, warnings };
}
