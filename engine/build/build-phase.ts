/** One phase from its spec: groups, players, roles, areas, layout, markings, kit and progressions. */
import type {
  ActivityDefinition,
  ActivityKind,
  Phase,
  PresentPlayer,
  RuleParameters,
  Station,
} from '../../shared/types';
import { shuffle } from '../random';
import { chooseActivity } from './activities';
import { allocatePhase, withStationCap, type AllocationRules, type GroupPlan } from './allocation';
import { areaForWidth, areaTable, baseWidth, widthForGroup, type StartWidths } from './areas';
import { addWarning, type BuildContext } from './context';
import { equipPhase } from './kit';
import { packStations } from './layout';
import { markPhase } from './markings';
import { progressionsFor } from './progressions';
import { assignRoles } from './roles';
import type { PhaseSpec } from './timing';
import { waitingCount } from './touches';

const GOALKEEPER_KINDS: ActivityKind[] = ['passing-finishing', 'small-sided-game'];

export function buildPhase(
  ctx: BuildContext,
  rules: AllocationRules,
  spec: PhaseSpec,
  phaseIndex: number,
  startWidths: StartWidths,
): Phase {
  const { request } = ctx;
  let cap = Number.POSITIVE_INFINITY;
  let placed: Station[] | null = null;
  let stations: Station[] = [];
  // Fewer, larger groups when the stations do not fit the space even at the rule minimum.
  for (;;) {
    const allocation = allocatePhase(
      request.players.length,
      request.coaches,
      spec.kind,
      withStationCap(rules, cap),
    );
    if (!Number.isFinite(allocation.cost)) {
      // No grouping within the club's sizes fits: everyone works in one shared grid instead.
      if (!Number.isFinite(cap)) {
        addWarning(
          ctx,
          'groups-outside-rules',
          `${spec.name}: no grouping within the club's sizes fits ${request.players.length} players.`,
        );
        stations = [
          makeStation(
            ctx,
            `p${phaseIndex + 1}-s1`,
            spec.activity,
            allocation.groups[0],
            request.players,
            startWidths,
          ),
        ];
      }
      break;
    }
    const groups = fillGroups(allocation.groups, request.players, ctx);
    stations = groups.map((g, k) =>
      makeStation(
        ctx,
        `p${phaseIndex + 1}-s${k + 1}`,
        activityFor(ctx, spec, g.plan.kind),
        g.plan,
        g.players,
        startWidths,
      ),
    );
    placed = placeStations(ctx, spec, stations);
    if (placed || stations.length <= 1) break;
    cap = stations.length - 1;
  }
  if (placed && Number.isFinite(cap)) {
    addWarning(
      ctx,
      'fewer-stations',
      `${spec.name}: fewer, larger groups (${placed.length} stations) so the stations fit the space.`,
    );
  }
  placed ??= [sharedGrid(ctx, spec, stations, phaseIndex)];
  const coachStations = placed.filter((s) => s.coachJoins);
  if (coachStations.length) {
    ctx.trace.push({
      ruleId: 'engine.coach-fill-in',
      fired: true,
      effect: `${spec.name}: a coach joins ${coachStations.length} group(s) so numbers work`,
    });
  }
  finishPhase(placed, ctx.params, ctx.request, ctx.band, ctx.warnings, spec.name);
  return {
    name: spec.name,
    activityId: spec.activity.id,
    startMinute: spec.startMinute,
    endMinute: spec.endMinute,
    intensity: spec.activity.intensity,
    stations: placed,
  };
}

/** Markings, kit, progressions and waiting counts for stations whose areas and positions are set. */
export function finishPhase(
  stations: Station[],
  params: RuleParameters,
  request: BuildContext['request'],
  band: BuildContext['band'],
  warnings: BuildContext['warnings'],
  phaseName: string,
): void {
  markPhase(stations, request.space, params, request.equipment, warnings, phaseName);
  equipPhase(stations, params, request.equipment, warnings, phaseName);
  for (const s of stations) {
    s.progressions = progressionsFor(s, params, band, request.space);
    s.waiting = waitingCount(s, params);
  }
}

function activityFor(ctx: BuildContext, spec: PhaseSpec, kind: ActivityKind): ActivityDefinition {
  if (kind === spec.kind) return spec.activity;
  return (
    chooseActivity(ctx.params, ctx.request.ageGroup, ctx.forbidden, kind, ctx.request.focus ?? [], ctx.rng) ??
    ctx.params.activities.find((a) => a.kind === kind)!
  );
}

/** Seeded shuffle of who plays with whom; goalkeepers spread one per finishing or game station. */
function fillGroups(plans: GroupPlan[], players: PresentPlayer[], ctx: BuildContext) {
  const groups = plans.map((plan) => ({ plan, players: [] as PresentPlayer[] }));
  const shuffled = shuffle(players, ctx.rng);
  // Outfield players in shuffled order, then any keeper no finishing or game station took.
  const queue: PresentPlayer[] = [];
  for (const p of shuffled) if (!p.goalkeeper) queue.push(p);
  for (const keeper of shuffled) {
    if (!keeper.goalkeeper) continue;
    const target = groups.find(
      (g) =>
        GOALKEEPER_KINDS.includes(g.plan.kind) &&
        g.players.length < g.plan.players &&
        !g.players.some((p) => p.goalkeeper),
    );
    if (target) target.players.push(keeper);
    else queue.push(keeper);
  }
  let next = 0;
  for (const g of groups) {
    while (g.players.length < g.plan.players) g.players.push(queue[next++]);
  }
  return groups;
}

export function makeStation(
  ctx: Pick<BuildContext, 'params' | 'request' | 'band'>,
  id: string,
  activity: ActivityDefinition,
  plan: GroupPlan,
  players: PresentPlayer[],
  startWidths: StartWidths,
): Station {
  const { params, request, band } = ctx;
  const kind = activity.kind;
  const total = players.length + plan.coachJoins;
  const start = startWidths[kind];
  const width = start ? widthForGroup(start, total) : baseWidth(params, kind, band, request.level, total);
  const area = areaForWidth(areaTable(params, kind, band), width, request.space);
  return {
    id,
    activityId: activity.id,
    activityKind: kind,
    title: activity.title,
    description: activity.description,
    playerIds: players.map((p) => p.id),
    coachJoins: plan.coachJoins,
    roles: assignRoles(kind, players, plan.coachJoins, params, request.level),
    area,
    position: { x: 0, y: 0 },
    equipment: { balls: 0, cones: 0, bibs: 0, goals: 0 },
    conePositions: [],
    progressions: { easier: [], harder: [] },
    coachingPoints: [...activity.coachingPoints],
  };
}

/**
 * Lays the stations out; when they do not fit, shrinks them towards the rule minimum. Null when
 * even that fails (the caller then tries fewer stations, then one shared grid — never an overlap).
 */
export function placeStations(
  ctx: Pick<BuildContext, 'params' | 'request' | 'band' | 'warnings' | 'trace'>,
  spec: { name: string },
  stations: Station[],
): Station[] | null {
  const { params, request, band } = ctx;
  const buffer = params.layout.bufferM;
  const rotatable = stations.map((s) => params.kinds[s.activityKind].rotatable);
  let areas = stations.map((s) => s.area);
  for (let attempt = 0; attempt < 12; attempt++) {
    const placed = packStations(areas, request.space, buffer, rotatable);
    if (placed) {
      if (attempt > 0) {
        addWarning(
          ctx,
          'areas-shrunk',
          `${spec.name}: areas were made smaller to fit the space, down to the club's minimum at most.`,
        );
      }
      // Object.assign, not a spread: in V8 every property added later to a spread copy (markings
      // and waiting add some) costs microseconds; the keys and their order are the same.
      return stations.map((s, i) =>
        Object.assign({}, s, { area: placed[i].area, position: placed[i].position }),
      );
    }
    const next = stations.map((s, i) => {
      const table = areaTable(params, s.activityKind, band);
      const side = Math.min(areas[i].width, areas[i].length);
      return areaForWidth(table, Math.max(table.minWidth, side * 0.85), request.space);
    });
    if (next.every((a, i) => a.width === areas[i].width && a.length === areas[i].length)) break;
    areas = next;
  }
  return null;
}

/** Everyone in one ball-mastery grid as large as the space and the rule allow. */
export function sharedGrid(
  ctx: Pick<BuildContext, 'params' | 'request' | 'band' | 'warnings' | 'trace'>,
  spec: { name: string },
  stations: Station[],
  phaseIndex: number,
): Station {
  const { params, request } = ctx;
  const activity = params.activities.find((a) => a.kind === 'ball-mastery')!;
  const players = stations.flatMap((s) => s.playerIds);
  const table = areaTable(params, 'ball-mastery', ctx.band);
  const width = Math.min(request.space.width, table.maxWidth);
  const length = Math.min(request.space.length, table.maxWidth);
  addWarning(
    ctx,
    'space-too-small',
    `${spec.name}: the stations do not fit in ${request.space.width} × ${request.space.length} m even at the club's minimum sizes, so everyone works in one shared grid.`,
  );
  ctx.trace.push({
    ruleId: 'engine.layout-fallback',
    fired: true,
    effect: `${spec.name}: one shared ball-mastery grid`,
  });
  return {
    id: `p${phaseIndex + 1}-s1`,
    activityId: activity.id,
    activityKind: 'ball-mastery',
    title: activity.title,
    description: activity.description,
    playerIds: players,
    coachJoins: 0,
    roles: {},
    area: { width: Math.max(1, Math.floor(width)), length: Math.max(1, Math.floor(length)) },
    position: { x: 0, y: 0 },
    equipment: { balls: 0, cones: 0, bibs: 0, goals: 0 },
    conePositions: [],
    progressions: { easier: [], harder: [] },
    coachingPoints: [...activity.coachingPoints],
  };
}
