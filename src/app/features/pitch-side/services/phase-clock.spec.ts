import type { Phase, Station } from '../../../../../shared/types';
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
