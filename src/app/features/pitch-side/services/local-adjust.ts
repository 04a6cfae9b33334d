import type { Plan, PlayerMove, PresentPlayer } from '../../../../../shared/types';

/**
 * Without a network the screen still shows who goes where: an arrival joins the smallest group
 * of each phase still to come, a leaver leaves their group, nobody else moves. The server's
 * re-plan replaces this once the queue syncs.
 */
export function adjustRosterLocally(
  plan: Plan,
  change: { add?: PresentPlayer[]; remove?: string[]; fromMinute: number },
): { plan: Plan; moves: PlayerMove[] } {
  const moves: PlayerMove[] = [];
  const removed = new Set(change.remove ?? []);
  const phases = plan.phases.map((phase, phaseIndex) => {
    if (phase.endMinute <= change.fromMinute) return phase;
    const stations = phase.stations.map((station) => {
      const leaving = station.playerIds.filter((id) => removed.has(id));
      for (const playerId of leaving)
        moves.push({ playerId, fromStationId: station.id, toStationId: null, phaseIndex });
      return leaving.length
        ? { ...station, playerIds: station.playerIds.filter((id) => !removed.has(id)) }
        : station;
    });
    for (const player of change.add ?? []) {
      if (stations.length === 0) break;
      let smallest = 0;
      stations.forEach((station, index) => {
        if (station.playerIds.length < stations[smallest].playerIds.length) smallest = index;
      });
      const target = stations[smallest];
      stations[smallest] = { ...target, playerIds: [...target.playerIds, player.id] };
      moves.push({ playerId: player.id, fromStationId: null, toStationId: target.id, phaseIndex });
    }
    return { ...phase, stations };
  });
  const players = [
    ...plan.request.players.filter((player) => !removed.has(player.id)),
    ...(change.add ?? []).filter((player) => !plan.request.players.some((p) => p.id === player.id)),
  ];
  return { plan: { ...plan, phases, request: { ...plan.request, players } }, moves };
}
