/**
 * A club registered through the API of a running instance, with one team of eight players, and
 * the body of a short plan for that team: what the fault suites create under load.
 */
import type { ApiClient } from './api-client';
import { TEST_PASSWORD, uniqueEmail } from './api-test-app';

export interface ClubWithTeam {
  token: string;
  clubId: string;
  teamId: string;
  playerIds: string[];
}

const PLAYERS = ['Ana R.', 'Bo R.', 'Cy R.', 'Di R.', 'Ed R.', 'Flo R.', 'Gil R.', 'Hal R.'];

/** Registers a club (its lead signed in), adds a U10 team and its players; throws on any refusal. */
export async function registerClubWithTeam(api: ApiClient, clubName: string): Promise<ClubWithTeam> {
  const registered = await api.post('/api/auth/register', {
    clubName,
    name: 'Rita Restart',
    email: uniqueEmail('fault'),
    password: TEST_PASSWORD,
  });
  if (registered.status !== 201) throw new Error(`register: ${registered.status} ${registered.text}`);
  const token: string = registered.body.token;
  const team = await api.post(
    '/api/teams',
    { name: 'U10 Sparks', ageGroup: 'U10', level: 'beginner', usualSpace: { width: 30, length: 40 } },
    { token },
  );
  if (team.status !== 201) throw new Error(`team: ${team.status} ${team.text}`);
  const playerIds: string[] = [];
  for (const displayName of PLAYERS) {
    const player = await api.post(`/api/teams/${team.body.id}/players`, { displayName }, { token });
    if (player.status !== 201) throw new Error(`player: ${player.status} ${player.text}`);
    playerIds.push(player.body.id);
  }
  return { token, clubId: registered.body.user.clubId, teamId: team.body.id, playerIds };
}

/** POST /api/plans body: a 15-minute warm-up for the whole team. */
export function planBody(club: ClubWithTeam): Record<string, unknown> {
  return {
    teamId: club.teamId,
    request: {
      ageGroup: 'U10',
      level: 'beginner',
      players: club.playerIds.map((id) => ({ id })),
      coaches: 1,
      equipment: { balls: 10, cones: 30, bibs: 8, goals: 2 },
      space: { width: 30, length: 40 },
      minutes: 15,
      kind: 'match-warm-up',
    },
  };
}
