/**
 * Re-checks a plan (typically after a coach's edit) against the invariants of a fresh plan and
 * returns each violation as a notice.
 */
import type { Equipment, Notice, Plan, RuleSetDocument } from '../shared/types';
import { gapBetween, insideSpace, overlaps, rectOf } from './geometry';
import { defaultRuleSet } from './rule-sets';
import { compileRuleSet } from './rules/compile-rule-set';
import { keepBallFormat } from './build/roles';

const KIT: (keyof Equipment)[] = ['balls', 'cones', 'bibs', 'goals'];

export function checkPlan(plan: Plan, ruleSet: RuleSetDocument = defaultRuleSet): Notice[] {
  const params = compileRuleSet(ruleSet).document.parameters;
  const notices: Notice[] = [];
  const request = plan.request;
  const allowed = params.ageGroups[request.ageGroup].allowedKinds;
  const forbidden = plan.forbiddenActivities ?? [];

  let expectedStart = 0;
  plan.phases.forEach((phase, pi) => {
    const label = `Phase ${pi + 1} (${phase.name})`;
    if (phase.startMinute !== expectedStart || phase.endMinute <= phase.startMinute) {
      notices.push({
        code: 'phases-not-contiguous',
        message: `${label} runs ${phase.startMinute}–${phase.endMinute}, expected to start at ${expectedStart}.`,
      });
    }
    expectedStart = phase.endMinute;

    const roster = rosterFor(plan, phase.endMinute);
    const seen = new Map<string, string>();
    for (const s of phase.stations) {
      for (const id of s.playerIds) {
        const other = seen.get(id);
        if (other)
          notices.push({
            code: 'player-twice',
            message: `${label}: ${nameOf(plan, id)} is in ${other} and ${s.id}.`,
          });
        else seen.set(id, s.id);
        if (!roster.has(id))
          notices.push({ code: 'player-unknown', message: `${label}: ${id} in ${s.id} is not present.` });
      }
    }
    for (const id of roster) {
      if (!seen.has(id))
        notices.push({ code: 'player-missing', message: `${label}: ${nameOf(plan, id)} is in no station.` });
    }

    const rects = phase.stations.map((s) => rectOf(s.position, s.area));
    phase.stations.forEach((s, i) => {
      if (!insideSpace(rects[i], request.space)) {
        notices.push({
          code: 'station-outside-space',
          message: `${label}: ${s.id} (${s.title}) goes outside the ${request.space.width} × ${request.space.length} m space.`,
        });
      }
      for (let j = i + 1; j < rects.length; j++) {
        if (overlaps(rects[i], rects[j])) {
          notices.push({
            code: 'stations-overlap',
            message: `${label}: ${s.id} and ${phase.stations[j].id} overlap.`,
          });
        } else if (gapBetween(rects[i], rects[j]) < Math.min(params.layout.bufferM, 0.5) - 1e-6) {
          notices.push({
            code: 'stations-too-close',
            message: `${label}: ${s.id} and ${phase.stations[j].id} have no buffer between them.`,
          });
        }
      }
      if (!allowed.includes(s.activityKind)) {
        notices.push({
          code: 'activity-not-for-age',
          message: `${label}: ${s.title} (${s.activityKind}) is not in the club's activities for ${request.ageGroup}.`,
        });
      }
      const ruled = forbidden.find(
        (f) => f.activityId === s.activityId || (!f.activityId && f.kind === s.activityKind),
      );
      if (ruled)
        notices.push({ code: 'activity-forbidden', message: `${label}: ${s.title} — ${ruled.reason}` });
      if (s.activityKind === 'keep-ball') notices.push(...keepBallNotices(plan, label, s, params));
      const outfield = s.playerIds.length - (s.roles.goalkeeper?.length ?? 0);
      if (outfield - params.kinds[s.activityKind].activeSlots > 1) {
        notices.push({
          code: 'too-many-waiting',
          message: `${label}: in ${s.id} more than one player waits for a turn.`,
        });
      }
    });

    for (const key of KIT) {
      const used = phase.stations.reduce((sum, s) => sum + s.equipment[key], 0);
      if (used > request.equipment[key]) {
        notices.push({
          code: 'kit-over',
          message: `${label} uses ${used} ${key}, the bag has ${request.equipment[key]}.`,
        });
      }
    }
  });
  if (expectedStart !== request.minutes) {
    notices.push({
      code: 'minutes-mismatch',
      message: `The phases cover ${expectedStart} minutes, the session has ${request.minutes}.`,
    });
  }
  return notices;
}

function keepBallNotices(
  plan: Plan,
  label: string,
  s: Plan['phases'][number]['stations'][number],
  params: ReturnType<typeof compileRuleSet>['document']['parameters'],
): Notice[] {
  const level = plan.request.level;
  const defenders = s.roles.defenders?.length ?? 0;
  const attackers = (s.roles.attackers?.length ?? 0) + s.coachJoins;
  const max = Math.min(4, params.keepBall[level].maxAttackersPerDefender);
  if (defenders === 0 || attackers / defenders > max) {
    const suggested = keepBallFormat(params, level, attackers + defenders);
    return [
      {
        code: 'keep-ball-ratio',
        message: `${label}: ${s.id} plays ${attackers}v${defenders}; the club allows at most ${max} attackers per defender for ${level} (try ${suggested.attackers}v${suggested.defenders}).`,
      },
    ];
  }
  return [];
}

/** Who should be on the pitch in a phase ending at `endMinute`, given pitch-side changes. */
function rosterFor(plan: Plan, endMinute: number): Set<string> {
  const roster = new Set(plan.request.players.map((p) => p.id));
  for (const change of plan.rosterChanges ?? []) {
    if (endMinute > change.fromMinute) continue;
    for (const id of change.added) roster.delete(id);
    for (const id of change.removed) roster.add(id);
  }
  return roster;
}

function nameOf(plan: Plan, id: string): string {
  return plan.request.players.find((p) => p.id === id)?.name ?? id;
}
