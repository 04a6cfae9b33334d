import { describe, expect, it } from 'vitest';
import { parseClock, planLength, sessionClock, storedClock, wrapDay } from './session-clock';

describe('session clock', () => {
  it('reads stored HH:MM times and refuses anything else', () => {
    expect(parseClock('09:45')).toBe(585);
    expect(parseClock('18:00')).toBe(1080);
    expect(parseClock('24:00')).toBeNull();
    expect(parseClock('9.45')).toBeNull();
    expect(parseClock('')).toBeNull();
    expect(parseClock(null)).toBeNull();
  });

  it('wraps past midnight both ways', () => {
    expect(wrapDay(-15)).toBe(1425);
    expect(wrapDay(1450)).toBe(10);
    expect(storedClock(-15)).toBe('23:45');
    expect(storedClock(605)).toBe('10:05');
  });

  it('ends a match warm-up at kick-off', () => {
    const clock = sessionClock('match-warm-up', '10:30', 20);
    expect(clock.start).toBe(610);
    expect(clock.end).toBe(630);
    expect(clock.at(5)).toBe(615);
  });

  it('starts a training session at its start time', () => {
    const clock = sessionClock('training', '18:00', 60);
    expect(clock.start).toBe(1080);
    expect(clock.end).toBe(1140);
    expect(clock.at(15)).toBe(1095);
  });

  it('has no clock times without a time', () => {
    const clock = sessionClock('training', null, 60);
    expect([clock.start, clock.end, clock.at(10)]).toEqual([null, null, null]);
  });

  it('measures a plan by its last phase', () => {
    expect(planLength([{ endMinute: 10 }, { endMinute: 25 }])).toBe(25);
    expect(planLength([])).toBe(0);
  });
});
