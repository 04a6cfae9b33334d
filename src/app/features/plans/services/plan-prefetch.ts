import { inject, Injectable } from '@angular/core';
import type { ResolveFn } from '@angular/router';
import { type Observable, shareReplay } from 'rxjs';
import type { SessionPlanDto } from '../../../../../shared/types';
import { PlansApi } from '../../../core/api/plans-api';
import { PlanHandover } from './plan-handover';

/**
 * Starts reading a plan as soon as the router knows which one is wanted, while the plan page's
 * code is still on its way: on a phone the two waits overlap instead of adding up.
 */
@Injectable({ providedIn: 'root' })
export class PlanPrefetch {
  private readonly plansApi = inject(PlansApi);
  private pending: { id: string; plan: Observable<SessionPlanDto> } | null = null;

  start(id: string): void {
    const plan = this.plansApi.get(id).pipe(shareReplay({ bufferSize: 1, refCount: false }));
    // Sent now; the page's own subscription gets the answer, or the error, when it arrives.
    plan.subscribe({ error: () => undefined });
    this.pending = { id, plan };
  }

  /** The plan being read if it is the one asked for; forgotten either way. */
  take(id: string): Observable<SessionPlanDto> | null {
    const plan = this.pending?.id === id ? this.pending.plan : null;
    this.pending = null;
    return plan;
  }
}

/** Route resolver of the plan page: starts the read and lets the navigation go on at once. */
export const prefetchPlan: ResolveFn<boolean> = (route) => {
  const id = route.paramMap.get('planId');
  // The wizard hands its new plan over: nothing to read.
  if (id && !inject(PlanHandover).has(id)) inject(PlanPrefetch).start(id);
  return true;
};
