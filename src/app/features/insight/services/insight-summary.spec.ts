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
    cameLate: i === 0 ? 1 : 0,
    leftEarly: i === 1 ? 2 : 0,
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
    expect(summary.attendanceLine).toBe('On average 4.7 of 5 players came to each of 3 sessions.');
    expect(summary.regularityLine).toBe('Every player came to at least half of them.');
    expect(summary.partLine).toBe('Counted as came: 1 late arrival and 2 early leavers.');
  });

  it('words attendance for the squad and never names a child', () => {
    const summary = summariseInsight(
      insight(
        [player('ana', 4, 60), player('ben', 1, 60), player('cai', 0, 0), player('dev', 2, 60)],
        [3, 2, 2, 1],
      ),
    );
    expect(summary.regularityLine).toBe('2 players came to fewer than half of them.');
    for (const line of [summary.attendanceLine, summary.regularityLine, summary.partLine])
      expect(line).not.toMatch(/ANA|BEN|CAI|DEV/);
  });

  it('calls out nobody when touches are even, and copes with no sessions', () => {
    expect(summariseInsight(insight([player('a', 2, 60), player('b', 2, 58)], [2, 2])).fewestTouches).toEqual(
      [],
    );
    const empty = summariseInsight(insight([player('a', 0, 0)], []));
    expect(empty.attendanceLine).toBe('No sessions yet.');
    expect(empty.regularityLine).toBe('');
  });
});
