import type { ActivityKind, Focus, PlanKind } from '../../../../shared/types';

/** Words shown for the engine's codes. */
export const KIND_LABELS: Record<PlanKind, string> = {
  'match-warm-up': 'Match warm-up',
  training: 'Training session',
};

export const FOCUS_LABELS: Record<Focus, string> = {
  passing: 'Passing',
  pressing: 'Pressing',
  finishing: 'Finishing',
  dribbling: 'Dribbling',
};

export const ACTIVITY_KIND_LABELS: Record<ActivityKind, string> = {
  'ball-mastery': 'Ball mastery',
  'passing-finishing': 'Passing and finishing',
  'keep-ball': 'Keep-ball',
  pairs: 'Pairs',
  'small-sided-game': 'Small-sided game',
  'movement-prep': 'Movement preparation',
};

export const LEVEL_LABELS = {
  beginner: 'Beginner',
  intermediate: 'Intermediate',
  advanced: 'Advanced',
} as const;
