/**
 * Independent checks of a plan's invariants for the engine's tests (written apart from
 * checkPlan so the two can catch each other's mistakes). Returns a list of broken invariants.
 */
import type { Plan, RuleSetDocument } from '../../shared/types';

export function brokenInvariants(plan: Plan, ruleSet: RuleSetDocument, fromMinute = 0): string[] {
  const out: string[] = [];
  const req = plan.request;
  const params = ruleSet.parameters;
  let t = 0;
  for (const [pi, phase] of plan.phases.entries()) {
    if (phase.startMinute !== t) out.push(`phase ${pi} starts at ${phase.startMinute}, expected ${t}`);
    if (!Number.isInteger(phase.startMinute) || !Number.isInteger(phase.endMinute))
      out.push(`phase ${pi} not whole minutes`);
    if (phase.endMinute <= phase.startMinute) out.push(`phase ${pi} is empty`);
    t = phase.endMinute;
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
      for (const c of a.conePositions) {
        if (c.x < a.position.x - 0.05 || c.x > ax2 + 0.05 || c.y < a.position.y - 0.05 || c.y > ay2 + 0.05) {
          out.push(`phase ${pi}: ${a.id} has a cone outside its area`);
        }
      }
      for (const g of a.goalPositions ?? []) {
        const onEdge =
          Math.abs(g.x - a.position.x) < 0.05 ||
          Math.abs(g.x - ax2) < 0.05 ||
          Math.abs(g.y - a.position.y) < 0.05 ||
          Math.abs(g.y - ay2) < 0.05;
        if (!onEdge) out.push(`phase ${pi}: ${a.id} has a goal or gate off its edge`);
      }
      if (a.activityKind === 'keep-ball') {
        const d = a.roles.defenders?.length ?? 0;
        const att = (a.roles.attackers?.length ?? 0) + a.coachJoins;
        const level = params.keepBall[req.level];
        if (d < 1 || att / d > Math.min(4, level.maxAttackersPerDefender))
          out.push(`phase ${pi}: keep-ball ${att}v${d}`);
        if (!level.formats.some((f) => f.attackers === att && f.defenders === d)) {
          out.push(`phase ${pi}: keep-ball ${att}v${d} not a ${req.level} format`);
        }
      }
      if (a.activityKind === 'movement-prep' && params.ageGroups[req.ageGroup].index <= 12) {
        out.push(`phase ${pi}: movement-prep for ${req.ageGroup}`);
      }
      const outfield = a.playerIds.length - (a.roles.goalkeeper?.length ?? 0);
      if (outfield - params.kinds[a.activityKind].activeSlots > 1)
        out.push(`phase ${pi}: ${a.id} has more than one waiting`);
    }
  }
  if (t !== req.minutes) out.push(`phases end at ${t}, expected ${req.minutes}`);
  return out;
}
