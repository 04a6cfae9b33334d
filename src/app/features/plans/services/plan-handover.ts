import { Injectable } from '@angular/core';
import type { SessionPlanDto } from '../../../../../shared/types';

/**
 * Hands the plan the wizard just received to the plan page, once, so the page shows it without a
 * second request. Kept in memory: a reload always asks the server for the plan of record.
 */
@Injectable({ providedIn: 'root' })
export class PlanHandover {
  private pending: SessionPlanDto | null = null;

  give(plan: SessionPlanDto): void {
    this.pending = plan;
  }

  /** Whether the plan `id` is waiting to be taken. */
  has(id: string): boolean {
    return this.pending?.id === id;
  }

  /** The handed-over plan if it is the one asked for; forgotten either way. */
  take(id: string): SessionPlanDto | null {
    const plan = this.pending?.id === id ? this.pending : null;
    this.pending = null;
    return plan;
  }
}
