import type { Plan, PlayerMove, PresentPlayer } from '../../../../../shared/types';

/**
 * Until the engine's re-plan is ready (it loads lazily; the server's answer replaces both) the
 * screen still shows who goes where: an arrival joins the smallest group of each phase still to
 * come (with no start position: the diagram draws only what the engine placed), a leaver leaves
 * their group, roles and start position, nobody else moves. Drinks breaks have no groups.
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
      if (!leaving.length) return station;
      const keep = (ids: string[] | undefined) => ids?.filter((id) => !removed.has(id));
      const { teams, ...lists } = station.roles;
      const roles = Object.fromEntries(
        Object.entries(lists).map(([role, ids]) => [role, keep(ids as string[])]),
      ) as typeof station.roles;
      if (teams) roles.teams = [keep(teams[0])!, keep(teams[1])!];
      return {
        ...station,
        playerIds: station.playerIds.filter((id) => !removed.has(id)),
        positions: station.positions.filter((p) => !removed.has(p.id)),
        roles,
      };
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
  // Recorded as the engine records it, so the leaver is not "not here yet" and the register knows.
  const rosterChanges = [
    ...(plan.rosterChanges ?? []),
    {
      fromMinute: change.fromMinute,
      added: (change.add ?? [])
        .filter((a) => !plan.request.players.some((p) => p.id === a.id))
        .map((a) => a.id),
      removed: [...removed].filter((id) => plan.request.players.some((p) => p.id === id)),
    },
  ];
  return { plan: { ...plan, phases, rosterChanges, request: { ...plan.request, players } }, moves };
}
