import { computed, DestroyRef, inject, Injectable, signal } from '@angular/core';
import type { Phase } from '../../../../../shared/types';
import {
  elapsedSeconds,
  jumpToMinute,
  pauseClock,
  readClock,
  startClock,
  STOPPED_CLOCK,
  type ClockReading,
  type ClockState,
} from './phase-clock';

/** The session clock of one pitch-side screen: started, paused and moved by the coach, read each second. */
@Injectable()
export class PitchClock {
  /** Where the clock stands; saved with the plan so a reload does not reset it. */
  readonly state = signal<ClockState>(STOPPED_CLOCK);
  /** The time now, moved on each second while the screen is open. */
  private readonly now = signal(Date.now());
  /** Whether the session has been started (running or paused). */
  readonly started = computed(() => this.state().startedAt !== null);
  /** Whether the clock is running now. */
  readonly running = computed(() => this.started() && this.state().pausedAt === null);

  constructor() {
    const ticker = setInterval(() => this.now.set(Date.now()), 1000);
    inject(DestroyRef).onDestroy(() => clearInterval(ticker));
  }

  /** The phase running and the time left in it (reads signals: call it inside a computed). */
  read(phases: readonly Phase[]): ClockReading {
    return readClock(this.state(), phases, this.now());
  }

  /** The whole minutes run so far, 0 before the start: where a re-plan begins. */
  minuteNow(): number {
    return Math.floor(elapsedSeconds(this.state(), this.now()) / 60);
  }

  /** Starts the session, or resumes it after a pause. */
  start(): void {
    this.state.update((state) => startClock(state, Date.now()));
  }

  pause(): void {
    this.state.update((state) => pauseClock(state, Date.now()));
  }

  /** Moves to a minute of the session (a phase's start), paused or running as it was. */
  jumpTo(minute: number): void {
    this.state.update((state) => jumpToMinute(state, minute, Date.now()));
  }

  /** Takes up a clock saved on the device. */
  restore(state: ClockState): void {
    this.state.set(state);
  }
}
