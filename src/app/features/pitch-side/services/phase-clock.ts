import type { Phase } from '../../../../../shared/types';

/** Where the session clock stands, kept per plan so a reload does not reset it. */
export interface ClockState {
  /** Epoch ms when the session started, shifted by pauses and skips; null before the start. */
  startedAt: number | null;
  /** Epoch ms when the clock was paused, or null while it runs. */
  pausedAt: number | null;
}

export const STOPPED_CLOCK: ClockState = { startedAt: null, pausedAt: null };

/** Where the session is at a moment: the phase running and the seconds left in it. */
export interface ClockReading {
  elapsedSeconds: number;
  phaseIndex: number;
  secondsLeft: number;
  /** 0–1 of the current phase done. */
  phaseProgress: number;
  finished: boolean;
}

export function elapsedSeconds(state: ClockState, now: number): number {
  if (state.startedAt === null) return 0;
  return Math.max(0, ((state.pausedAt ?? now) - state.startedAt) / 1000);
}

/** Reads the clock against the plan's phases. */
export function readClock(state: ClockState, phases: readonly Phase[], now: number): ClockReading {
  const elapsed = elapsedSeconds(state, now);
  const total = (phases.at(-1)?.endMinute ?? 0) * 60;
  if (phases.length === 0 || elapsed >= total) {
    return {
      elapsedSeconds: elapsed,
      phaseIndex: Math.max(0, phases.length - 1),
      secondsLeft: 0,
      phaseProgress: 1,
      finished: phases.length > 0,
    };
  }
  const index = phases.findIndex((phase) => elapsed < phase.endMinute * 60);
  const phase = phases[index];
  const length = (phase.endMinute - phase.startMinute) * 60;
  const left = phase.endMinute * 60 - elapsed;
  return {
    elapsedSeconds: elapsed,
    phaseIndex: index,
    secondsLeft: Math.ceil(left),
    phaseProgress: length > 0 ? 1 - left / length : 1,
    finished: false,
  };
}

export function startClock(state: ClockState, now: number): ClockState {
  if (state.startedAt === null) return { startedAt: now, pausedAt: null };
  if (state.pausedAt !== null) return { startedAt: state.startedAt + (now - state.pausedAt), pausedAt: null };
  return state;
}

export function pauseClock(state: ClockState, now: number): ClockState {
  return state.startedAt === null || state.pausedAt !== null ? state : { ...state, pausedAt: now };
}

/** Moves the clock to the start of a phase, keeping it paused or running as it was. */
export function jumpToMinute(state: ClockState, minute: number, now: number): ClockState {
  const at = state.pausedAt ?? now;
  return {
    startedAt: at - minute * 60_000,
    pausedAt: state.pausedAt ?? (state.startedAt === null ? now : null),
  };
}

/** 125 → "2:05". */
export function formatCountdown(seconds: number): string {
  const whole = Math.max(0, Math.round(seconds));
  return `${Math.floor(whole / 60)}:${String(whole % 60).padStart(2, '0')}`;
}
