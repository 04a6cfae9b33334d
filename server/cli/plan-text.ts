/**
 * A plan as plain text, the way a coach reads it: each phase with its minutes and set-up, each
 * station with its group, format, area, kit, who is in goal and what to know on the day, then the
 * warnings. Used by `npm run -s plan -- --text` and `npm run -s scenarios`.
 */
import { ACTIVITY_KIND_LABELS, type Plan } from '../../shared/types';

/** "1 goal", "2 goals". */
const count = (n: number, thing: string) => `${n} ${thing}${n === 1 ? '' : 's'}`;

export function planText(plan: Plan): string {
  const r = plan.request;
  const name = (id: string) => r.players.find((p) => p.id === id)?.name ?? id;
  const keepers = r.players.filter((p) => p.goalkeeper).length;
  const out: string[] = [];
  out.push(
    `${r.ageGroup} ${r.level} ${r.kind === 'training' ? 'training session' : 'match warm-up'}, ${r.minutes} min · ` +
      `${r.players.length} players${keepers ? ` (${keepers} keeper${keepers === 1 ? '' : 's'})` : ''}, ${r.coaches} adult${r.coaches === 1 ? '' : 's'} · ` +
      `${r.equipment.balls} balls, ${r.equipment.cones} cones, ${r.equipment.bibs} bibs, ${r.equipment.goals} goals · ` +
      `${r.space.width} × ${r.space.length} m` +
      (r.conditions?.temperatureC !== undefined ? ` · ${r.conditions.temperatureC} °C` : '') +
      (r.focus?.length ? ` · focus ${r.focus.join(', ')}` : '') +
      (plan.theme ? ` · theme ${plan.theme}` : ''),
  );
  for (const phase of plan.phases) {
    const c = phase.changeover;
    const setUp =
      c && (c.conesPlaced || c.conesLifted || c.goalsMoved)
        ? ` · set-up: ${c.conesPlaced} cones out, ${c.conesLifted} in, ${c.goalsMoved} goal${c.goalsMoved === 1 ? '' : 's'} moved${c.minutes ? `, ${c.minutes} min` : ''}`
        : '';
    out.push(
      `  ${phase.startMinute}–${phase.endMinute} min  ${phase.name} (${ACTIVITY_KIND_LABELS[phase.activityKind]})${setUp}`,
    );
    phase.stations.forEach((s, i) => {
      const inGoal = s.roles.goalkeeper?.length
        ? ` · in goal: ${s.roles.goalkeeper.map(name).join(', ')}`
        : '';
      const waiting = s.waiting ? ` · ${s.waiting} waiting` : '';
      out.push(
        `    ${i + 1}. ${s.title} — ${s.format ?? ''} · ${s.playerIds.length} players${s.coachJoins ? ' + the coach' : ''} · ${s.area.width} × ${s.area.length} m · ` +
          `${count(s.equipment.balls, 'ball')}, ${count(s.equipment.cones, 'cone')}, ${count(s.equipment.goals, 'goal')}, ${count(s.equipment.bibs, 'bib')}${inGoal}${waiting}`,
      );
      for (const note of s.notes ?? []) out.push(`       note: ${note}`);
    });
  }
  const values = Object.values(plan.touches);
  if (values.length)
    out.push(`  touches per player (estimate): ${Math.min(...values)}–${Math.max(...values)}`);
  for (const w of plan.warnings) out.push(`  ! ${w.message}`);
  return out.join('\n');
}
