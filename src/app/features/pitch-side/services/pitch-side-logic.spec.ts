import type { Phase, Plan, Station } from '../../../../../shared/types';
import { adjustRosterLocally } from './local-adjust';
import {
  formatCountdown,
  jumpToMinute,
  pauseClock,
  readClock,
  startClock,
  STOPPED_CLOCK,
} from './phase-clock';

const phase = (
  name: string,
  startMinute: number,
  endMinute: number,
  stations: Partial<Station>[] = [],
): Phase => ({
  name,
  activityId: name,
  activityKind: stations.length ? 'keep-ball' : 'break',
  startMinute,
  endMinute,
  stations: stations.map(
    (s, i) => ({ id: `${name}-${i}`, playerIds: [], positions: [], roles: {}, ...s }) as Station,
  ),
});

describe('phase clock', () => {
  const phases = [phase('A', 0, 5), phase('B', 5, 12), phase('C', 12, 20)];

  it('reads the phase and the seconds left, paused or running', () => {
    const t0 = 1_000_000;
    let clock = startClock(STOPPED_CLOCK, t0);
    expect(readClock(clock, phases, t0 + 61_000)).toMatchObject({ phaseIndex: 0, secondsLeft: 239 });
    expect(readClock(clock, phases, t0 + 6 * 60_000)).toMatchObject({ phaseIndex: 1, secondsLeft: 360 });
    clock = pauseClock(clock, t0 + 6 * 60_000);
    expect(readClock(clock, phases, t0 + 60 * 60_000).phaseIndex).toBe(1);
    clock = startClock(clock, t0 + 10 * 60_000);
    expect(readClock(clock, phases, t0 + 11 * 60_000)).toMatchObject({ phaseIndex: 1, secondsLeft: 300 });
    expect(readClock(clock, phases, t0 + 40 * 60_000).finished).toBe(true);
  });

  it('jumps to the start of a phase', () => {
    const clock = jumpToMinute(startClock(STOPPED_CLOCK, 0), 12, 5_000);
    expect(readClock(clock, phases, 5_000)).toMatchObject({ phaseIndex: 2, secondsLeft: 480 });
  });

  it('formats minutes and seconds', () => {
    expect(formatCountdown(125)).toBe('2:05');
    expect(formatCountdown(0)).toBe('0:00');
    expect(formatCountdown(-3)).toBe('0:00');
  });
});

describe('adjustRosterLocally', () => {
  const plan = {
    request: { players: [{ id: 'a' }, { id: 'b' }, { id: 'c' }, { id: 'd' }, { id: 'e' }] },
    phases: [
      phase('A', 0, 5, [{ playerIds: ['a', 'b', 'c'] }, { playerIds: ['d', 'e'] }]),
      phase('B', 5, 10, [{ playerIds: ['a', 'd'] }, { playerIds: ['b', 'c', 'e'] }]),
    ],
  } as unknown as Plan;

  it('puts an arrival in the smallest group of each phase still to come and moves nobody else', () => {
    const { plan: next, moves } = adjustRosterLocally(plan, { add: [{ id: 'f', name: 'F' }], fromMinute: 5 });
    expect(next.phases[0]).toBe(plan.phases[0]);
    expect(next.phases[1].stations.map((s) => s.playerIds)).toEqual([
      ['a', 'd', 'f'],
      ['b', 'c', 'e'],
    ]);
    expect(moves).toEqual([{ playerId: 'f', fromStationId: null, toStationId: 'B-0', phaseIndex: 1 }]);
    expect(next.request.players.map((p) => p.id)).toEqual(['a', 'b', 'c', 'd', 'e', 'f']);
  });

  it('takes a leaver out of every phase still to come', () => {
    const { plan: next, moves } = adjustRosterLocally(plan, { remove: ['c'], fromMinute: 0 });
    expect(next.phases.flatMap((p) => p.stations.flatMap((s) => s.playerIds))).not.toContain('c');
    expect(moves.map((m) => m.phaseIndex)).toEqual([0, 1]);
    expect(next.request.players).toHaveLength(4);
  });

  it("takes a leaver off a game's side and out of its diagram, and skips a drinks break", () => {
    const game = {
      request: { players: ['a', 'b', 'c', 'd'].map((id) => ({ id })) },
      phases: [
        phase('Game', 0, 8, [
          {
            playerIds: ['a', 'b', 'c', 'd'],
            roles: {
              teams: [
                ['a', 'b'],
                ['c', 'd'],
              ],
              goalkeeper: ['a', 'c'],
            },
            positions: ['a', 'b', 'c', 'd'].map((id, i) => ({
              id,
              role: i < 2 ? 'team-a' : 'team-b',
              x: i,
              y: i,
            })),
          },
        ]),
        phase('Drinks break', 8, 10),
      ],
    } as unknown as Plan;
    const { plan: next } = adjustRosterLocally(game, { remove: ['c'], add: [{ id: 'e' }], fromMinute: 0 });
    const [station] = next.phases[0].stations;
    expect(station.roles.teams).toEqual([['a', 'b'], ['d']]);
    expect(station.roles.goalkeeper).toEqual(['a']);
    expect(station.positions.map((p) => p.id)).toEqual(['a', 'b', 'd']);
    expect(station.playerIds).toEqual(['a', 'b', 'd', 'e']);
    expect(next.phases[1].stations).toEqual([]);
  });
});
