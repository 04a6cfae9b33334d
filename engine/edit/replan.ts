/**
 * Pitch-side re-plan after a late arrival or an early leaver: finished phases stay as they ran;
 * each later phase takes whichever valid version moves the fewest players — the same groups
 * with the leaver out or the arrival in where there is room, or the phase rebuilt for the new
 * squad with its stations matched to the old ones.
 */
import '../../shared/i18n/localize';
import type {
  ActivityDefinition,
  Phase,
  Plan,
  PlayerMove,
  PresentPlayer,
  RosterChange,
  RuleSetDocument,
  Station,
} from '../../shared/types';
import { planFromRules, PlanRequestError } from '../generate-plan';
import { insideSpace, overlaps, gapBetween, rectOf } from '../geometry';
import { activityById } from '../planning/activities';
import { sizeRuleOf } from '../planning/allocation';
import { areaForWidth, baseWidth, boundedTable, meetsMinimum } from '../planning/areas';
import type { BuildContext } from '../planning/context';
import { equipPhase } from '../planning/kit';
import { ruledOut } from '../planning/usable';
import { validatePlanRequest } from '../schema/validate-plan-request';
import { reRole } from './apply-edit';
import { withChecks } from './plan-checks';
import { editContext, rebuildPhase } from './plan-context';
import { activityOfStation, refreshPlan } from './rebuild';

export interface ReplanResult {
  plan: Plan;
  moves: PlayerMove[];
}

export async function replan(
  plan: Plan,
  change: RosterChange,
  ruleSet?: RuleSetDocument,
): Promise<ReplanResult> {
  const rules = ruleSet ?? (await import('../rule-sets')).defaultRuleSet;
  const removed = new Set(change.remove ?? []);
  const known = new Set(plan.request.players.map((p) => p.id));
  const arrivals = (change.add ?? []).filter((p) => !known.has(p.id));
  const players = [...plan.request.players.filter((p) => !removed.has(p.id)), ...arrivals];
  const request = { ...plan.request, players };
  const validation = validatePlanRequest(request);
  if (!validation.ok) throw new PlanRequestError(validation.errors);
  const context = await editContext(
    request,
    rules,
    `${plan.seed}:replan:${change.fromMinute}:${players.length}`,
  );
  const { ctx, run } = context;
  // The plan a coach would get for the new squad, from the same run of the club rules.
  const fresh = await planFromRules(run.compiled, { ...request, seed: plan.seed }, run.facts, run.outcome);
  const byId = new Map(players.map((p) => [p.id, p]));
  const moves: PlayerMove[] = [];
  const phases: Phase[] = [];
  let lastPlayed: Phase | undefined;
  plan.phases.forEach((phase, phaseIndex) => {
    if (phase.endMinute <= change.fromMinute || phase.activityKind === 'break') {
      phases.push(phase);
      if (phase.activityKind !== 'break') lastPlayed = phase;
      return;
    }
    const options: Phase[] = [];
    const kept = inPlace(phase, removed, arrivals, byId, ctx);
    if (kept) options.push(kept);
    // The new numbers may rule an activity out (too few for a game): only allowed ones are tried.
    const allowed = (a: ActivityDefinition | undefined): a is ActivityDefinition => !!a && !ruledOut(ctx, a);
    const candidates = [
      activityById(ctx.params, phase.activityId),
      activityById(ctx.params, fresh.phases[phaseIndex]?.activityId ?? ''),
    ].filter(allowed);
    if (candidates.length) {
      options.push(
        matchIds(phase, rebuildPhase(context, plan, phaseIndex, candidates, lastPlayed), phaseIndex),
      );
    }
    // The fresh plan's groups for this phase, on this phase's clock, unless its keepers would
    // stand in goal before any warm-up this plan has run.
    const theirs = fresh.phases[phaseIndex];
    const warmed = phases.some((p) => p.stations.some((s) => s.activityKind === 'goalkeeping'));
    const keepersInGoal = theirs?.stations.some(
      (s) => s.activityKind !== 'goalkeeping' && s.roles.goalkeeper?.length,
    );
    if (theirs && theirs.activityKind !== 'break' && (warmed || !keepersInGoal)) {
      options.push(
        matchIds(
          phase,
          { ...theirs, startMinute: phase.startMinute, endMinute: phase.endMinute },
          phaseIndex,
        ),
      );
    }
    if (!options.length) {
      // Nothing that ran before still fits the new numbers: everyone together (see sharedGridPhase).
      options.push(matchIds(phase, rebuildPhase(context, plan, phaseIndex, [], lastPlayed), phaseIndex));
    }
    let best: { phase: Phase; moves: PlayerMove[]; count: number } | null = null;
    for (const option of options) {
      const m = movesBetween(phase, option, phaseIndex);
      const count = m.filter((x) => x.fromStationId && x.toStationId).length;
      if (!best || count < best.count) best = { phase: option, moves: m, count };
    }
    const chosen = best!;
    moves.push(...chosen.moves);
    phases.push(chosen.phase);
    lastPlayed = chosen.phase;
  });

  const changed: Plan = {
    ...plan,
    request,
    warnings: ctx.warnings,
    cautions: ctx.outcome.cautions,
    forbiddenActivities: ctx.outcome.forbidden,
    supervision: ctx.supervision,
    rosterChanges: [
      ...(plan.rosterChanges ?? []),
      {
        fromMinute: change.fromMinute,
        added: arrivals.map((p) => p.id),
        removed: [...removed].filter((id) => known.has(id)),
      },
    ],
  };
  const refreshed = refreshPlan(changed, phases, ctx.params);
  const moved = moves.filter((m) => m.fromStationId && m.toStationId).length;
  const result: Plan = {
    ...refreshed,
    trace: [
      ...plan.trace,
      ...ctx.outcome.trace.map((t) => ({ ...t, ruleId: `replan:${t.ruleId}` })),
      {
        ruleId: 'engine.replan',
        fired: true,
        effect: replanEffect(
          change.fromMinute,
          arrivals.length,
          changed.rosterChanges!.at(-1)!.removed.length,
          moved,
        ),
      },
    ],
  };
  return { plan: withChecks(result, rules), moves };
}

/**
 * The same groups with leavers taken out and arrivals put where a group has room, or null when
 * that breaks a group's size, a keep-ball format, even sides or the space.
 */
function inPlace(
  phase: Phase,
  removed: Set<string>,
  arrivals: PresentPlayer[],
  byId: Map<string, PresentPlayer>,
  ctx: BuildContext,
): Phase | null {
  const { params, request, band } = ctx;
  if (phase.stations.some((s) => ruledOut(ctx, activityOfStation(params, s)))) return null;
  let stations: Station[] = phase.stations
    .map((s) => ({ ...s, playerIds: s.playerIds.filter((id) => !removed.has(id)) }))
    .filter((s) => s.playerIds.length > 0);
  const changed = new Set(
    phase.stations.filter((s) => s.playerIds.some((id) => removed.has(id))).map((s) => s.id),
  );
  for (const p of arrivals) {
    const room = stations
      .filter((s) => s.activityKind !== 'goalkeeping')
      .filter((s) =>
        sizeRuleOf(activityOfStation(params, s), { params, level: request.level, band })?.allows(
          outfieldAfter(s) + 1,
        ),
      )
      .sort((a, b) => a.playerIds.length - b.playerIds.length)[0];
    if (!room) return null;
    stations = stations.map((s) => (s === room ? { ...s, playerIds: [...s.playerIds, p.id] } : s));
    changed.add(room.id);
  }
  stations = stations.map((s) => {
    if (!changed.has(s.id)) return s;
    const next = reRole(s, s.playerIds, byId, params, request.level, band);
    const activity = activityOfStation(params, next);
    const size = sizeRuleOf(activity, { params, level: request.level, band });
    if (activity.kind !== 'goalkeeping' && size && !size.allows(outfieldAfter(next)))
      return { ...next, id: '' };
    const total = next.playerIds.length + next.coachJoins;
    const table = boundedTable(params, s.activityKind, band, total);
    const area = areaForWidth(
      table,
      baseWidth(params, s.activityKind, band, request.level, total),
      request.space,
    );
    // Never below the club's minimum (keep-ball's room per player): then the group cannot stay.
    if (!meetsMinimum(table, area)) return { ...next, id: '' };
    const rotated = s.area.width > s.area.length !== area.width > area.length;
    return { ...next, area: rotated ? { width: area.length, length: area.width } : area };
  });
  if (stations.some((s) => !s.id)) return null;
  const rects = stations.map((s) => rectOf(s.position, s.area));
  for (let i = 0; i < rects.length; i++) {
    if (!insideSpace(rects[i], request.space)) return null;
    for (let j = i + 1; j < rects.length; j++) {
      if (overlaps(rects[i], rects[j]) || gapBetween(rects[i], rects[j]) < 0.5) return null;
    }
  }
  // Balls and waiting as they would be, so an in-place answer never leaves a queue.
  const trial = stations.map((s) => ({ ...s }));
  equipPhase(
    trial,
    trial.map((s) => activityOfStation(params, s)),
    request.equipment,
    [],
    phase.name,
  );
  if (trial.some((s) => (s.waiting ?? 0) > (ctx.cold ? 0 : 1))) return null;
  return { ...phase, stations };
}

/** Outfield players of a station (keepers in goal are extra to a group's size). */
function outfieldAfter(s: Station): number {
  return s.playerIds.length - (s.roles.goalkeeper?.filter((id) => s.playerIds.includes(id)).length ?? 0);
}

/**
 * The new phase's stations renamed after the old ones they share most players with (the best
 * matching), so "who moves" counts only real changes of group.
 */
function matchIds(before: Phase, after: Phase, phaseIndex: number): Phase {
  const oldSets = before.stations.map((s) => new Set(s.playerIds));
  const overlap = after.stations.map((s) =>
    oldSets.map((set) => s.playerIds.filter((id) => set.has(id)).length),
  );
  const assignment = bestAssignment(overlap, before.stations.length);
  const used = new Set(assignment.filter((j) => j >= 0).map((j) => before.stations[j].id));
  let next = 1;
  const freshId = () => {
    while (used.has(`p${phaseIndex + 1}-s${next}`)) next++;
    const id = `p${phaseIndex + 1}-s${next++}`;
    used.add(id);
    return id;
  };
  const stations = after.stations.map((s, i) => ({
    ...s,
    id: assignment[i] >= 0 ? before.stations[assignment[i]].id : freshId(),
  }));
  return { ...after, stations };
}

/** For each new station, the old station it takes the name of (or -1): most shared players overall. */
function bestAssignment(overlap: number[][], oldCount: number): number[] {
  const n = overlap.length;
  if (oldCount <= 12) {
    // Exact: dynamic programming over subsets of the old stations.
    let states = new Map<number, { value: number; picks: number[] }>([[0, { value: 0, picks: [] }]]);
    for (let i = 0; i < n; i++) {
      const next = new Map<number, { value: number; picks: number[] }>();
      for (const [mask, st] of states) {
        const keep = (m: number, value: number, pick: number) => {
          const cur = next.get(m);
          if (!cur || value > cur.value) next.set(m, { value, picks: [...st.picks, pick] });
        };
        keep(mask, st.value, -1);
        for (let j = 0; j < oldCount; j++) {
          if (mask & (1 << j)) continue;
          keep(mask | (1 << j), st.value + overlap[i][j], j);
        }
      }
      states = next;
    }
    let best = { value: -1, picks: [] as number[] };
    for (const st of states.values()) if (st.value > best.value) best = st;
    return best.picks;
  }
  const taken = new Set<number>();
  return overlap.map((row) => {
    let bestJ = -1;
    row.forEach((v, j) => {
      if (!taken.has(j) && (bestJ < 0 || v > row[bestJ])) bestJ = j;
    });
    if (bestJ >= 0) taken.add(bestJ);
    return bestJ;
  });
}

/** Every player whose group differs between two versions of a phase (null: arriving or leaving). */
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

/** The why panel's line for a pitch-side re-plan: who came and went from a minute, and who moved. */
function replanEffect(minute: number, arrived: number, left: number, moved: number): string {
  return moved === 1
    ? $localize`:pitch-side re-plan after players arrive late or leave early, from a minute of the session:from minute ${minute}:minute:: ${arrived}:arrivals: arrived, ${left}:leavers: left; 1 player changes group`
    : $localize`:pitch-side re-plan after players arrive late or leave early, from a minute of the session:from minute ${minute}:minute:: ${arrived}:arrivals: arrived, ${left}:leavers: left; ${moved}:moved: players change group`;
}
