import { Injectable } from '@angular/core';
import type { PlayerDto, RuleSetDocument, SessionPlanDto } from '../../../../../shared/types';
import { plansWithQueuedActions } from './action-queue';
import type { ClockState } from './phase-clock';
import {
  copiesToDrop,
  SNAPSHOT_RETENTION,
  type RetentionPolicy,
  type StoredCopy,
} from './snapshot-retention';

/** What the pitch-side screen needs to reopen without a network. */
export interface PitchSnapshot {
  session: SessionPlanDto;
  roster: PlayerDto[];
  clock: ClockState;
  /** The rule-set document the plan was made with, for re-plans without a network. */
  rules?: RuleSetDocument | null;
  /** Latest verdict per station key (`phaseIndex:stationId`). */
  verdicts: Record<string, string>;
}

const PREFIX = 'conewise.pitch-side.plan.';
/** Plan id → last save (epoch ms), kept apart so pruning never parses the copies themselves. */
const SAVED_AT_KEY = 'conewise.pitch-side.saved-at';
const key = (planId: string) => `${PREFIX}${planId}`;

/** With the storage full, every copy that is neither being saved nor waiting to sync makes room. */
const MAKE_ROOM: RetentionPolicy = { ...SNAPSHOT_RETENTION, maxCopies: 0 };

/**
 * Keeps the last state of a running plan on the device (beside the service worker's cache), and
 * drops old copies of other plans so the device's storage does not grow with every session.
 */
@Injectable({ providedIn: 'root' })
export class PlanSnapshot {
  /** Saves the plan's state; storage full or blocked loses only this copy, never the running plan. */
  save(planId: string, snapshot: PitchSnapshot, now = Date.now()): void {
    try {
      const value = JSON.stringify(snapshot);
      let savedAt = prune(planId, now, SNAPSHOT_RETENTION);
      try {
        localStorage.setItem(key(planId), value);
      } catch (error) {
        if (!isQuotaError(error)) throw error;
        savedAt = prune(planId, now, MAKE_ROOM);
        localStorage.setItem(key(planId), value);
      }
      savedAt[planId] = now;
      localStorage.setItem(SAVED_AT_KEY, JSON.stringify(savedAt));
    } catch {
      // Storage still full or blocked: the plan still runs; only a reload offline would lose it.
    }
  }

  /** The copy saved on this device, or null when there is none (or it cannot be read). */
  read(planId: string): PitchSnapshot | null {
    try {
      const raw = localStorage.getItem(key(planId));
      const parsed = raw ? (JSON.parse(raw) as PitchSnapshot) : null;
      return parsed?.session?.plan?.phases ? parsed : null;
    } catch {
      return null;
    }
  }
}

/** Removes the copies the policy lets go; returns the saved times of those left. */
function prune(planId: string, now: number, policy: RetentionPolicy): Record<string, number> {
  const stamps = readSavedAt();
  // A copy without a stamp predates the stamps: its age counts from now.
  const copies: StoredCopy[] = storedPlanIds().map((id) => ({ planId: id, savedAt: stamps[id] ?? now }));
  const drop = new Set(
    copiesToDrop(copies, { now, queuedPlanIds: plansWithQueuedActions(), keepPlanId: planId }, policy),
  );
  for (const id of drop) localStorage.removeItem(key(id));
  const kept: Record<string, number> = {};
  for (const copy of copies) if (!drop.has(copy.planId)) kept[copy.planId] = copy.savedAt;
  return kept;
}

function storedPlanIds(): string[] {
  const ids: string[] = [];
  for (let i = 0; i < localStorage.length; i++) {
    const name = localStorage.key(i);
    if (name?.startsWith(PREFIX)) ids.push(name.slice(PREFIX.length));
  }
  return ids;
}

function readSavedAt(): Record<string, number> {
  try {
    const parsed: unknown = JSON.parse(localStorage.getItem(SAVED_AT_KEY) ?? '{}');
    return parsed && typeof parsed === 'object' && !Array.isArray(parsed)
      ? (parsed as Record<string, number>)
      : {};
  } catch {
    return {};
  }
}

/** Browsers name a full storage differently (Firefox has its own name; old engines only set a code). */
function isQuotaError(error: unknown): boolean {
  if (typeof error !== 'object' || error === null) return false;
  const { name, code } = error as { name?: unknown; code?: unknown };
  return (
    name === 'QuotaExceededError' || name === 'NS_ERROR_DOM_QUOTA_REACHED' || code === 22 || code === 1014
  );
}
