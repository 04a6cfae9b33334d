/** Balls and bibs for a phase's stations, never more than the bag holds; shortfalls are warned. */
import type { Notice, RuleParameters, Station } from '../../shared/types';

/** Balls a station would like: per player for ball-each activities, at least its minimum. */
export function ballDemand(station: Station, params: RuleParameters): number {
  const k = params.kinds[station.activityKind];
  const players = station.playerIds.length + station.coachJoins;
  return Math.max(k.minBallsPerStation, Math.ceil(k.ballsPerPlayer * players - 1e-9));
}

export function bibDemand(station: Station): number {
  if (station.activityKind === 'keep-ball') return station.roles.defenders?.length ?? 0;
  if (station.activityKind === 'small-sided-game') return station.roles.attackers?.length ?? 0;
  return 0;
}

/** Hands out balls and bibs one at a time across stations, so a shortage is shared fairly. */
export function equipPhase(
  stations: Station[],
  params: RuleParameters,
  kit: { balls: number; bibs: number },
  warnings: Notice[],
  phaseName: string,
): void {
  const balls = share(
    stations.map((s) => ballDemand(s, params)),
    kit.balls,
  );
  const bibs = share(stations.map(bibDemand), kit.bibs);
  stations.forEach((s, i) => {
    s.equipment = { ...s.equipment, balls: balls.given[i], bibs: bibs.given[i] };
  });
  if (balls.short > 0) {
    warnings.push({
      code: 'balls-short',
      message: `${phaseName}: ${balls.wanted} balls would give everyone one, the bag has ${kit.balls}; players share in turns.`,
    });
  }
  if (stations.some((s, i) => balls.given[i] === 0 && ballDemand(s, params) > 0)) {
    warnings.push({
      code: 'station-without-ball',
      message: `${phaseName}: some stations have no ball at all.`,
    });
  }
  if (bibs.short > 0) {
    warnings.push({
      code: 'bibs-short',
      message: `${phaseName}: ${bibs.wanted} bibs needed, ${kit.bibs} in the bag — use shirt colours to tell teams apart.`,
    });
  }
}

function share(demand: number[], available: number): { given: number[]; wanted: number; short: number } {
  const given = demand.map(() => 0);
  const wanted = demand.reduce((s, d) => s + d, 0);
  let left = Math.min(available, wanted);
  while (left > 0) {
    for (let i = 0; i < demand.length && left > 0; i++) {
      if (given[i] < demand[i]) {
        given[i]++;
        left--;
      }
    }
  }
  return { given, wanted, short: Math.max(0, wanted - available) };
}
