import type { Plan } from '../../shared/types/plan';

/** A drinks break's activity id: never a station, and never an activity to vary. */
const DRINKS_BREAK = 'drinks-break';

/**
 * The activities a plan's stations use, in phase and station order, each once: what the team
 * played, for the variety of its next plans. Kept in its own column so reading a team's recent
 * activities never parses whole plans.
 */
export function planActivityIds(plan: Pick<Plan, 'phases'>): string[] {
  const ids = new Set<string>();
  for (const phase of plan.phases ?? [])
    for (const station of phase.stations ?? [])
      if (typeof station.activityId === 'string' && station.activityId !== DRINKS_BREAK)
        ids.add(station.activityId);
  return [...ids];
}
