import { inject, Injectable } from '@angular/core';
import { filter, map, type Observable } from 'rxjs';
import type { Plan, PlayerMove, ReplanBody, VerdictBody } from '../../../../../shared/types';
import { ActionQueue, type QueuedAction } from './action-queue';
import { newClientId } from './client-id';

/** A plan as the server stored it after the last change of it waiting on this device. */
export interface ServerPlan {
  planId: string;
  kind: QueuedAction['kind'];
  plan: Plan;
  moves: PlayerMove[];
}

/**
 * Sends a pitch-side screen's changes through the device's action queue (each with a client id,
 * kept until the server has it) and says when the server's plan may replace the one on screen.
 */
@Injectable()
export class PitchSync {
  private readonly queue = inject(ActionQueue);
  /** Whether the browser believes it has a network. */
  readonly online = this.queue.online;
  /** Changes the server refused for good, with its reason. */
  readonly refused = this.queue.refused;

  /**
   * The server's plan after each change it took, once no other plan-changing action of that plan
   * waits on the device: changes made since stay on screen until the server has them too.
   */
  readonly serverPlans: Observable<ServerPlan> = this.queue.synced.pipe(
    filter(({ action, change }) => !!change && !this.waiting(action.planId)),
    map(({ action, change }) => ({
      planId: action.planId,
      kind: action.kind,
      plan: change!.plan.plan,
      moves: change!.moves,
    })),
  );

  constructor() {
    // Whatever an earlier visit left unsent goes now.
    void this.queue.flush();
  }

  /** How many changes of the plan wait to be sent. */
  pendingCount(planId: string): number {
    return this.queue.pendingFor(planId).length;
  }

  /** Whether a change of the plan's stations or players (not only feedback) waits to be sent. */
  waiting(planId: string): boolean {
    return this.queue.pendingFor(planId).some((action) => action.kind !== 'feedback');
  }

  /** Whether a verdict on this station in this phase waits to be sent. */
  verdictQueued(planId: string, phaseIndex: number, stationId: string): boolean {
    return this.queue
      .pendingFor(planId)
      .some(
        (action) =>
          action.kind !== 'replan' &&
          action.body.stationId === stationId &&
          action.body.phaseIndex === phaseIndex,
      );
  }

  /** Sends how a station goes; the server records the feedback and steps the station. */
  sendVerdict(planId: string, body: VerdictBody): void {
    void this.queue.enqueue({ kind: 'progression', ...this.stamp(planId), body });
  }

  /** Sends a late arrival or an early leaver, for the server to re-plan the rest of the session. */
  sendRosterChange(planId: string, body: ReplanBody): void {
    void this.queue.enqueue({ kind: 'replan', ...this.stamp(planId), body });
  }

  private stamp(planId: string): { clientId: string; planId: string; queuedAt: string } {
    return { clientId: newClientId(), planId, queuedAt: new Date().toISOString() };
  }
}
