/** Estimated touches per player and the share of player-minutes in play, from per-activity rates. */
import type { Phase, Plan, RuleParameters, Station } from '../../shared/types';
import { ballDemand } from './kit';

export const ESTIMATE_NOTE =
  'Touches and active share are estimates from the club rules’ per-activity rates, not counts.';

/** Share of a station's players who are busy at once (1 unless some wait their turn). */
export function busyShare(station: Station, params: RuleParameters): number {
  const outfield = station.playerIds.length - (station.roles.goalkeeper?.length ?? 0);
  const slots = params.kinds[station.activityKind].activeSlots;
  return outfield > slots ? slots / outfield : 1;
}

/** Players beyond the activity's active slots. */
export function waitingCount(station: Station, params: RuleParameters): number {
  const outfield = station.playerIds.length - (station.roles.goalkeeper?.length ?? 0);
  return Math.max(0, outfield - params.kinds[station.activityKind].activeSlots);
}

function ballShare(station: Station, params: RuleParameters): number {
  const demand = ballDemand(station, params);
  if (demand === 0) return 1;
  return Math.min(1, station.equipment.balls / demand);
}

export function estimateTouches(
  phases: Phase[],
  params: RuleParameters,
): Pick<Plan, 'touches' | 'activeShare'> {
  // A Map, not an object keyed by player id: ids are arbitrary strings, which puts an object in
  // slow dictionary mode.
  const touches = new Map<string, number>();
  let active = 0;
  let total = 0;
  for (const phase of phases) {
    const minutes = phase.endMinute - phase.startMinute;
    for (const station of phase.stations) {
      const rate = params.touchRates[station.activityKind];
      const busy = busyShare(station, params);
      const balls = ballShare(station, params);
      const each = rate.perMinute * minutes * busy * balls;
      for (const id of station.playerIds) touches.set(id, (touches.get(id) ?? 0) + each);
      const n = station.playerIds.length;
      const withBall = station.activityKind === 'movement-prep' ? 1 : balls;
      active += n * minutes * rate.activeShare * busy * (0.3 + 0.7 * withBall);
      total += n * minutes;
    }
  }
  const rounded: Record<string, number> = {};
  for (const id of [...touches.keys()].sort()) rounded[id] = Math.round(touches.get(id)!);
  return { touches: rounded, activeShare: total ? Math.round((active / total) * 100) / 100 : 0 };
}
