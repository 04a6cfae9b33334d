import type { TeamInsightDto } from '../../../../../shared/types/plan-api';
import { summariseInsight } from './insight-summary';

const player = (id: string, sessionsAttended: number, averageTouches: number, active = true) => ({
  playerId: id,
  displayName: id.toUpperCase(),
  active,
  sessionsAttended,
  totalTouches: averageTouches * sessionsAttended,
  averageTouches,
});

const insight = (players: TeamInsightDto['players'], present: number[]): TeamInsightDto => ({
  teamId: 't',
  squadSize: players.length,
  sessions: present.map((count, i) => ({
    planId: `p${i}`,
    date: null,
    createdAt: `2026-11-0${i + 1}T10:00:00Z`,
    kind: 'training',
    present: count,
    recorded: true,
    touches: {},
  })),
  players,
  estimateNote: 'estimates',
});

describe('summariseInsight', () => {
  it('names players well below the typical touches, fewest first', () => {
    const summary = summariseInsight(
      insight(
        [player('a', 3, 80), player('b', 3, 78), player('c', 3, 50), player('d', 2, 30), player('e', 3, 82)],
        [5, 4, 5],
      ),
    );
    expect(summary.fewestTouches.map((p) => p.playerId)).toEqual(['d', 'c']);
    expect(summary.touchesLine).toContain('D (about 30), C (about 50)');
    expect(summary.attendanceLine).toBe('3 sessions; on average 4.7 of 5 players came.');
    expect(summary.leastAttending.map((p) => p.playerId)).toEqual(['d']);
  });

  it('calls out nobody when touches are even, and copes with no sessions', () => {
    expect(summariseInsight(insight([player('a', 2, 60), player('b', 2, 58)], [2, 2])).fewestTouches).toEqual(
      [],
    );
    const empty = summariseInsight(insight([player('a', 0, 0)], []));
    expect(empty.attendanceLine).toBe('No sessions yet.');
    expect(empty.leastAttending).toEqual([]);
  });
});
