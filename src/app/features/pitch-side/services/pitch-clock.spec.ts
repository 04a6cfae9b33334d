import { vi } from 'vitest';
import { TestBed } from '@angular/core/testing';
import type { Phase } from '../../../../../shared/types';
import { PitchClock } from './pitch-clock';

const phase = (name: string, startMinute: number, endMinute: number) =>
  ({ name, activityId: name, activityKind: 'break', startMinute, endMinute, stations: [] }) as Phase;
const phases = [phase('A', 0, 5), phase('B', 5, 12)];

describe('PitchClock', () => {
  beforeEach(() => {
    vi.useFakeTimers({ toFake: ['Date', 'setInterval', 'clearInterval'] });
    vi.setSystemTime(new Date('2031-05-06T18:00:00Z'));
    TestBed.configureTestingModule({ providers: [PitchClock] });
  });
  afterEach(() => {
    TestBed.resetTestingModule();
    vi.useRealTimers();
  });

  it('stands still until started, then counts down each second', () => {
    const clock = TestBed.inject(PitchClock);
    vi.advanceTimersByTime(30_000);
    expect(clock.started()).toBe(false);
    expect(clock.read(phases)).toMatchObject({ phaseIndex: 0, secondsLeft: 300 });
    clock.start();
    expect(clock.running()).toBe(true);
    vi.advanceTimersByTime(61_000);
    expect(clock.read(phases)).toMatchObject({ phaseIndex: 0, secondsLeft: 239 });
    expect(clock.minuteNow()).toBe(1);
  });

  it('pauses, resumes where it stopped and jumps to a phase as it was', () => {
    const clock = TestBed.inject(PitchClock);
    clock.start();
    vi.advanceTimersByTime(60_000);
    clock.pause();
    vi.advanceTimersByTime(10 * 60_000);
    expect(clock.running()).toBe(false);
    expect(clock.read(phases).secondsLeft).toBe(240);
    clock.jumpTo(5);
    expect(clock.running()).toBe(false);
    expect(clock.read(phases)).toMatchObject({ phaseIndex: 1, secondsLeft: 420 });
    clock.start();
    vi.advanceTimersByTime(2 * 60_000);
    expect(clock.read(phases)).toMatchObject({ phaseIndex: 1, secondsLeft: 300 });
    expect(clock.minuteNow()).toBe(7);
  });

  it('takes up a saved clock, and stops ticking when the screen closes', () => {
    const clock = TestBed.inject(PitchClock);
    clock.restore({ startedAt: Date.now() - 6 * 60_000, pausedAt: null });
    expect(clock.read(phases)).toMatchObject({ phaseIndex: 1, secondsLeft: 360 });
    expect(vi.getTimerCount()).toBe(1);
    TestBed.resetTestingModule();
    expect(vi.getTimerCount()).toBe(0);
  });
});
