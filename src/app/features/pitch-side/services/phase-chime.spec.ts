import { TestBed } from '@angular/core/testing';
import type { ClockReading } from './phase-clock';
import { PhaseChime } from './phase-chime';

const at = (phaseIndex: number, finished = false): ClockReading => ({
  elapsedSeconds: 0,
  phaseIndex,
  secondsLeft: 60,
  phaseProgress: 0,
  finished,
});

describe('PhaseChime', () => {
  /** Each buzz pattern the phone was asked for. */
  let buzzes: number[][];
  const original = Object.getOwnPropertyDescriptor(navigator, 'vibrate');

  beforeEach(() => {
    buzzes = [];
    Object.defineProperty(navigator, 'vibrate', {
      configurable: true,
      value: (pattern: number[]) => buzzes.push(pattern) > 0,
    });
    TestBed.configureTestingModule({ providers: [PhaseChime] });
  });
  afterEach(() => {
    if (original) Object.defineProperty(navigator, 'vibrate', original);
    else delete (navigator as { vibrate?: unknown }).vibrate;
  });

  it('rings when the running clock crosses into the next phase and at the end, not at the start', () => {
    const chime = TestBed.inject(PhaseChime);
    expect(chime.ringOnPhaseChange(at(0), 3, true)).toBe(false);
    expect(chime.ringOnPhaseChange(at(0), 3, true)).toBe(false);
    expect(chime.ringOnPhaseChange(at(1), 3, true)).toBe(true);
    expect(chime.ringOnPhaseChange(at(2, true), 3, true)).toBe(true);
    expect(chime.ringOnPhaseChange(at(2, true), 3, true)).toBe(false);
    expect(buzzes).toEqual([
      [160, 90, 160],
      [160, 90, 160],
    ]);
  });

  it('stays quiet for a phase reached while paused or jumped to before resuming', () => {
    const chime = TestBed.inject(PhaseChime);
    chime.ringOnPhaseChange(at(0), 3, true);
    expect(chime.ringOnPhaseChange(at(1), 3, false)).toBe(false);
    expect(chime.ringOnPhaseChange(at(1), 3, true)).toBe(false);
    expect(chime.ringOnPhaseChange(at(2), 3, true)).toBe(true);
    expect(buzzes).toHaveLength(1);
  });
});
