/** Which activities a request may use, and which one to run for a kind. */
import type {
  ActivityDefinition,
  ActivityKind,
  AgeGroup,
  ForbiddenActivity,
  Focus,
  RuleParameters,
} from '../../shared/types';
import { pick, type Rng } from '../random';

/** Why a kind may not be used, or null when it may. */
export function kindBlocked(
  params: RuleParameters,
  age: AgeGroup,
  forbidden: ForbiddenActivity[],
  kind: ActivityKind,
): string | null {
  if (!params.ageGroups[age].allowedKinds.includes(kind)) return `not in the club's activities for ${age}`;
  const rule = forbidden.find((f) => f.kind === kind && !f.activityId);
  return rule ? rule.reason : null;
}

export function activityBlocked(
  params: RuleParameters,
  age: AgeGroup,
  forbidden: ForbiddenActivity[],
  activity: ActivityDefinition,
): string | null {
  const byKind = kindBlocked(params, age, forbidden, activity.kind);
  if (byKind) return byKind;
  const rule = forbidden.find((f) => f.activityId === activity.id);
  return rule ? rule.reason : null;
}

/** The activity for a kind: allowed ones first, those serving the request's focus preferred, ties seeded. */
export function chooseActivity(
  params: RuleParameters,
  age: AgeGroup,
  forbidden: ForbiddenActivity[],
  kind: ActivityKind,
  focus: Focus[],
  rng: Rng,
): ActivityDefinition | null {
  const candidates = params.activities.filter(
    (a) => a.kind === kind && activityBlocked(params, age, forbidden, a) === null,
  );
  if (!candidates.length) return null;
  // Each score counted once and without a filtered copy of the activity's focus list.
  const scores = candidates.map((a) => focusScore(a, focus));
  const best = Math.max(...scores);
  return pick(
    candidates.filter((_, i) => scores[i] === best),
    rng,
  );
}

/** How many of the request's focuses the activity serves. */
function focusScore(activity: ActivityDefinition, focus: Focus[]): number {
  let n = 0;
  for (const f of activity.focus) if (focus.includes(f)) n++;
  return n;
}

export function activityById(params: RuleParameters, id: string): ActivityDefinition | undefined {
  return params.activities.find((a) => a.id === id);
}
