/**
 * One phase from its spec: the keepers' own warm-up station when it is their time, keepers in
 * real goals once warmed up, groups within the club's sizes and the adults' station limit,
 * roles by kind, areas, layout (last phase's grids where they still fit), markings, kit,
 * waiting and steps. Each of the part's activities is tried in turn until one runs cleanly in
 * the space, kit and weather; the first that runs at all is kept otherwise.
 */
import '../../shared/i18n/localize';
import type {
  ActivityDefinition,
  Notice,
  Phase,
  PresentPlayer,
  Station,
  StationKind,
  TraceEntry,
} from '../../shared/types';
import { ACTIVITY_KIND_LABELS } from '../../shared/types';
import { breakPhase } from '../kinds/break';
import { kindModule, layoutOf } from '../kinds/registry';
import { shuffle } from '../random';
import { rankedActivities } from './activities';
import {
  allocatePhase,
  sizeRuleOf,
  withStationCap,
  type AllocationRules,
  type GroupPlan,
} from './allocation';
import {
  areaForWidth,
  baseWidth,
  boundedTable,
  meetsMinimum,
  startWidthFor,
  widthForGroup,
  type StartWidths,
} from './areas';
import type { BuildContext } from './context';
import { equipPhase } from './kit';
import { packStations, reuseLayout } from './layout';
import { isTargetlessNote, markPhase } from './markings';
import { progressionsFor } from './progressions';
import { adultsInWords } from './supervision';
import { continuedName, withoutContinued, type PhaseSpec } from './timing';

/** What building needs besides the request: the rules, warnings and trace to add to. */
export type PhaseContext = Pick<
  BuildContext,
  | 'request'
  | 'params'
  | 'band'
  | 'forbidden'
  | 'rng'
  | 'supervision'
  | 'keepers'
  | 'cold'
  | 'focus'
  | 'recent'
  | 'pinned'
  | 'hot'
> & { warnings: Notice[]; trace: TraceEntry[] };

interface Attempt {
  phase: Phase;
  clean: boolean;
  /** Clean but for splitting the squad into a game with keepers and one without. */
  split: boolean;
  warnings: Notice[];
  trace: TraceEntry[];
}

export function buildPhase(
  ctx: PhaseContext,
  rules: AllocationRules,
  spec: PhaseSpec,
  phaseIndex: number,
  startWidths: StartWidths,
  previous: Phase | undefined,
  played: ReadonlySet<string> = new Set(),
): Phase {
  if (spec.slot === 'break') return breakPhase(spec.startMinute, spec.endMinute - spec.startMinute, ctx.hot);
  if (spec.continues && previous) return continued(spec, phaseIndex, previous);
  // The first that runs cleanly and is new today; then a game split in two (rather than leaving
  // the game for another kind); then one the session already played; else the one that leaves
  // the fewest players waiting.
  let split: Attempt | null = null;
  let repeat: Attempt | null = null;
  let fallback: { attempt: Attempt; waiting: number } | null = null;
  for (const activity of spec.candidates) {
    if (split && activity.kind !== split.phase.activityKind) break;
    const attempt = tryActivity(ctx, rules, spec, activity, phaseIndex, startWidths, previous);
    if (!attempt) continue;
    // A coach's pin is honoured whenever it can be laid out; its notices say what it costs.
    if (ctx.pinned.has(activity.id)) return commit(ctx, attempt);
    if (attempt.clean && !played.has(activity.id)) return commit(ctx, attempt);
    if (attempt.clean) repeat ??= attempt;
    else if (attempt.split) split ??= attempt;
    const waiting = attempt.phase.stations.reduce((s, st) => s + (st.waiting ?? 0), 0);
    if (!fallback || waiting < fallback.waiting) fallback = { attempt, waiting };
  }
  const best = split ?? repeat ?? fallback?.attempt;
  if (best) return commit(ctx, best);
  return sharedGridPhase(ctx, spec, phaseIndex, previous);
}

function commit(ctx: PhaseContext, attempt: Attempt): Phase {
  for (const w of attempt.warnings) {
    if (!ctx.warnings.some((x) => x.code === w.code && x.message === w.message)) ctx.warnings.push(w);
  }
  ctx.trace.push(...attempt.trace);
  return attempt.phase;
}

/** The second part of a phase split by a drinks break: the same groups in the same places. */
function continued(spec: PhaseSpec, phaseIndex: number, previous: Phase): Phase {
  const stations = previous.stations.map((s, k) => ({ ...s, id: `p${phaseIndex + 1}-s${k + 1}` }));
  return {
    name: continuedName(withoutContinued(previous.name)),
    activityId: previous.activityId,
    activityKind: previous.activityKind,
    startMinute: spec.startMinute,
    endMinute: spec.endMinute,
    intensity: previous.intensity,
    slot: spec.slot,
    stations,
  };
}

function tryActivity(
  ctx: PhaseContext,
  rules: AllocationRules,
  spec: PhaseSpec,
  activity: ActivityDefinition,
  phaseIndex: number,
  startWidths: StartWidths,
  previous: Phase | undefined,
): Attempt | null {
  const { request } = ctx;
  const warnings: Notice[] = [];
  const trace: TraceEntry[] = [];
  const players = shuffle(request.players, ctx.rng);
  let coachesFree = request.coaches;

  // The keepers' own warm-up, when it is their time and a goal is free for it.
  const keeperGroups = spec.keeperWarmUp ? keeperWarmUpGroups(ctx, players, coachesFree) : [];
  coachesFree -= keeperGroups.reduce((s, g) => s + g.coachJoins, 0);
  const inWarmUp = new Set(keeperGroups.flatMap((g) => g.players.map((p) => p.id)));
  const rest = players.filter((p) => !inWarmUp.has(p.id));

  const module = kindModule(activity.kind);
  const targets = module.targets(layoutOf(activity));
  const keeperIds = new Set(ctx.keepers.map((k) => k.id));
  const pool =
    spec.keepersInGoal && module.facesShots && targets.keepers ? rest.filter((p) => keeperIds.has(p.id)) : [];
  const per = targets.ends === 2 ? 2 : 1;
  const goalsLeft = request.equipment.goals - keeperGroups.length;
  const wantIn =
    per === 2
      ? 2 * Math.min(Math.floor(pool.length / 2), Math.floor(goalsLeft / 2))
      : Math.min(pool.length, goalsLeft);

  const cap0 = Math.max(1, ctx.supervision.maxStations - keeperGroups.length);
  let cap = cap0;
  const previousMain = previous?.stations.filter((s) => s.activityKind !== 'goalkeeping').length;
  // The keepers' station has its goal and a ball already: the rest share what is left.
  const kit = request.equipment;
  rules = {
    ...rules,
    kit: {
      ...kit,
      balls: Math.max(0, kit.balls - keeperGroups.length),
      goals: Math.max(0, kit.goals - keeperGroups.length),
    },
    ...(previousMain ? { sameStationsAs: previousMain } : {}),
    ...(per === 2 && wantIn >= 2 ? { keepersInGame: true } : {}),
  };
  for (;;) {
    let inGoal = wantIn;
    let allocation = allocatePhase(rest.length - inGoal, coachesFree, activity, withStationCap(rules, cap));
    for (let i = 0; i < 3 && Number.isFinite(allocation.cost); i++) {
      const hosts = allocation.groups.filter((g) => g.activity === activity).length;
      if (inGoal <= per * hosts) break;
      inGoal = per * hosts;
      allocation = allocatePhase(rest.length - inGoal, coachesFree, activity, withStationCap(rules, cap));
    }
    if (!Number.isFinite(allocation.cost)) return null;
    if (cap === cap0 && cap0 < rest.length) {
      const free = allocatePhase(rest.length - inGoal, coachesFree, activity, rules);
      if (Number.isFinite(free.cost) && free.groups.length > allocation.groups.length) {
        warnings.push({
          code: 'stations-per-adult',
          message: $localize`With ${adultsInWords(request.coaches)}:adults:, at most ${ctx.supervision.maxStations}:stations: stations run at once, so groups are larger than usual; another adult or parent helper would let more groups play.`,
        });
      }
    }
    const keepersIn = pool.slice(0, inGoal);
    const groups = fillGroups(allocation.groups, rest, keepersIn, per, activity);
    const stations: Station[] = groups.map((g, k) =>
      makeStation(
        ctx,
        `p${phaseIndex + 1}-s${k + 1}`,
        g.plan.activity,
        g.plan,
        g.players,
        g.keepers,
        startWidths,
      ),
    );
    const activities = groups.map((g) => g.plan.activity);
    keeperGroups.forEach((g, k) => {
      stations.push(
        makeStation(
          ctx,
          `p${phaseIndex + 1}-s${groups.length + k + 1}`,
          g.activity,
          { activity: g.activity, players: g.players.length, coachJoins: g.coachJoins },
          g.players,
          g.keepers,
          {},
        ),
      );
      activities.push(g.activity);
    });
    const placed = placeStations(ctx, stations, previous);
    if (placed) {
      if (cap < cap0) {
        warnings.push({
          code: 'fewer-stations',
          message: $localize`${spec.name}:phaseName:: fewer, larger groups so the stations fit the space.`,
        });
      }
      return finishAttempt(ctx, spec, placed, activities, allocation.cost, previous, warnings, trace);
    }
    const main = groups.length;
    if (main <= 1) return null;
    cap = main - 1;
  }
}

function finishAttempt(
  ctx: PhaseContext,
  spec: PhaseSpec,
  stations: Station[],
  activities: ActivityDefinition[],
  cost: number,
  previous: Phase | undefined,
  warnings: Notice[],
  trace: TraceEntry[],
): Attempt {
  const { request, params, band } = ctx;
  const name =
    !spec.kinds || spec.kinds.includes(activities[0].kind)
      ? spec.name
      : ACTIVITY_KIND_LABELS[activities[0].kind];
  const previousGoals = previous
    ? previous.stations.flatMap((s) => (s.goalPositions ?? []).filter((g) => g.kind === 'goal'))
    : [];
  markPhase(stations, activities, params, request.equipment, warnings, name, previousGoals);
  equipPhase(stations, activities, request.equipment, warnings, name, ctx.cold);
  stations.forEach((s, i) => {
    s.progressions = progressionsFor(s, activities[i], params, band, request.space);
  });
  const coachStations = stations.filter((s) => s.coachJoins);
  if (coachStations.length) {
    trace.push({
      ruleId: 'engine.coach-fill-in',
      fired: true,
      effect:
        coachStations.length === 1
          ? $localize`${name}:phaseName:: a coach joins one group to even the numbers or to serve a goalkeeper`
          : $localize`${name}:phaseName:: a coach joins ${coachStations.length}:groups: groups to even the numbers or to serve a goalkeeper`,
    });
  }
  const allowedWait = ctx.cold ? 0 : 1;
  const main = activities[0];
  // Leftover groups in another activity are a last resort: another activity may fit everyone.
  // Keepers in goal and the squad within one game's format: one game, not one with keepers and
  // one without (another game activity may take the whole squad).
  const keeperGames = stations.filter(
    (s) => s.activityKind === 'small-sided-game' && s.roles.goalkeeper?.length,
  );
  const format = params.gameFormats[band];
  const splitGame =
    keeperGames.length > 0 &&
    stations.filter((s) => s.activityKind === 'small-sided-game').length > 1 &&
    request.players.length <= 2 * format.maxPerSide;
  const runs =
    Number.isFinite(cost) &&
    activities.every((a) => a === main || a.kind === 'goalkeeping') &&
    stations.every(
      (s, i) =>
        (s.waiting ?? 0) <= allowedWait &&
        (activities[i].balls === 'none' || s.equipment.balls > 0) &&
        !(s.notes ?? []).some(isTargetlessNote),
    );
  return {
    phase: {
      name,
      activityId: main.id,
      activityKind: main.kind,
      startMinute: spec.startMinute,
      endMinute: spec.endMinute,
      intensity: main.intensity,
      slot: spec.slot,
      stations,
    },
    clean: runs && !splitGame,
    split: runs && splitGame,
    warnings,
    trace,
  };
}

interface KeeperGroup {
  activity: ActivityDefinition;
  players: PresentPlayer[];
  keepers: string[];
  coachJoins: 0 | 1;
}

/**
 * Keepers in twos at a real goal each (three share one when goals are short); a lone keeper is served by a coach when a
 * second adult can watch the rest, otherwise by a team-mate.
 */
function keeperWarmUpGroups(ctx: PhaseContext, players: PresentPlayer[], coaches: number): KeeperGroup[] {
  const keepers = ctx.keepers.filter((k) => players.some((p) => p.id === k.id));
  const goals = ctx.request.equipment.goals;
  // Two to a goal: one saves while the other serves, nobody waits.
  // A goal and a ball each, leaving at least one ball for everyone else.
  const count = Math.min(goals, Math.ceil(keepers.length / 2), Math.max(0, ctx.request.equipment.balls - 1));
  if (!count) return [];
  const ranked = rankedActivities(ctx, 'goalkeeping');
  if (!ranked.length) return [];
  const outfield = players.filter((p) => !keepers.some((k) => k.id === p.id));
  let adults = coaches;
  const groups: KeeperGroup[] = [];
  for (let g = 0; g < count; g++) {
    // At most two keepers to a goal: a third warms up as a keeper in the next phase instead.
    const mine = keepers.slice(0, 2 * count).filter((_, i) => i % count === g);
    let coachJoins: 0 | 1 = 0;
    const members = [...mine];
    if (mine.length === 1) {
      if (adults >= 2) {
        coachJoins = 1;
        adults--;
      } else if (outfield.length) {
        members.push(outfield.pop()!);
      }
    }
    const total = members.length + coachJoins;
    const fit =
      ranked.find((r) => r.activity.players.min <= total && r.activity.players.max >= total) ?? ranked[0];
    groups.push({ activity: fit.activity, players: members, keepers: mine.map((k) => k.id), coachJoins });
  }
  return groups;
}

/**
 * Players into the planned groups: keepers in goal to the first groups that host them (one, or
 * one at each end), other keepers spread one per group, then everyone else in shuffled order.
 */
function fillGroups(
  plans: GroupPlan[],
  rest: PresentPlayer[],
  keepersIn: PresentPlayer[],
  per: number,
  main: ActivityDefinition,
) {
  const groups = plans.map((plan) => ({
    plan,
    players: [] as PresentPlayer[],
    keepers: [] as string[],
    outfield: 0,
  }));
  const hosts = groups.filter((g) => g.plan.activity === main);
  keepersIn.forEach((k, i) => {
    const host = hosts[Math.floor(i / per)];
    host.players.push(k);
    host.keepers.push(k.id);
  });
  const inGoal = new Set(keepersIn.map((k) => k.id));
  const others = rest.filter((p) => !inGoal.has(p.id));
  // Keepers playing out go one to a group before anyone else is placed.
  for (const k of others.filter((p) => p.goalkeeper)) {
    const target = groups
      .filter((g) => g.outfield < g.plan.players)
      .sort((a, b) => keeperCount(a.players) - keeperCount(b.players))[0];
    if (!target) break;
    target.players.push(k);
    target.outfield++;
  }
  const placed = new Set(groups.flatMap((g) => g.players.map((p) => p.id)));
  const queue = others.filter((p) => !placed.has(p.id));
  let next = 0;
  for (const g of groups) {
    while (g.outfield < g.plan.players && next < queue.length) {
      g.players.push(queue[next++]);
      g.outfield++;
    }
  }
  return groups;
}

function keeperCount(players: PresentPlayer[]): number {
  let n = 0;
  for (const p of players) if (p.goalkeeper) n++;
  return n;
}

export function makeStation(
  ctx: Pick<BuildContext, 'params' | 'request' | 'band'>,
  id: string,
  activity: ActivityDefinition,
  plan: GroupPlan,
  players: PresentPlayer[],
  keepers: string[],
  startWidths: StartWidths,
): Station {
  const { params, request, band } = ctx;
  const kind = activity.kind;
  const layout = layoutOf(activity);
  const outcome = kindModule(kind).roles({
    activity,
    layout,
    players,
    keepers,
    coachJoins: plan.coachJoins,
    params,
    level: request.level,
    band,
  });
  const total = players.length + plan.coachJoins;
  const start = startWidthFor(startWidths, activity);
  const width = start ? widthForGroup(start, total) : baseWidth(params, kind, band, request.level, total);
  const area = areaForWidth(boundedTable(params, kind, band, total), width, request.space);
  return {
    id,
    activityId: activity.id,
    activityKind: kind,
    title: activity.title,
    playerIds: players.map((p) => p.id),
    coachJoins: plan.coachJoins,
    roles: outcome.roles,
    format: outcome.format,
    area,
    position: { x: 0, y: 0 },
    equipment: { balls: 0, cones: 0, bibs: 0, goals: 0 },
    conePositions: [],
    positions: [],
    progressions: { easier: [], harder: [] },
    coachingPoints: [...activity.coachingPoints, ...(outcome.points ?? [])],
    description: activity.description,
  };
}

/**
 * Lays the stations out: last phase's grids where they fit, else packed in rows, shrinking
 * towards the club's minimum. Null when even that fails (the caller then tries fewer stations,
 * then another activity — never an overlap, never below the minimum).
 */
export function placeStations(
  ctx: Pick<BuildContext, 'params' | 'request' | 'band'>,
  stations: Station[],
  previous: Phase | undefined,
): Station[] | null {
  const { params, request, band } = ctx;
  const tables = stations.map((s) =>
    boundedTable(params, s.activityKind, band, s.playerIds.length + s.coachJoins),
  );
  if (stations.some((s, i) => !meetsMinimum(tables[i], s.area))) return null;
  const buffer = params.layout.bufferM;
  const rotatable = stations.map((s) => params.kinds[s.activityKind].rotatable);
  if (previous?.stations.length) {
    const reused = reuseLayout(
      previous.stations,
      stations.map((s, i) => ({
        area: s.area,
        minWidth: tables[i].minWidth,
        maxWidth: tables[i].maxWidth,
        kind: s.activityKind,
      })),
      request.space,
      buffer,
      rotatable,
    );
    if (reused)
      return stations.map((s, i) =>
        Object.assign({}, s, { area: reused[i].area, position: reused[i].position }),
      );
  }
  let areas = stations.map((s) => s.area);
  for (let attempt = 0; attempt < 12; attempt++) {
    const placed = packStations(areas, request.space, buffer, rotatable);
    if (placed) {
      return stations.map((s, i) =>
        Object.assign({}, s, { area: placed[i].area, position: placed[i].position }),
      );
    }
    const next = stations.map((s, i) => {
      const side = Math.min(areas[i].width, areas[i].length);
      return areaForWidth(tables[i], Math.max(tables[i].minWidth, side * 0.85), request.space);
    });
    if (next.some((a, i) => !meetsMinimum(tables[i], a))) break;
    if (next.every((a, i) => a.width === areas[i].width && a.length === areas[i].length)) break;
    areas = next;
  }
  return null;
}

/**
 * Everyone in one area as large as the space and the rule allow, playing what the whole squad can
 * play together (the keepers in their own warm-up beside it when it is their time and it fits).
 */
function sharedGridPhase(
  ctx: PhaseContext,
  spec: PhaseSpec,
  phaseIndex: number,
  previous: Phase | undefined,
): Phase {
  const { request } = ctx;
  const keeperGroups = spec.keeperWarmUp
    ? keeperWarmUpGroups(ctx, shuffle(request.players, ctx.rng), request.coaches)
    : [];
  const away = new Set(keeperGroups.flatMap((g) => g.players.map((p) => p.id)));
  const withKeepers = sharedArea(
    ctx,
    spec,
    request.players.filter((p) => !away.has(p.id)),
    previous,
    keeperGroups,
    phaseIndex,
  );
  return withKeepers ?? sharedArea(ctx, spec, request.players, previous, [], phaseIndex)!;
}

function sharedArea(
  ctx: PhaseContext,
  spec: PhaseSpec,
  players: PresentPlayer[],
  previous: Phase | undefined,
  keeperGroups: KeeperGroup[],
  phaseIndex: number,
): Phase | null {
  const { params, request } = ctx;
  const n = players.length;
  if (!n) return null;
  // Something the group can play together, true to the part where possible: its own kinds first,
  // then a game, a tag game, possession to a target, ball mastery. Keep-ball needs its room per
  // player, which a space too small for stations cannot give.
  const kinds = [...new Set<StationKind>([...(spec.kinds ?? []), ...WHOLE_GROUP_KINDS])].filter(
    (k) => k !== 'keep-ball',
  );
  const options: ActivityDefinition[] = [];
  for (const kind of kinds) {
    for (const r of rankedActivities(ctx, kind)) {
      const size = sizeRuleOf(r.activity, { params, level: request.level, band: ctx.band });
      if (size?.allows(n) && (r.activity.balls === 'none' || request.equipment.balls > keeperGroups.length))
        options.push(r.activity);
    }
  }
  // Within the day's intensity limit (the heat) when anything is.
  const calm = options.filter((a) => a.intensity <= params.intensity.max);
  const pool = calm.length ? calm : options;
  const activity =
    pool.find((a) => a.id !== previous?.activityId) ??
    pool[0] ??
    rankedActivities(ctx, 'ball-mastery')[0]?.activity ??
    params.activities.find((a) => a.kind === 'ball-mastery' && !a.retired) ??
    params.activities[0];
  const name =
    !spec.kinds || spec.kinds.includes(activity.kind) ? spec.name : ACTIVITY_KIND_LABELS[activity.kind];
  const table = params.areas[activity.kind][ctx.band];
  const station = makeStation(
    ctx,
    `p${phaseIndex + 1}-s1`,
    activity,
    { activity, players: n, coachJoins: 0 },
    players,
    [],
    {},
  );
  const whole = {
    width: Math.max(1, Math.floor(Math.min(request.space.width, table.maxWidth))),
    length: Math.max(
      1,
      Math.floor(Math.min(request.space.length, table.maxWidth * (table.length / table.width))),
    ),
  };
  const stations = [station];
  const activities = [activity];
  if (keeperGroups.length) {
    keeperGroups.forEach((g, k) => {
      stations.push(
        makeStation(
          ctx,
          `p${phaseIndex + 1}-s${k + 2}`,
          g.activity,
          { activity: g.activity, players: g.players.length, coachJoins: g.coachJoins },
          g.players,
          g.keepers,
          {},
        ),
      );
      activities.push(g.activity);
    });
    // The shared area gives up what the keepers' goals need, if what is left still holds the group.
    let placed = null;
    for (let shrink = 1; shrink >= 0.5 && !placed; shrink -= 0.1) {
      const area = {
        width: Math.max(1, Math.floor(whole.width * shrink)),
        length: Math.max(1, Math.floor(whole.length * shrink)),
      };
      placed = packStations(
        [area, ...stations.slice(1).map((s) => s.area)],
        request.space,
        params.layout.bufferM,
        stations.map(() => true),
      );
    }
    if (!placed) return null;
    stations.forEach((s, i) => Object.assign(s, { area: placed![i].area, position: placed![i].position }));
  } else station.area = whole;
  ctx.warnings.push({
    code: 'space-too-small',
    message: $localize`${name}:phaseName:: nothing in this part fits ${n}:players: players in ${request.space.width}:width: × ${request.space.length}:length: m with this kit, so they play together in one area.`,
  });
  ctx.trace.push({
    ruleId: 'engine.layout-fallback',
    fired: true,
    effect: $localize`${name}:phaseName:: everyone in one area (${activity.title}:activityTitle:)`,
  });
  markPhase(stations, activities, params, request.equipment, ctx.warnings, name);
  equipPhase(stations, activities, request.equipment, ctx.warnings, name, ctx.cold);
  stations.forEach(
    (s, i) => (s.progressions = progressionsFor(s, activities[i], params, ctx.band, request.space)),
  );
  return {
    name,
    activityId: activity.id,
    activityKind: activity.kind,
    startMinute: spec.startMinute,
    endMinute: spec.endMinute,
    intensity: activity.intensity,
    slot: spec.slot,
    stations,
  };
}

/** Kinds a whole squad can play in one area when the stations do not fit. */
const WHOLE_GROUP_KINDS: StationKind[] = [
  'small-sided-game',
  'tag-game',
  'directional-possession',
  'ball-mastery',
];
