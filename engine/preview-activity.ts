/**
 * One activity drawn as a single station, the way a plan would set it up: for the library and
 * the club's activity form (live, as the lead types). Synchronous: the club's tables apply,
 * its rules (which need a request) do not.
 */
import type {
  ActivityDefinition,
  AgeGroup,
  Level,
  PresentPlayer,
  RuleSetDocument,
  Station,
} from '../shared/types';
import { AGE_GROUPS } from '../shared/types';
import { compileRuleSet } from './club-rules/compile-rule-set';
import { kindModule, layoutOf } from './kinds/registry';
import { sizeRuleOf } from './planning/allocation';
import { makeStation } from './planning/build-phase';
import { effectiveParameters } from './planning/effective-parameters';
import { equipPhase } from './planning/kit';
import { markPhase } from './planning/markings';
import { progressionsFor } from './planning/progressions';
import { defaultRuleSet } from './rule-sets';

export interface ActivityPreview {
  station: Station;
  /** The space the station is drawn in (its area and a margin). */
  space: { width: number; length: number };
  ageGroup: AgeGroup;
  level: Level;
}

export interface PreviewOptions {
  ageGroup?: AgeGroup;
  level?: Level;
  /** Players in the group; the club's preferred size for the activity when absent. */
  players?: number;
}

/**
 * Checks nothing beyond what drawing needs: an activity the rule-set validator would refuse
 * may still preview (the form shows field messages for it separately).
 */
export function previewActivity(
  activity: ActivityDefinition,
  ruleSet: RuleSetDocument = defaultRuleSet,
  options: PreviewOptions = {},
): ActivityPreview {
  const base = compileRuleSet(ruleSet).document.parameters;
  const ageGroup = options.ageGroup ?? middleAge(activity);
  const level =
    options.level ??
    (activity.levels.includes('intermediate') ? 'intermediate' : (activity.levels[0] ?? 'intermediate'));
  const params = effectiveParameters(base, { ageGroup });
  const band = params.ageGroups[ageGroup].band;
  const module = kindModule(activity.kind);
  const size = sizeRuleOf(activity, { params, level, band });
  const count = Math.max(1, options.players ?? size?.preferred ?? activity.players.min);
  const targets = module.targets(layoutOf(activity));
  const keeperCount =
    module.facesShots && targets.keepers && params.gameFormats[band].goalkeepers ? targets.ends : 0;
  const keepers = activity.kind === 'goalkeeping' ? Math.min(count, 2) : keeperCount;
  const players: PresentPlayer[] = Array.from(
    { length: count + (activity.kind === 'goalkeeping' ? 0 : keepers) },
    (_, i) => ({
      id: `${i + 1}`,
      ...(i < keepers ? { goalkeeper: true } : {}),
    }),
  );
  const keeperIds = players.filter((p) => p.goalkeeper).map((p) => p.id);
  const request = {
    ageGroup,
    level,
    players,
    coaches: 1,
    equipment: { balls: 50, cones: 60, bibs: 20, goals: 4 },
    space: { width: 200, length: 200 },
    minutes: 10,
    kind: 'training' as const,
  };
  const station = makeStation(
    { params, request, band },
    'preview',
    activity,
    { activity, players: players.length, coachJoins: 0 },
    players,
    keeperIds,
    {},
  );
  const margin = 2;
  station.position = { x: margin, y: margin };
  const space = { width: station.area.width + 2 * margin, length: station.area.length + 2 * margin };
  markPhase([station], [activity], params, request.equipment, [], activity.title);
  equipPhase([station], [activity], request.equipment, [], activity.title);
  station.progressions = progressionsFor(station, activity, params, band, space);
  return { station, space, ageGroup, level };
}

/** The middle of the activity's age range, for a preview with no age chosen. */
function middleAge(activity: ActivityDefinition): AgeGroup {
  const from = Math.max(0, AGE_GROUPS.indexOf(activity.ages.from));
  const to = Math.max(from, AGE_GROUPS.indexOf(activity.ages.to));
  return AGE_GROUPS[Math.floor((from + to) / 2)];
}
