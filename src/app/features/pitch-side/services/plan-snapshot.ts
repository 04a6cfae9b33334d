import type { PlayerDto, SessionPlanDto } from '../../../../../shared/types';
import type { ClockState } from './phase-clock';

/** What the pitch-side screen needs to reopen without a network. */
export interface PitchSnapshot {
  session: SessionPlanDto;
  roster: PlayerDto[];
  clock: ClockState;
  /** The rule-set document the plan was made with, for re-plans without a network. */
  rules?: unknown;
  /** Latest verdict per station key (`phaseIndex:stationId`). */
  verdicts: Record<string, string>;
}

const key = (planId: string) => `conewise.pitch-side.plan.${planId}`;

/** Keeps the last state of a running plan on the device (beside the service worker's cache). */
export function saveSnapshot(planId: string, snapshot: PitchSnapshot): void {
  try {
    localStorage.setItem(key(planId), JSON.stringify(snapshot));
  } catch {
    // Storage full: the plan still runs; only a reload offline would lose it.
  }
}

export function readSnapshot(planId: string): PitchSnapshot | null {
  try {
    const raw = localStorage.getItem(key(planId));
    const parsed = raw ? (JSON.parse(raw) as PitchSnapshot) : null;
    return parsed?.session?.plan?.phases ? parsed : null;
  } catch {
    return null;
  }
}
