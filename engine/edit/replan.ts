/**
 * Pitch-side re-plan after a late arrival or an early leaver: finished phases stay as they ran;
 * the others keep every player whose group still fits and move as few players as possible.
 */
import type {
  ActivityDefinition,
  ActivityKind,
  Phase,
  Plan,
  PlayerMove,
  PresentPlayer,
  RosterChange,
  RuleParameters,
  RuleSetDocument,
  Station,
} from '../../shared/types';
import { activityById, chooseActivity, kindBlocked } from '../build/activities';
import {
  allocatePhase,
  kindFeasible,
  withStationCap,
  type AllocationRules,
  type GroupPlan,
} from '../build/allocation';
import { makeStation, placeStations, sharedGrid } from '../build/build-phase';
import { assignRoles } from '../build/roles';
import { checkPlan } from '../check-plan';
import { generatePlan, PlanRequestError } from '../generate-plan';
import { gapBetween, insideSpace, overlaps, rectOf } from '../geometry';
import { createRng } from '../random';
import { defaultRuleSet } from '../rule-sets';
import { compileRuleSet } from '../rules/compile-rule-set';
import { evaluateRules } from '../rules/evaluate-rules';
import { buildFacts } from '../rules/facts';
import { validatePlanRequest } from '../schema/validate-plan-request';
import { refreshPlan } from './rebuild';

export interface ReplanResult {
  plan: Plan;
  moves: PlayerMove[];
}

const GOALKEEPER_KINDS: ActivityKind[] = ['passing-finishing', 'small-sided-game'];

export async function replan(
  plan: Plan,
  change: RosterChange,
  ruleSet: RuleSetDocument = defaultRuleSet,
): Promise<ReplanResult> {
  const removed = new Set(change.remove ?? []);
  const known = new Set(plan.request.players.map((p) => p.id));
  const arrivals = (change.add ?? []).filter((p) => !known.has(p.id));
  const players = [...plan.request.players.filter((p) => !removed.has(p.id)), ...arrivals];
  const request = { ...plan.request, players };
  const validation = validatePlanRequest(request);
  if (!validation.ok) throw new PlanRequestError(validation.errors);

  const compiled = compileRuleSet(ruleSet);
  const outcome = await evaluateRules(compiled, buildFacts(request, compiled.document.parameters));
  const params = outcome.parameters;
  const band = params.ageGroups[request.ageGroup].band;
  const usable = (k: ActivityKind) => kindBlocked(params, request.ageGroup, outcome.forbidden, k) === null;
  const rules: AllocationRules = { params, level: request.level, kit: request.equipment, usable };
  const byId = new Map(players.map((p) => [p.id, p]));
  const rng = createRng(`${plan.seed}:replan:${change.fromMinute}:${players.length}`);
  const ctx = { params, request, band, warnings: [...outcome.warnings], trace: [...plan.trace] };
  const moves: PlayerMove[] = [];
  const fresh = await generatePlan({ ...request, seed: plan.seed }, ruleSet);

  const phases: Phase[] = plan.phases.map((phase, phaseIndex) => {
    if (phase.endMinute <= change.fromMinute) return phase;
    // Keep the phase's activity if it still works; take the fresh plan's when that moves fewer.
    const candidates = [phaseActivity(phase, params, request, outcome.forbidden, rules, rng)];
    const freshActivity = activityById(params, fresh.phases[phaseIndex]?.activityId ?? '');
    if (freshActivity && freshActivity.kind !== candidates[0].kind) candidates.push(freshActivity);
    let best: { phase: Phase; moves: PlayerMove[]; count: number } | null = null;
    for (const activity of candidates) {
      const next = regroupPhase(
        phase,
        phaseIndex,
        activity,
        players.length,
        request.coaches,
        rules,
        removed,
        arrivals,
        byId,
        ctx,
      );
      const phaseMoves = movesBetween(phase, next, phaseIndex);
      const count = phaseMoves.filter((m) => m.fromStationId && m.toStationId).length;
      if (!best || count < best.count) best = { phase: next, moves: phaseMoves, count };
    }
    moves.push(...best!.moves);
    return best!.phase;
  });

  const changed: Plan = {
    ...plan,
    request,
    warnings: ctx.warnings,
    cautions: outcome.cautions,
    forbiddenActivities: outcome.forbidden,
    rosterChanges: [
      ...(plan.rosterChanges ?? []),
      {
        fromMinute: change.fromMinute,
        added: arrivals.map((p) => p.id),
        removed: [...removed].filter((id) => known.has(id)),
      },
    ],
  };
  const refreshed = refreshPlan(changed, phases, params);
  const moved = moves.filter((m) => m.fromStationId && m.toStationId).length;
  const result: Plan = {
    ...refreshed,
    trace: [
      ...ctx.trace,
      ...outcome.trace.map((t) => ({ ...t, ruleId: `replan:${t.ruleId}` })),
      {
        ruleId: 'engine.replan',
        fired: true,
        effect: `from minute ${change.fromMinute}: ${arrivals.length} arrive, ${changed.rosterChanges!.at(-1)!.removed.length} leave; ${moved} player(s) change station`,
      },
    ],
  };
  const checks = checkPlan(result, ruleSet);
  return {
    plan: {
      ...result,
      warnings: [...result.warnings, ...checks.map((c) => ({ ...c, code: `check:${c.code}` }))],
    },
    moves,
  };
}

/** One candidate re-plan of a phase for an activity: fewest moves, then fewer stations if the space needs it. */
function regroupPhase(
  phase: Phase,
  phaseIndex: number,
  activity: ActivityDefinition,
  count: number,
  coaches: number,
  rules: AllocationRules,
  removed: Set<string>,
  arrivals: PresentPlayer[],
  byId: Map<string, PresentPlayer>,
  ctx: Parameters<typeof placeStations>[0],
): Phase {
  let cap = Number.POSITIVE_INFINITY;
  for (;;) {
    const target = allocatePhase(count, coaches, activity.kind, withStationCap(rules, cap));
    if (!Number.isFinite(target.cost)) {
      const everyone = phase.stations.flatMap((s) => s.playerIds).filter((id) => !removed.has(id));
      const asOne = [{ ...phase.stations[0], playerIds: [...everyone, ...arrivals.map((p) => p.id)] }];
      return { ...phase, stations: [sharedGrid(ctx, { name: phase.name }, asOne, phaseIndex)] };
    }
    const stations = regroup(phase, target.groups, removed, arrivals, byId, activity, phaseIndex, ctx);
    const placed =
      keepPositions(stations, phase, ctx.request.space) ?? placeStations(ctx, { name: phase.name }, stations);
    if (placed) return { ...phase, activityId: activity.id, intensity: activity.intensity, stations: placed };
    if (stations.length <= 1)
      return { ...phase, stations: [sharedGrid(ctx, { name: phase.name }, stations, phaseIndex)] };
    cap = stations.length - 1;
  }
}

/** The phase's activity, or a substitute when the new numbers or rules rule it out. */
function phaseActivity(
  phase: Phase,
  params: RuleParameters,
  request: Plan['request'],
  forbidden: Plan['forbiddenActivities'] & object,
  rules: AllocationRules,
  rng: () => number,
): ActivityDefinition {
  const current =
    activityById(params, phase.activityId) ?? activityById(params, phase.stations[0]?.activityId ?? '');
  const ok = (k: ActivityKind) =>
    rules.usable(k) && kindFeasible(request.players.length, request.coaches, k, rules);
  if (current && ok(current.kind) && !forbidden.some((f) => f.activityId === current.id)) return current;
  const queue: ActivityKind[] = current ? [...params.kinds[current.kind].substitutes] : ['ball-mastery'];
  const seen = new Set<ActivityKind>();
  while (queue.length) {
    const k = queue.shift()!;
    if (seen.has(k)) continue;
    seen.add(k);
    if (ok(k)) {
      const chosen = chooseActivity(params, request.ageGroup, forbidden, k, request.focus ?? [], rng);
      if (chosen) return chosen;
    }
    queue.push(...params.kinds[k].substitutes);
  }
  return params.activities.find((a) => a.kind === 'ball-mastery')!;
}

/**
 * Matches existing stations to the target groups by kind and size (largest with largest, which
 * minimises how many players must change), then fills gaps from the pool of displaced players
 * and arrivals.
 */
function regroup(
  phase: Phase,
  targets: GroupPlan[],
  removed: Set<string>,
  arrivals: PresentPlayer[],
  byId: Map<string, PresentPlayer>,
  activity: ActivityDefinition,
  phaseIndex: number,
  ctx: Parameters<typeof makeStation>[0],
) {
  const current = phase.stations.map((s) => ({
    station: s,
    ids: s.playerIds.filter((id) => !removed.has(id)),
  }));
  const slots = targets.map((plan) => ({
    plan,
    station: undefined as Station | undefined,
    ids: [] as string[],
  }));
  const kinds = [...new Set(targets.map((t) => t.kind))];
  const matched = new Set<Station>();
  for (const kind of kinds) {
    const mine = slots.filter((s) => s.plan.kind === kind).sort((a, b) => b.plan.players - a.plan.players);
    const theirs = current
      .filter((c) => c.station.activityKind === kind && c.ids.length > 0)
      .sort((a, b) => b.ids.length - a.ids.length);
    mine.forEach((slot, i) => {
      const c = theirs[i];
      if (!c) return;
      slot.station = c.station;
      slot.ids = c.ids;
      matched.add(c.station);
    });
  }
  // When the activity changed, a group that stays together is still no move: match the rest by size.
  const openSlots = slots.filter((s) => !s.station).sort((a, b) => b.plan.players - a.plan.players);
  const spare = current
    .filter((c) => !matched.has(c.station) && c.ids.length > 0)
    .sort((a, b) => b.ids.length - a.ids.length);
  openSlots.forEach((slot, i) => {
    const c = spare[i];
    if (!c) return;
    slot.station = c.station;
    slot.ids = c.ids;
    matched.add(c.station);
  });
  const pool: { id: string; from: string | null }[] = [];
  for (const c of current)
    if (!matched.has(c.station)) for (const id of c.ids) pool.push({ id, from: c.station.id });
  for (const slot of slots) {
    while (slot.ids.length > slot.plan.players) {
      // Move an outfield player; a goalkeeper stays in goal.
      const idx = lastIndex(slot.ids, (id) => !byId.get(id)?.goalkeeper);
      const [id] = slot.ids.splice(idx >= 0 ? idx : slot.ids.length - 1, 1);
      pool.push({ id, from: slot.station!.id });
    }
  }
  for (const p of arrivals) pool.push({ id: p.id, from: null });

  const usedIds = new Set(phase.stations.map((s) => s.id));
  let nextNumber = phase.stations.length + 1;
  const freshId = () => {
    while (usedIds.has(`p${phaseIndex + 1}-s${nextNumber}`)) nextNumber++;
    const id = `p${phaseIndex + 1}-s${nextNumber++}`;
    usedIds.add(id);
    return id;
  };
  const stations = slots.map((slot) => {
    const wantsKeeper =
      GOALKEEPER_KINDS.includes(slot.plan.kind) && !slot.ids.some((id) => byId.get(id)?.goalkeeper);
    const id = slot.station?.id ?? freshId();
    while (slot.ids.length < slot.plan.players && pool.length) {
      let k =
        wantsKeeper && !slot.ids.some((x) => byId.get(x)?.goalkeeper)
          ? pool.findIndex((p) => byId.get(p.id)?.goalkeeper)
          : -1;
      if (k < 0) k = 0;
      const [p] = pool.splice(k, 1);
      slot.ids.push(p.id);
    }
    const players = slot.ids.map((x) => byId.get(x)!);
    const unchanged =
      slot.station &&
      slot.station.activityKind === slot.plan.kind &&
      slot.station.coachJoins === slot.plan.coachJoins &&
      sameMembers(slot.station.playerIds, slot.ids);
    if (unchanged) return slot.station!;
    const chosen =
      slot.plan.kind === activity.kind
        ? activity
        : (ctx.params.activities.find((a) => a.kind === slot.plan.kind) ?? activity);
    const fresh = makeStation(ctx, id, chosen, slot.plan, players, {});
    if (slot.station && slot.station.activityKind === slot.plan.kind) {
      // Same activity, new members: the area follows the table for the new size.
      return {
        ...fresh,
        position: slot.station.position,
        roles: assignRoles(slot.plan.kind, players, slot.plan.coachJoins, ctx.params, ctx.request.level),
      };
    }
    return fresh;
  });
  return stations;
}

/** Every player whose station differs between two versions of a phase (null: arriving or leaving). */
function movesBetween(before: Phase, after: Phase, phaseIndex: number): PlayerMove[] {
  const was = new Map<string, string>();
  for (const s of before.stations) for (const id of s.playerIds) was.set(id, s.id);
  const now = new Map<string, string>();
  for (const s of after.stations) for (const id of s.playerIds) now.set(id, s.id);
  const moves: PlayerMove[] = [];
  for (const [id, from] of was) {
    const to = now.get(id) ?? null;
    if (to !== from) moves.push({ playerId: id, fromStationId: from, toStationId: to, phaseIndex });
  }
  for (const [id, to] of now)
    if (!was.has(id)) moves.push({ playerId: id, fromStationId: null, toStationId: to, phaseIndex });
  return moves;
}

function sameMembers(a: string[], b: string[]): boolean {
  return a.length === b.length && a.every((id) => b.includes(id));
}

function lastIndex<T>(items: T[], test: (item: T) => boolean): number {
  for (let i = items.length - 1; i >= 0; i--) if (test(items[i])) return i;
  return -1;
}

/** Keeps the stations where they were when nothing now overlaps or leaves the space. */
function keepPositions(
  stations: Station[],
  before: Phase,
  space: Plan['request']['space'],
): Station[] | null {
  const oldIds = new Set(before.stations.map((s) => s.id));
  if (stations.some((s) => !oldIds.has(s.id))) return null;
  const rects = stations.map((s) => rectOf(s.position, s.area));
  for (let i = 0; i < rects.length; i++) {
    if (!insideSpace(rects[i], space)) return null;
    for (let j = i + 1; j < rects.length; j++) {
      if (overlaps(rects[i], rects[j]) || gapBetween(rects[i], rects[j]) < 0.5) return null;
    }
  }
  return stations;
}
