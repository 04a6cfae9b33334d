/**
 * Set-up between two phases: cones put out and lifted, goals moved, and (in training) the
 * minutes it takes one adult — none when a drinks break or the start of the session covers it.
 */
import type { Changeover, Phase, Point, RuleParameters } from '../../shared/types';

const SAME_CONE_M = 0.6;
const SAME_GOAL_M = 1;

export function changeoverBetween(
  before: Phase | undefined,
  after: Phase,
  params: RuleParameters,
  training: boolean,
  coveredByBreak: boolean,
): Changeover {
  const oldCones = before ? before.stations.flatMap((s) => s.conePositions) : [];
  const newCones = after.stations.flatMap((s) => s.conePositions);
  const oldGoals = before ? goals(before) : [];
  const newGoals = goals(after);
  const conesPlaced = newCones.filter((c) => !oldCones.some((o) => close(o, c, SAME_CONE_M))).length;
  const conesLifted = oldCones.filter((o) => !newCones.some((c) => close(o, c, SAME_CONE_M))).length;
  const goalsMoved = newGoals.filter((g) => !oldGoals.some((o) => close(o, g, SAME_GOAL_M))).length;
  let minutes = 0;
  if (training && before && !coveredByBreak) {
    const t = params.timing;
    const work = (conesPlaced + conesLifted) / t.conesPerMinute + goalsMoved / t.goalMovesPerMinute;
    minutes = Math.min(
      Math.ceil(work - 1e-9),
      Math.max(0, after.endMinute - after.startMinute - params.timing.minPhaseMinutes),
      3,
    );
  }
  return { conesPlaced, conesLifted, goalsMoved, minutes };
}

function goals(phase: Phase): Point[] {
  return phase.stations.flatMap((s) => (s.goalPositions ?? []).filter((g) => g.kind === 'goal'));
}

function close(a: Point, b: Point, within: number): boolean {
  return Math.abs(a.x - b.x) <= within && Math.abs(a.y - b.y) <= within;
}
