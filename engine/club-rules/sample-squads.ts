import '../../shared/i18n/localize';
import requestSchema from '../../shared/schemas/plan-request.schema.json';
import type { KitBagDto, TeamDto } from '../../shared/types/api';
import type { AgeGroup, Level, PlanRequest } from '../../shared/types/plan-request';

/** A squad to try rules against, named for the situation it tests. */
export interface SampleSquad {
  id: string;
  label: string;
  request: PlanRequest;
}

/** The engine takes at most this many players in one plan (the plan-request schema's own limit). */
const MAX_PLAYERS = requestSchema.properties.players.maxItems;

/** Made-up players "Player 1" … "Player n"; given `keepers`, the first that many are goalkeepers. */
function players(count: number, idPrefix: string, keepers?: number): PlanRequest['players'] {
  return Array.from({ length: count }, (_, i) => ({
    id: `${idPrefix}-${i + 1}`,
    name: $localize`:A made-up player's name in a sample squad:Player ${i + 1}:number:`,
    ...(keepers === undefined ? {} : { goalkeeper: i < keepers }),
  }));
}

/** What every squad tried shares: a 20-minute match warm-up with one coach and the same seed. */
function tryRequest(request: Omit<PlanRequest, 'minutes' | 'kind' | 'seed' | 'coaches'>): PlanRequest {
  return { coaches: 1, minutes: 20, kind: 'match-warm-up', seed: 'try-it', ...request };
}

/** The five situations every rule change should survive: small, odd, large, a tiny space, no goals. */
export function sampleSquads(ageGroup: AgeGroup, level: Level): SampleSquad[] {
  const base = (count: number): PlanRequest =>
    tryRequest({
      ageGroup,
      level,
      players: players(count, 'sample', count >= 10 ? 1 : 0),
      equipment: { balls: count + 2, cones: 30, bibs: 12, goals: 2 },
      space: { width: 40, length: 50 },
    });
  return [
    { id: 'small', label: $localize`:A sample squad of 5 players:Small squad (5)`, request: base(5) },
    { id: 'odd', label: $localize`:A sample squad of 13 players:Odd numbers (13)`, request: base(13) },
    {
      id: 'large',
      label: $localize`:A sample squad of 24 players:Large squad (24)`,
      request: { ...base(24), coaches: 2, space: { width: 60, length: 70 } },
    },
    {
      id: 'tiny-space',
      label: $localize`:A sample squad; the size stays in metres written as 15 × 20 m:Tiny space (12 on 15 × 20 m)`,
      request: { ...base(12), space: { width: 15, length: 20 } },
    },
    {
      id: 'no-goals',
      label: $localize`:A sample squad of 11 players:No goals (11)`,
      request: { ...base(11), equipment: { balls: 12, cones: 24, bibs: 10, goals: 0 } },
    },
  ];
}

/**
 * A club team as it usually trains: its age group and level, its active players, its usual space and
 * its kit bag. Null for a team with no active players, which the engine cannot plan for.
 */
export function teamSquad(team: TeamDto, kit: KitBagDto): SampleSquad | null {
  const count = Math.min(team.playerCount, MAX_PLAYERS);
  if (count < 1) return null;
  const { width, length } = team.usualSpace;
  return {
    id: `team-${team.id}`,
    label: $localize`:A team's usual squad, space and kit; the size stays in metres written as 30 × 36 m:${team.name}:team: as usual (${count}:players: players on ${width}:width: × ${length}:length: m, ${kit.balls}:balls: balls, ${kit.goals}:goals: goals)`,
    request: tryRequest({
      ageGroup: team.ageGroup,
      level: team.level,
      players: players(count, 'team'),
      equipment: { balls: kit.balls, cones: kit.cones, bibs: kit.bibs, goals: kit.goals },
      space: { width, length },
    }),
  };
}
