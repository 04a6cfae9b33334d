import requestSchema from '../../../../../shared/schemas/plan-request.schema.json';
import type { KitBagDto, TeamDto } from '../../../../../shared/types';
import type { SampleSquad } from './sample-squads';

/** The engine takes at most this many players in one plan (the plan-request schema's own limit). */
const MAX_PLAYERS = requestSchema.properties.players.maxItems;

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
    request: {
      ageGroup: team.ageGroup,
      level: team.level,
      players: Array.from({ length: count }, (_, i) => ({
        id: `team-${i + 1}`,
        name: $localize`:A made-up player's name in a sample squad:Player ${i + 1}:number:`,
      })),
      coaches: 1,
      equipment: { balls: kit.balls, cones: kit.cones, bibs: kit.bibs, goals: kit.goals },
      space: { width, length },
      minutes: 20,
      kind: 'match-warm-up',
      seed: 'try-it',
    },
  };
}
