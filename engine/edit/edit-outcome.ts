import type { Plan } from '../../shared/types';

/** An edit's result: the plan after it, and why it was not made (a coach's words), or null. */
export interface EditOutcome {
  plan: Plan;
  refused: string | null;
}
