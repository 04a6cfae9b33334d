/** A coach's edit to a plan: the edited plan with kit, totals, notices and trace recomputed. */
import type { Plan, PlanEdit, RuleSetDocument, Station } from '../../shared/types';
import { activityBlocked, activityById } from '../build/activities';
import { allocatePhase, type AllocationRules } from '../build/allocation';
import { makeStation, placeStations } from '../build/build-phase';
import { assignRoles } from '../build/roles';
import { checkPlan } from '../check-plan';
import { generatePlan } from '../generate-plan';
import { createRng, generateSeed, shuffle } from '../random';
import { defaultRuleSet } from '../rule-sets';
import { compileRuleSet } from '../rules/compile-rule-set';
import { applyProgression } from './apply-progression';
import { refreshPlan } from './rebuild';

export async function applyEdit(
  plan: Plan,
  edit: PlanEdit,
  ruleSet: RuleSetDocument = defaultRuleSet,
): Promise<Plan> {
  switch (edit.type) {
    case 'regenerate':
      return generatePlan({ ...plan.request, seed: edit.seed ?? generateSeed() }, ruleSet);
    case 'resize-area': {
      // Larger/smaller is the coach's call; map it onto the activity's harder/easier direction.
      const station = stationAt(plan, edit.phaseIndex, edit.stationId);
      const params = compileRuleSet(ruleSet).document.parameters;
      const smallerIsHarder = params.kinds[station.activityKind].harderWhenArea === 'smaller';
      const verdict = (edit.step === 'smaller') === smallerIsHarder ? 'too-easy' : 'too-hard';
      const out = applyProgression(plan, edit.phaseIndex, edit.stationId, verdict, ruleSet);
      return relabel(out, plan, `edit.resize-area`, `${edit.stationId}: area ${edit.step}`);
    }
    case 'move-player':
      return movePlayer(plan, edit, ruleSet);
    case 'swap-activity':
      return swapActivity(plan, edit, ruleSet);
  }
}

function stationAt(plan: Plan, phaseIndex: number, stationId: string): Station {
  const station = plan.phases[phaseIndex]?.stations.find((s) => s.id === stationId);
  if (!station) throw new RangeError(`No station ${stationId} in phase ${phaseIndex}`);
  return station;
}

function relabel(out: Plan, before: Plan, ruleId: string, effect: string): Plan {
  const added = out.trace.slice(before.trace.length);
  return { ...out, trace: [...before.trace, { ruleId, fired: true, effect }, ...added] };
}

function withChecks(plan: Plan, ruleSet: RuleSetDocument): Plan {
  const checks = checkPlan(plan, ruleSet);
  return { ...plan, warnings: [...plan.warnings, ...checks.map((c) => ({ ...c, code: `check:${c.code}` }))] };
}

function movePlayer(
  plan: Plan,
  edit: Extract<PlanEdit, { type: 'move-player' }>,
  ruleSet: RuleSetDocument,
): Plan {
  const params = compileRuleSet(ruleSet).document.parameters;
  const phase = plan.phases[edit.phaseIndex];
  if (!phase) throw new RangeError(`No phase ${edit.phaseIndex}`);
  const target = stationAt(plan, edit.phaseIndex, edit.toStationId);
  const from = phase.stations.find((s) => s.playerIds.includes(edit.playerId));
  if (!from) throw new RangeError(`Player ${edit.playerId} is in no station of phase ${edit.phaseIndex}`);
  if (from.id === target.id) return plan;
  const byId = new Map(plan.request.players.map((p) => [p.id, p]));
  const stations = phase.stations.map((s) => {
    if (s.id !== from.id && s.id !== target.id) return s;
    const ids =
      s.id === from.id ? s.playerIds.filter((id) => id !== edit.playerId) : [...s.playerIds, edit.playerId];
    const players = ids.map((id) => byId.get(id) ?? { id });
    return {
      ...s,
      playerIds: ids,
      roles: assignRoles(s.activityKind, players, s.coachJoins, params, plan.request.level),
    };
  });
  // A station left empty disappears rather than stand unused.
  const kept = stations.filter((s) => s.playerIds.length > 0);
  const phases = plan.phases.map((p, i) => (i === edit.phaseIndex ? { ...p, stations: kept } : p));
  const refreshed = refreshPlan(plan, phases, params);
  const who = byId.get(edit.playerId)?.name ?? edit.playerId;
  return withChecks(
    {
      ...refreshed,
      trace: [
        ...plan.trace,
        {
          ruleId: 'edit.move-player',
          fired: true,
          effect: `${who}: ${from.id} → ${target.id} in ${phase.name}`,
        },
      ],
    },
    ruleSet,
  );
}

function swapActivity(
  plan: Plan,
  edit: Extract<PlanEdit, { type: 'swap-activity' }>,
  ruleSet: RuleSetDocument,
): Plan {
  const params = compileRuleSet(ruleSet).document.parameters;
  const phase = plan.phases[edit.phaseIndex];
  if (!phase) throw new RangeError(`No phase ${edit.phaseIndex}`);
  const activity = activityById(params, edit.activityId);
  if (!activity) throw new RangeError(`No activity ${edit.activityId} in rule set ${ruleSet.id}`);
  const request = plan.request;
  const blocked = activityBlocked(params, request.ageGroup, plan.forbiddenActivities ?? [], activity);
  if (blocked) {
    return {
      ...plan,
      warnings: [
        ...plan.warnings,
        { code: 'swap-refused', message: `${activity.title} is not used here: ${blocked}` },
      ],
      trace: [
        ...plan.trace,
        { ruleId: 'edit.swap-activity', fired: false, effect: `${activity.title} refused: ${blocked}` },
      ],
    };
  }
  const band = params.ageGroups[request.ageGroup].band;
  const rules: AllocationRules = {
    params,
    level: request.level,
    kit: request.equipment,
    usable: (k) =>
      !(plan.forbiddenActivities ?? []).some((f) => f.kind === k && !f.activityId) &&
      params.ageGroups[request.ageGroup].allowedKinds.includes(k),
  };
  const rng = createRng(`${plan.seed}:swap:${edit.phaseIndex}:${edit.activityId}`);
  const players = shuffle(request.players, rng);
  const allocation = allocatePhase(players.length, request.coaches, activity.kind, rules);
  const ctx = { params, request, band, warnings: [...plan.warnings], trace: [...plan.trace] };
  let next = 0;
  const stations = allocation.groups.map((g, k) => {
    const group = players.slice(next, (next += g.players));
    const chosen = g.kind === activity.kind ? activity : params.activities.find((a) => a.kind === g.kind)!;
    return makeStation(ctx, `p${edit.phaseIndex + 1}-s${k + 1}`, chosen, g, group, {});
  });
  const placed = placeStations(ctx, { name: phase.name }, stations);
  if (!placed) {
    return {
      ...plan,
      warnings: [
        ...plan.warnings,
        {
          code: 'swap-refused',
          message: `${activity.title} does not fit the space for ${players.length} players.`,
        },
      ],
      trace: [
        ...plan.trace,
        { ruleId: 'edit.swap-activity', fired: false, effect: `${activity.title}: does not fit the space` },
      ],
    };
  }
  const phases = plan.phases.map((p, i) =>
    i === edit.phaseIndex
      ? { ...p, activityId: activity.id, intensity: activity.intensity, stations: placed }
      : p,
  );
  const refreshed = refreshPlan({ ...plan, warnings: ctx.warnings }, phases, params);
  return withChecks(
    {
      ...refreshed,
      trace: [
        ...ctx.trace,
        {
          ruleId: 'edit.swap-activity',
          fired: true,
          effect: `${phase.name}: ${phase.activityId} → ${activity.id}`,
        },
      ],
    },
    ruleSet,
  );
}
