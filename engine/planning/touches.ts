/**
 * Estimated touches per player and the share of player-minutes in play, from per-activity rates
 * by role: a goalkeeper handles, a defender presses, a server feeds — none gets an outfield
 * player's figure — and players waiting for a turn or a ball are not counted as busy.
 */
import '../../shared/i18n/localize';
import type { Phase, Plan, RuleParameters, Station, TouchRate } from '../../shared/types';

/** What the touch figures are: shown beside them on the plan. */
export function estimateNote(): string {
  return $localize`Touches and active share are estimates from the club rules’ per-activity rates, not counts.`;
}

export type TouchRole = 'outfield' | 'goalkeeper' | 'defender' | 'server';

/** How a player's touches are counted at a station. */
export function touchRole(station: Station, id: string): TouchRole {
  if (station.roles.goalkeeper?.includes(id)) return 'goalkeeper';
  if (station.roles.servers?.includes(id)) return 'server';
  if (station.roles.defenders?.includes(id) && !station.roles.teams) return 'defender';
  return 'outfield';
}

export function rateFor(rate: TouchRate, role: TouchRole): number {
  if (role === 'outfield') return rate.perMinute;
  const own = rate.byRole?.[role];
  if (own !== undefined) return own;
  // A goalkeeper out of goal is an outfield player; one in goal touches far less.
  return role === 'goalkeeper' ? rate.perMinute * 0.3 : rate.perMinute;
}

/** Share of a station's outfield players busy at once (1 unless some wait). */
export function busyShare(station: Station): number {
  const outfield = station.playerIds.length - (station.roles.goalkeeper?.length ?? 0) + station.coachJoins;
  return outfield > 0 ? Math.max(0, 1 - (station.waiting ?? 0) / outfield) : 1;
}

/** Minutes a phase is played: its length less any set-up at its start. */
export function playedMinutes(phase: Phase): number {
  return phase.endMinute - phase.startMinute - (phase.changeover?.minutes ?? 0);
}

export function estimateTouches(
  phases: Phase[],
  params: RuleParameters,
): Pick<Plan, 'touches' | 'activeShare'> {
  const touches = new Map<string, number>();
  let active = 0;
  let total = 0;
  for (const phase of phases) {
    if (phase.activityKind === 'break') continue;
    const minutes = playedMinutes(phase);
    for (const station of phase.stations) {
      const rate = params.touchRates[station.activityKind];
      const busy = busyShare(station);
      for (const id of station.playerIds) {
        const role = touchRole(station, id);
        const each = rateFor(rate, role) * minutes * (role === 'goalkeeper' ? 1 : busy);
        touches.set(id, (touches.get(id) ?? 0) + each);
      }
      const n = station.playerIds.length;
      active += n * minutes * rate.activeShare * busy;
      total += n * (phase.endMinute - phase.startMinute);
    }
  }
  const rounded: Record<string, number> = {};
  for (const id of [...touches.keys()].sort()) rounded[id] = Math.round(touches.get(id)!);
  return { touches: rounded, activeShare: total ? Math.round((active / total) * 100) / 100 : 0 };
}
