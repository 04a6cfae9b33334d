import '../../shared/i18n/localize';
import type { Plan } from '../../shared/types/plan';

/** The parts of a plan a head of coaching compares between two rule sets, a line of text each. */
export interface PlanOutline {
  groups: string;
  areas: string;
  timing: string;
  warnings: string;
}

/**
 * One line per aspect, phase by phase, so two outlines compare as text; metric, in the engine's
 * own way of writing sizes ("12 × 20 m"), so a screen can put them into the reader's units.
 */
export function outlinePlan(plan: Plan): PlanOutline {
  const groups = plan.phases.map((phase) => {
    const sizes = phase.stations.map((s) => {
      const defenders = s.roles.defenders?.length ?? 0;
      const players = defenders
        ? `${s.playerIds.length - defenders}v${defenders}`
        : String(s.playerIds.length);
      // A coach who joins a group fills a place; say so, or a lone "1" reads like a mistake.
      return s.coachJoins
        ? $localize`:A group a coach joins, e.g. 3 + coach:${players}:players: + coach`
        : players;
    });
    return `${phase.name}: ${sizes.join(' · ')}`;
  });
  const areas = plan.phases.map(
    (phase) =>
      `${phase.name}: ${[...new Set(phase.stations.map((s) => `${s.area.width} × ${s.area.length} m`))].join(', ')}`,
  );
  const timing = plan.phases.map((phase) => `${phase.name} ${phase.endMinute - phase.startMinute}′`);
  const warnings = plan.warnings.map((w) => w.message);
  return {
    groups: groups.join('\n'),
    areas: areas.join('\n'),
    timing: timing.join(' → '),
    warnings: warnings.length ? warnings.join('\n') : $localize`:No warnings in a plan:none`,
  };
}

/** The aspects in which two outlines differ. */
export function outlineChanges(now: PlanOutline, draft: PlanOutline): (keyof PlanOutline)[] {
  return (['groups', 'areas', 'timing', 'warnings'] as const).filter((key) => now[key] !== draft[key]);
}
