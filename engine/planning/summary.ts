/** Plan-wide figures after the phases are built: kit needed, touches, active share, touch target. */
import '../../shared/i18n/localize';
import type { Equipment, Phase, Plan, RuleParameters } from '../../shared/types';
import type { DerivedNotices } from './derived-notices';
import { estimateTouches } from './touches';

export function equipmentNeeded(phases: Phase[]): Equipment {
  const need: Equipment = { balls: 0, cones: 0, bibs: 0, goals: 0 };
  for (const phase of phases) {
    const sum: Equipment = { balls: 0, cones: 0, bibs: 0, goals: 0 };
    for (const s of phase.stations) {
      sum.balls += s.equipment.balls;
      sum.cones += s.equipment.cones;
      sum.bibs += s.equipment.bibs;
      sum.goals += s.equipment.goals;
    }
    need.balls = Math.max(need.balls, sum.balls);
    need.cones = Math.max(need.cones, sum.cones);
    need.bibs = Math.max(need.bibs, sum.bibs);
    need.goals = Math.max(need.goals, sum.goals);
  }
  return need;
}

export function summarize(
  phases: Phase[],
  params: RuleParameters,
  minutes: number,
  warnings: DerivedNotices,
): Pick<Plan, 'touches' | 'activeShare' | 'equipmentNeeded'> {
  const { touches, activeShare } = estimateTouches(phases, params);
  const target = params.touchTarget;
  if (target.active && minutes >= target.fromMinutes) {
    const keepers = new Set(
      phases.flatMap((p) => p.stations.flatMap((s) => [...(s.roles.goalkeeper ?? [])])),
    );
    // Keepers are measured against their own work, not the outfield target.
    const values = Object.entries(touches)
      .filter(([id]) => !keepers.has(id))
      .map(([, t]) => t);
    const below = values.filter((t) => t < target.minPerPlayer).length;
    if (below > 0) {
      warnings.push({
        code: 'touches-below-target',
        message: touchesBelow(below, target, Math.min(...values)),
      });
    }
  }
  return { touches, activeShare, equipmentNeeded: equipmentNeeded(phases) };
}

/** The warning when some players' estimated touches fall short of the club's aim. */
function touchesBelow(below: number, target: RuleParameters['touchTarget'], lowest: number): string {
  const aimFrom = target.minPerPlayer;
  const aimTo = target.maxPerPlayer;
  return below === 1
    ? $localize`Estimated touches: 1 player below ${aimFrom}:minTouches: (lowest ${lowest}:lowest:); aim at ${aimFrom}:aimFrom:–${aimTo}:aimTo: before kick-off — more ball mastery or more balls would help.`
    : $localize`Estimated touches: ${below}:players: players below ${aimFrom}:minTouches: (lowest ${lowest}:lowest:); aim at ${aimFrom}:aimFrom:–${aimTo}:aimTo: before kick-off — more ball mastery or more balls would help.`;
}
