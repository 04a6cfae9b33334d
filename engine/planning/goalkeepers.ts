/**
 * Goalkeepers: who may go in goal today, which phase gives them their own warm-up (handling,
 * footwork, then shots) and from which phase they stand in a real goal.
 */
import '../../shared/i18n/localize';
import type { AgeBand, Notice, PlanRequest, PresentPlayer, RuleParameters } from '../../shared/types';
import { kindModule, layoutOf } from '../kinds/registry';
import { ageInSentence } from './activities';
import type { BuildContext } from './context';
import type { PhaseSpec } from './timing';

/** Keepers who may go in goal: flagged, the age plays with goalkeepers, and a goal in the bag. */
export function eligibleKeepers(
  request: PlanRequest,
  params: RuleParameters,
  band: AgeBand,
): { keepers: PresentPlayer[]; warnings: Notice[] } {
  const flagged = request.players.filter((p) => p.goalkeeper);
  if (!flagged.length) return { keepers: [], warnings: [] };
  if (!params.gameFormats[band].goalkeepers) {
    return {
      keepers: [],
      warnings: [
        {
          code: 'keepers-play-out',
          message: $localize`At ${ageInSentence(request.ageGroup)}:ageGroup: everyone plays out: small games at this age have no goalkeepers, so today’s goalkeepers join in as outfield players.`,
          source: $localize`:the guidance a notice rests on, keep the publication's name and year:US Soccer Player Development Initiatives (2016): 4v4 for U6–U8, no goalkeepers`,
        },
      ],
    };
  }
  if (request.equipment.goals < 1) {
    return {
      keepers: [],
      warnings: [
        {
          code: 'keepers-no-goal',
          message: $localize`No goals in the bag: goalkeepers play as outfield players today — a goalkeeper only goes in goal where a real goal stands.`,
        },
      ],
    };
  }
  return { keepers: flagged, warnings: [] };
}

/** Whether keepers can stand in goal at the phase's first choice of activity. */
function hostsKeepers(spec: PhaseSpec): boolean {
  const a = spec.candidates[0];
  if (!a) return false;
  const m = kindModule(a.kind);
  return m.facesShots && m.targets(layoutOf(a)).keepers;
}

const NOT_FOR_KEEPERS = new Set(['break', 'movement', 'cool-down']);

/**
 * Marks the warm-up phase(s) and the phases where keepers go in goal: they warm up in the last
 * suitable phase before the first one where they would face shots (a match warm-up always
 * warms them up), and a short warm-up phase takes the one before it too.
 */
export function planKeepers(ctx: BuildContext, specs: PhaseSpec[]): void {
  if (!ctx.keepers.length) return;
  const playable = specs.map((s, i) => ({ s, i })).filter(({ s }) => s.slot !== 'break');
  let first = playable.find(({ s }) => hostsKeepers(s))?.i ?? -1;
  if (first < 0) {
    if (ctx.request.kind !== 'match-warm-up') return;
    first = playable.at(-1)?.i ?? -1;
    if (first < 0) return;
  }
  const suits = (s: PhaseSpec) => !NOT_FOR_KEEPERS.has(s.slot) && !s.continues;
  // A phase the coach pinned an activity for keeps its players when another phase can serve.
  const pinned = (s: PhaseSpec) => !!s.candidates[0] && ctx.pinned.has(s.candidates[0].id);
  let warm = -1;
  for (const avoidPins of [true, false]) {
    for (let i = first - 1; i >= 0 && warm < 0; i--) {
      if (suits(specs[i]) && !(avoidPins && pinned(specs[i]))) warm = i;
    }
    if (warm >= 0) break;
  }
  if (warm < 0) {
    if (!suits(specs[first])) return;
    warm = first;
  }
  specs[warm].keeperWarmUp = true;
  const marked = [specs[warm].name];
  if (specs[warm].endMinute - specs[warm].startMinute < 6) {
    for (let j = warm - 1; j >= 0; j--) {
      if (specs[j].slot === 'break') continue;
      if (suits(specs[j])) {
        specs[j].keeperWarmUp = true;
        marked.unshift(specs[j].name);
      }
      break;
    }
  }
  for (let i = warm + 1; i < specs.length; i++) {
    if (specs[i].slot === 'break') continue;
    if (specs[i].continues && specs[i - 1]?.keeperWarmUp) specs[i].keeperWarmUp = true;
    else specs[i].keepersInGoal = true;
  }
  const inGoal = specs.find((s) => s.keepersInGoal && hostsKeepers(s));
  ctx.trace.push({
    ruleId: 'engine.keepers',
    fired: true,
    effect: keepersPlan(ctx.keepers.length, marked, inGoal?.name),
  });
}

/** "The goalkeeper does their own warm-up in Arrival and Passing practice, then goes in goal from …". */
function keepersPlan(keepers: number, warmUp: string[], inGoal: string | undefined): string {
  const phases =
    warmUp.length === 2
      ? $localize`:two phases of the session:${warmUp[0]}:firstPhase: and ${warmUp[1]}:secondPhase:`
      : warmUp[0];
  if (keepers === 1)
    return inGoal === undefined
      ? $localize`The goalkeeper does their own warm-up in ${phases}:phases:`
      : $localize`The goalkeeper does their own warm-up in ${phases}:phases:, then goes in goal from ${inGoal}:phaseName:`;
  return inGoal === undefined
    ? $localize`${keepers}:count: goalkeepers do their own warm-up in ${phases}:phases:`
    : $localize`${keepers}:count: goalkeepers do their own warm-up in ${phases}:phases:, then go in goal from ${inGoal}:phaseName:`;
}
