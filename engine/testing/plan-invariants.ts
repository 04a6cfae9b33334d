/**
 * Independent checks of a plan's invariants for the engine's tests (written apart from
 * checkPlan so the two can catch each other's mistakes). Returns a list of broken invariants.
 */
import type { Plan, RuleSetDocument, Station } from '../../shared/types';

const GAME_LIKE = ['small-sided-game', 'duel', 'directional-possession', 'transition'];
const SHOTS = ['passing-finishing', 'shooting-game', 'small-sided-game', 'transition'];

export interface InvariantOptions {
  /** Phases ending at or before this minute are not checked (they ran before a re-plan). */
  fromMinute?: number;
  /**
   * Waiting must stay within the limit (one, none in the cold). Off, more waiting is allowed only
   * where a warning of that phase says so (the kit cannot do better).
   */
  strictWaiting?: boolean;
}

export function brokenInvariants(
  plan: Plan,
  ruleSet: RuleSetDocument,
  options: InvariantOptions | number = {},
): string[] {
  const { fromMinute = 0, strictWaiting = false } =
    typeof options === 'number' ? { fromMinute: options } : options;
  const out: string[] = [];
  const req = plan.request;
  const params = ruleSet.parameters;
  const age = params.ageGroups[req.ageGroup];
  const t = req.conditions?.temperatureC;
  const cold = t !== undefined && t <= params.cautions.coldC;
  const keepers = new Set(req.players.filter((p) => p.goalkeeper).map((p) => p.id));
  let clock = 0;
  let warmedUp = false;
  let sinceBreak = 0;
  const stretch =
    t !== undefined && t >= params.cautions.heatC
      ? params.timing.heatDrinksEveryMinutes
      : params.timing.drinksEveryMinutes;
  for (const [pi, phase] of plan.phases.entries()) {
    if (phase.startMinute !== clock)
      out.push(`phase ${pi} starts at ${phase.startMinute}, expected ${clock}`);
    if (!Number.isInteger(phase.startMinute) || !Number.isInteger(phase.endMinute))
      out.push(`phase ${pi} not whole minutes`);
    if (phase.endMinute <= phase.startMinute) out.push(`phase ${pi} is empty`);
    clock = phase.endMinute;
    if (phase.activityKind === 'break') {
      if (phase.stations.length) out.push(`phase ${pi}: a drinks break with stations`);
      sinceBreak = 0;
      continue;
    }
    sinceBreak += phase.endMinute - phase.startMinute;
    if (sinceBreak > stretch + params.timing.minPhaseMinutes)
      out.push(`phase ${pi}: ${sinceBreak} min without a drinks break`);
    if (phase.stations.some((s) => s.activityKind === 'goalkeeping')) warmedUp = true;
    if (phase.endMinute <= fromMinute) continue;

    const ids = phase.stations.flatMap((s) => s.playerIds);
    const present = req.players.map((p) => p.id);
    if (ids.length !== new Set(ids).size) out.push(`phase ${pi}: a player is in two stations`);
    for (const id of present) if (!ids.includes(id)) out.push(`phase ${pi}: ${id} missing`);
    for (const id of ids) if (!present.includes(id)) out.push(`phase ${pi}: ${id} not present`);

    for (const key of ['balls', 'cones', 'bibs', 'goals'] as const) {
      const used = phase.stations.reduce((s, st) => s + st.equipment[key], 0);
      if (used > req.equipment[key]) out.push(`phase ${pi}: ${used} ${key} > ${req.equipment[key]}`);
    }
    if (phase.stations.length > params.supervision.stationsPerAdult * Math.max(1, req.coaches)) {
      out.push(`phase ${pi}: ${phase.stations.length} stations for ${req.coaches} adult(s)`);
    }
    for (const [i, a] of phase.stations.entries()) {
      const ax2 = a.position.x + a.area.width;
      const ay2 = a.position.y + a.area.length;
      if (
        a.position.x < 0 ||
        a.position.y < 0 ||
        ax2 > req.space.width + 1e-9 ||
        ay2 > req.space.length + 1e-9
      ) {
        out.push(`phase ${pi}: ${a.id} outside the space`);
      }
      for (const b of phase.stations.slice(i + 1)) {
        const apart =
          ax2 <= b.position.x + 1e-9 ||
          b.position.x + b.area.width <= a.position.x + 1e-9 ||
          ay2 <= b.position.y + 1e-9 ||
          b.position.y + b.area.length <= a.position.y + 1e-9;
        if (!apart) out.push(`phase ${pi}: ${a.id} overlaps ${b.id}`);
      }
      const inside = (p: { x: number; y: number }) =>
        p.x >= a.position.x - 0.05 && p.x <= ax2 + 0.05 && p.y >= a.position.y - 0.05 && p.y <= ay2 + 0.05;
      for (const c of a.conePositions)
        if (!inside(c)) out.push(`phase ${pi}: ${a.id} has a cone outside its area`);
      for (const p of a.positions)
        if (!inside(p)) out.push(`phase ${pi}: ${a.id} has someone starting outside its area`);
      const drawn = a.positions.filter((p) => p.id !== 'coach').map((p) => p.id);
      if (drawn.length !== a.playerIds.length || a.playerIds.some((id) => !drawn.includes(id))) {
        out.push(`phase ${pi}: ${a.id} does not draw every player once`);
      }
      for (const g of a.goalPositions ?? []) {
        const onEdge =
          Math.abs(g.x - a.position.x) < 0.05 ||
          Math.abs(g.x - ax2) < 0.05 ||
          Math.abs(g.y - a.position.y) < 0.05 ||
          Math.abs(g.y - ay2) < 0.05;
        if (!onEdge) out.push(`phase ${pi}: ${a.id} has a goal or gate off its edge`);
      }
      if (!age.allowedKinds.includes(a.activityKind))
        out.push(`phase ${pi}: ${a.activityKind} not for ${req.ageGroup}`);
      out.push(...stationInvariants(plan, ruleSet, a, pi, keepers, warmedUp));
      const limit = cold ? 0 : 1;
      if ((a.waiting ?? 0) > limit) {
        const told = plan.warnings.some(
          (w) =>
            (w.code === 'balls-short' || w.code === 'waiting') &&
            (w.message.startsWith(`${phase.name}:`) ||
              w.message.startsWith(`${phase.name.replace(/ \(continued\)$/, '')}:`)),
        );
        if (strictWaiting || !told)
          out.push(`phase ${pi}: ${a.id} has ${a.waiting} waiting${told ? '' : ' and no warning says so'}`);
      }
    }
  }
  if (clock !== req.minutes) out.push(`phases end at ${clock}, expected ${req.minutes}`);
  return out;
}

function stationInvariants(
  plan: Plan,
  ruleSet: RuleSetDocument,
  a: Station,
  pi: number,
  keepers: Set<string>,
  warmedUp: boolean,
): string[] {
  const out: string[] = [];
  const req = plan.request;
  const params = ruleSet.parameters;
  const inGoal = a.roles.goalkeeper ?? [];
  const goals = (a.goalPositions ?? []).filter((g) => g.kind === 'goal').length;
  // Keepers warming up take turns in one goal; elsewhere each keeper stands in a goal of their own.
  const atOnce = a.activityKind === 'goalkeeping' ? Math.min(1, inGoal.length) : inGoal.length;
  if (atOnce > goals) out.push(`phase ${pi}: ${a.id} has a keeper without a real goal`);
  if (inGoal.some((id) => !keepers.has(id))) out.push(`phase ${pi}: ${a.id} puts a non-keeper in goal`);
  if (inGoal.length && SHOTS.includes(a.activityKind) && !warmedUp)
    out.push(`phase ${pi}: ${a.id} keeper faces shots before warming up`);
  const needsBall =
    a.activityKind !== 'movement-prep' &&
    params.activities.find((x) => x.id === a.activityId)?.balls !== 'none';
  if (needsBall && req.equipment.balls > 0 && a.equipment.balls === 0)
    out.push(`phase ${pi}: ${a.id} has no ball`);
  if (GAME_LIKE.includes(a.activityKind)) {
    const teams = a.roles.teams;
    if (!teams) out.push(`phase ${pi}: ${a.id} has no sides`);
    else {
      const outA = teams[0].filter((id) => !inGoal.includes(id)).length;
      const outB = teams[1].filter((id) => !inGoal.includes(id)).length;
      if (Math.abs(outA - outB) > 1) out.push(`phase ${pi}: ${a.id} sides ${outA} v ${outB}`);
      const kA = teams[0].filter((id) => inGoal.includes(id)).length;
      const kB = teams[1].filter((id) => inGoal.includes(id)).length;
      if (kA !== kB || kA > 1) out.push(`phase ${pi}: ${a.id} keepers ${kA} v ${kB}`);
      if (a.activityKind === 'small-sided-game') {
        const format = params.gameFormats[params.ageGroups[req.ageGroup].band];
        if (Math.max(teams[0].length, teams[1].length) > format.maxPerSide) {
          out.push(
            `phase ${pi}: ${a.id} ${teams[0].length}v${teams[1].length} over ${format.maxPerSide} a side`,
          );
        }
      }
    }
  }
  if (a.activityKind === 'keep-ball') {
    const d = a.roles.defenders?.length ?? 0;
    const att = (a.roles.attackers?.length ?? 0) + a.coachJoins;
    if (d < 1 || att / d > 4 || att / d < 2) out.push(`phase ${pi}: keep-ball ${att}v${d}`);
    if (d > 1 && a.roles.defenders!.every((id) => keepers.has(id)))
      out.push(`phase ${pi}: keepers defending keep-ball`);
    const n = a.playerIds.length + a.coachJoins;
    const lim = params.keepBallLimits;
    if (
      Math.min(a.area.width, a.area.length) < lim.minSideM ||
      a.area.width * a.area.length < lim.minM2PerPlayer * n - 1e-9
    ) {
      out.push(`phase ${pi}: keep-ball ${a.area.width}×${a.area.length} for ${n}`);
    }
  }
  if (a.activityKind === 'movement-prep' && params.ageGroups[req.ageGroup].index <= 12) {
    out.push(`phase ${pi}: movement-prep for ${req.ageGroup}`);
  }
  return out;
}
