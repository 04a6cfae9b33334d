import type { PlanKind } from '../../../../shared/types';

export { ACTIVITY_KIND_LABELS, ageGroupLabel, FOCUS_LABELS, LEVEL_LABELS } from '../../../../shared/types';

/** Words shown for the engine's codes. */
export const KIND_LABELS: Record<PlanKind, string> = {
  'match-warm-up': $localize`Match warm-up`,
  training: $localize`Training session`,
};
