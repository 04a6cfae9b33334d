/** Who attacks, defends, keeps goal and in which order players rotate, per activity kind. */
import type {
  ActivityKind,
  KeepBallFormat,
  Level,
  PresentPlayer,
  RuleParameters,
  StationRoles,
} from '../../shared/types';

/** The keep-ball format for a group (players plus a joining coach), most preferred first. */
export function keepBallFormat(params: RuleParameters, level: Level, total: number): KeepBallFormat {
  const exact = params.keepBall[level].formats.find((f) => f.attackers + f.defenders === total);
  if (exact) return exact;
  // Out-of-table sizes (after a coach's edit): fewest defenders that keep the level's ratio.
  const maxRatio = params.keepBall[level].maxAttackersPerDefender;
  const defenders = Math.max(1, Math.ceil(total / (maxRatio + 1)));
  return { attackers: Math.max(0, total - defenders), defenders };
}

export function assignRoles(
  kind: ActivityKind,
  players: PresentPlayer[],
  coachJoins: 0 | 1,
  params: RuleParameters,
  level: Level,
): StationRoles {
  const ids = players.map((p) => p.id);
  switch (kind) {
    case 'keep-ball': {
      const format = keepBallFormat(params, level, ids.length + coachJoins);
      const defenders = ids.slice(ids.length - Math.min(format.defenders, ids.length));
      const attackers = ids.slice(0, ids.length - defenders.length);
      return { attackers, defenders, rotation: [...defenders, ...attackers] };
    }
    case 'passing-finishing': {
      const keeper = keeperIdsOf(players, 1);
      return { goalkeeper: keeper, rotation: ids.filter((id) => !keeper.includes(id)) };
    }
    case 'small-sided-game': {
      const keeperIds = keeperIdsOf(players, 2);
      const outfield = ids.filter((id) => !keeperIds.includes(id));
      const bibs: string[] = [];
      const others: string[] = [];
      keeperIds.forEach((id, i) => (i === 0 ? bibs : others).push(id));
      outfield.forEach((id) => (bibs.length <= others.length ? bibs : others).push(id));
      return { attackers: bibs, defenders: others, goalkeeper: keeperIds };
    }
    case 'pairs':
      return { rotation: ids };
    default:
      return {};
  }
}

/** The first `limit` goalkeepers' ids; only the kinds with a goal need them. */
function keeperIdsOf(players: PresentPlayer[], limit: number): string[] {
  const out: string[] = [];
  for (const p of players) {
    if (out.length === limit) break;
    if (p.goalkeeper) out.push(p.id);
  }
  return out;
}
