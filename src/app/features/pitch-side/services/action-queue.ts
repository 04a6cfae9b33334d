import { HttpErrorResponse } from '@angular/common/http';
import { DestroyRef, inject, Injectable, signal } from '@angular/core';
import { firstValueFrom, Observable, Subject, timeout, TimeoutError } from 'rxjs';
import type { PlanChangeDto, ReplanBody, VerdictBody } from '../../../../../shared/types';
import { PlansApi } from '../../../core/api/plans-api';
import { PITCH_SIDE_QUEUE_KEY } from '../../../core/auth/device-data';
import { problemMessage } from '../../../core/http/problem-message';

/** One pitch-side action waiting to reach the server. */
export type QueuedAction =
  | { kind: 'replan'; clientId: string; planId: string; queuedAt: string; body: ReplanBody }
  | { kind: 'progression'; clientId: string; planId: string; queuedAt: string; body: VerdictBody }
  | { kind: 'feedback'; clientId: string; planId: string; queuedAt: string; body: VerdictBody };

/** What the server made of a synced action. */
export interface SyncedAction {
  action: QueuedAction;
  change: PlanChangeDto | null;
}

const STORAGE_KEY = PITCH_SIDE_QUEUE_KEY;
/** First wait before retrying an unsent action, doubling up to the most. */
const RETRY_FIRST_MS = 3_000;
const RETRY_MAX_MS = 30_000;
const SEND_TIMEOUT_MS = 15_000;

/**
 * Pitch-side actions go through this queue, online or not: each is kept in localStorage with its
 * client id until the server confirms it, so a dropped connection loses nothing, and the server's
 * dedupe by client id means a replay after a lost answer is stored once.
 */
@Injectable({ providedIn: 'root' })
export class ActionQueue {
  private readonly api = inject(PlansApi);
  private readonly syncedActions = new Subject<SyncedAction>();
  private flushing = false;
  private retryTimer: ReturnType<typeof setTimeout> | null = null;
  private retryDelayMs = RETRY_FIRST_MS;

  /** Actions not yet confirmed by the server, oldest first. */
  readonly pending = signal<QueuedAction[]>(readStored());
  /** Whether the browser believes it has a network. */
  readonly online = signal(typeof navigator === 'undefined' ? true : navigator.onLine);
  /** Actions the server refused for good (e.g. the plan was deleted), with its reason. */
  readonly refused = signal<{ action: QueuedAction; message: string }[]>([]);
  /** Emits each action once the server has it. */
  readonly synced = this.syncedActions.asObservable();

  constructor() {
    const goOnline = () => {
      this.online.set(true);
      void this.flush();
    };
    const goOffline = () => this.online.set(false);
    const onVisible = () => {
      if (globalThis.document?.visibilityState === 'visible') void this.flush();
    };
    globalThis.addEventListener?.('online', goOnline);
    globalThis.addEventListener?.('offline', goOffline);
    globalThis.document?.addEventListener('visibilitychange', onVisible);
    inject(DestroyRef).onDestroy(() => {
      globalThis.removeEventListener?.('online', goOnline);
      globalThis.removeEventListener?.('offline', goOffline);
      globalThis.document?.removeEventListener('visibilitychange', onVisible);
      if (this.retryTimer) clearTimeout(this.retryTimer);
    });
  }

  /** Pending actions of one plan. */
  pendingFor(planId: string): QueuedAction[] {
    return this.pending().filter((action) => action.planId === planId);
  }

  /** Keeps the action, then tries to send everything queued. */
  enqueue(action: QueuedAction): Promise<void> {
    this.pending.update((list) => [...list, action]);
    this.persist();
    return this.flush();
  }

  /** Sends queued actions in order; stops at the first one the network or server cannot take now. */
  async flush(): Promise<void> {
    if (this.flushing) return;
    this.flushing = true;
    try {
      while (this.pending().length > 0) {
        const action = this.pending()[0];
        try {
          const change = await this.send(action);
          this.online.set(true);
          this.retryDelayMs = RETRY_FIRST_MS;
          this.remove(action);
          this.syncedActions.next({ action, change });
        } catch (error) {
          if (isRetryable(error)) {
            if (error instanceof HttpErrorResponse && error.status === 0) this.online.set(false);
            // The browser's online event is not always sent (or comes before the network works): try again anyway.
            this.scheduleRetry();
            return;
          }
          this.remove(action);
          this.refused.update((list) => [...list, { action, message: problemMessage(error) }]);
        }
      }
    } finally {
      this.flushing = false;
    }
  }

  private scheduleRetry(): void {
    if (this.retryTimer) return;
    const delay = this.retryDelayMs;
    this.retryDelayMs = Math.min(RETRY_MAX_MS, delay * 2);
    this.retryTimer = setTimeout(() => {
      this.retryTimer = null;
      void this.flush();
    }, delay);
  }

  private send(action: QueuedAction): Promise<PlanChangeDto | null> {
    const clientId = action.clientId;
    switch (action.kind) {
      case 'replan':
        return this.answer(this.api.replan(action.planId, { ...action.body, clientId }));
      case 'progression':
        return this.answer(this.api.progression(action.planId, { ...action.body, clientId }));
      case 'feedback':
        return this.answer(this.api.feedback(action.planId, { ...action.body, clientId })).then(() => null);
    }
  }

  /** The first answer, or a timeout: a request stuck on a dead connection must not block the queue. */
  private answer<T>(call: Observable<T>): Promise<T> {
    return firstValueFrom(call.pipe(timeout(SEND_TIMEOUT_MS)));
  }

  private remove(action: QueuedAction): void {
    this.pending.update((list) => list.filter((item) => item.clientId !== action.clientId));
    this.persist();
  }

  private persist(): void {
    try {
      localStorage.setItem(STORAGE_KEY, JSON.stringify(this.pending()));
    } catch {
      // Storage full or blocked: the queue still lives in memory until the page closes.
    }
  }
}

/** No network, a timeout, a busy or failing server: try again later. 4xx answers are final. */
function isRetryable(error: unknown): boolean {
  if (error instanceof TimeoutError) return true;
  if (!(error instanceof HttpErrorResponse)) return false;
  return error.status === 0 || error.status === 408 || error.status === 429 || error.status >= 500;
}

/** Plans with actions on the device not yet confirmed by the server, read straight from storage. */
export function plansWithQueuedActions(): Set<string> {
  return new Set(readStored().map((action) => action.planId));
}

function readStored(): QueuedAction[] {
  try {
    const raw = globalThis.localStorage?.getItem(STORAGE_KEY);
    const parsed: unknown = raw ? JSON.parse(raw) : [];
    return Array.isArray(parsed) ? (parsed as QueuedAction[]).filter((a) => a && a.clientId && a.planId) : [];
  } catch {
    return [];
  }
}
