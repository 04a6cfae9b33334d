/** A coach's edit to a plan: the edited plan with kit, totals, notices and trace recomputed. */
import '../../shared/i18n/localize';
import type {
  AgeBand,
  Level,
  Plan,
  PlanEdit,
  PresentPlayer,
  RuleParameters,
  RuleSetDocument,
  Station,
} from '../../shared/types';
import { compileRuleSet } from '../club-rules/compile-rule-set';
import { generatePlan } from '../generate-plan';
import { kindModule, layoutOf } from '../kinds/registry';
import { activityById } from '../planning/activities';
import { effectiveParameters } from '../planning/effective-parameters';
import { ruledOut } from '../planning/usable';
import { generateSeed } from '../random';
import { defaultRuleSet } from '../rule-sets';
import { progressionOutcome } from './apply-progression';
import { sizeFor } from './area-step';
import type { EditOutcome } from './edit-outcome';
import { editWords } from './edit-words';
import { withChecks } from './plan-checks';
import { editContext, lastPlayedBefore, rebuildPhase, stationAt } from './plan-context';
import { activityOfStation, refreshPlan } from './rebuild';

export async function applyEdit(
  plan: Plan,
  edit: PlanEdit,
  ruleSet: RuleSetDocument = defaultRuleSet,
): Promise<Plan> {
  return (await tryEdit(plan, edit, ruleSet)).plan;
}

/**
 * An edit and, when it cannot be made (an area at its limit, a swap the rules rule out), why in a
 * coach's words, so a screen can say so beside the control that asked for it.
 */
export async function tryEdit(
  plan: Plan,
  edit: PlanEdit,
  ruleSet: RuleSetDocument = defaultRuleSet,
): Promise<EditOutcome> {
  switch (edit.type) {
    case 'regenerate':
      return {
        plan: await generatePlan({ ...plan.request, seed: edit.seed ?? generateSeed() }, ruleSet),
        refused: null,
      };
    case 'resize-area': {
      // Larger/smaller is the coach's call; map it onto the activity's harder/easier direction.
      const station = stationAt(plan, edit.phaseIndex, edit.stationId);
      const params = compileRuleSet(ruleSet).document.parameters;
      const verdict = edit.step === sizeFor(params, station.activityKind, 'harder') ? 'too-easy' : 'too-hard';
      const out = progressionOutcome(plan, edit.phaseIndex, edit.stationId, verdict, ruleSet);
      return {
        plan: relabel(out.plan, plan, 'edit.resize-area', resizedWords(station.title, edit.step)),
        refused: out.refused,
      };
    }
    case 'move-player':
      return { plan: movePlayer(plan, edit, ruleSet), refused: null };
    case 'swap-activity':
      return swapActivity(plan, edit, ruleSet);
  }
}

/** The trace line of a coach's resize: "Rondo square: area larger". */
function resizedWords(title: string, step: 'larger' | 'smaller'): string {
  return step === 'larger'
    ? $localize`:a coach made an activity's area larger, the activity's title first:${title}:activity:: area larger`
    : $localize`:a coach made an activity's area smaller, the activity's title first:${title}:activity:: area smaller`;
}

function relabel(out: Plan, before: Plan, ruleId: string, effect: string): Plan {
  const added = out.trace.slice(before.trace.length);
  return { ...out, trace: [...before.trace, { ruleId, fired: true, effect }, ...added] };
}

function movePlayer(
  plan: Plan,
  edit: Extract<PlanEdit, { type: 'move-player' }>,
  ruleSet: RuleSetDocument,
): Plan {
  const params = effectiveParameters(compileRuleSet(ruleSet).document.parameters, plan.request);
  const phase = plan.phases[edit.phaseIndex];
  if (!phase) throw new RangeError(`No phase ${edit.phaseIndex}`);
  const target = stationAt(plan, edit.phaseIndex, edit.toStationId);
  const from = phase.stations.find((s) => s.playerIds.includes(edit.playerId));
  if (!from) throw new RangeError(`Player ${edit.playerId} is in no station of phase ${edit.phaseIndex}`);
  if (from.id === target.id) return plan;
  const byId = new Map(plan.request.players.map((p) => [p.id, p]));
  const band = params.ageGroups[plan.request.ageGroup].band;
  const stations = phase.stations.map((s) => {
    if (s.id !== from.id && s.id !== target.id) return s;
    const ids =
      s.id === from.id ? s.playerIds.filter((id) => id !== edit.playerId) : [...s.playerIds, edit.playerId];
    return reRole(s, ids, byId, params, plan.request.level, band);
  });
  // A station left empty disappears rather than stand unused.
  const kept = stations.filter((s) => s.playerIds.length > 0);
  const phases = plan.phases.map((p, i) => (i === edit.phaseIndex ? { ...p, stations: kept } : p));
  const refreshed = refreshPlan(plan, phases, params);
  const who = byId.get(edit.playerId)?.name ?? edit.playerId;
  return withChecks(
    {
      ...refreshed,
      trace: [
        ...plan.trace,
        {
          ruleId: 'edit.move-player',
          fired: true,
          effect: $localize`:a coach moved a player from one activity to another in a part of the session:${who}:player:: ${from.title}:fromActivity: → ${target.title}:toActivity: in ${phase.name}:part:`,
        },
      ],
    },
    ruleSet,
  );
}

/**
 * A station's roles for new members, by its kind: keepers still in the group stay in goal
 * (a two-goal station keeps them only in pairs, one each end).
 */
export function reRole(
  s: Station,
  ids: string[],
  byId: Map<string, PresentPlayer>,
  params: RuleParameters,
  level: Level,
  band: AgeBand,
): Station {
  const activity = activityOfStation(params, s);
  const layout = layoutOf(activity);
  const module = kindModule(s.activityKind);
  let keepers = (s.roles.goalkeeper ?? []).filter((id) => ids.includes(id));
  if (module.targets(layout).ends === 2 && keepers.length % 2) keepers = [];
  const players = ids.map((id) => byId.get(id) ?? { id });
  const outcome = module.roles({
    activity,
    layout,
    players,
    keepers,
    coachJoins: s.coachJoins,
    params,
    level,
    band,
  });
  return {
    ...s,
    playerIds: ids,
    roles: outcome.roles,
    format: outcome.format,
    coachingPoints: [...activity.coachingPoints, ...(outcome.points ?? [])],
  };
}

async function swapActivity(
  plan: Plan,
  edit: Extract<PlanEdit, { type: 'swap-activity' }>,
  ruleSet: RuleSetDocument,
): Promise<EditOutcome> {
  const params = effectiveParameters(compileRuleSet(ruleSet).document.parameters, plan.request);
  const phase = plan.phases[edit.phaseIndex];
  if (!phase) throw new RangeError(`No phase ${edit.phaseIndex}`);
  const activity = activityById(params, edit.activityId);
  if (!activity) throw new RangeError(`No activity ${edit.activityId} in rule set ${ruleSet.id}`);
  const request = plan.request;
  const refuse = (reason: string): EditOutcome => {
    const message = editWords.swapRefused(activity.title, reason);
    return {
      plan: {
        ...plan,
        warnings: [...plan.warnings, { code: 'swap-refused', message }],
        trace: [
          ...plan.trace,
          {
            ruleId: 'edit.swap-activity',
            fired: false,
            effect: $localize`:an activity a coach asked for was not used, and why, the reason starts in lower case:${activity.title}:activity: refused: ${reason}:reason:`,
          },
        ],
      },
      refused: message,
    };
  };
  if (phase.activityKind === 'break') return refuse(editWords.swapBreak);
  // As the plan recorded them: the rule set's tables and what its club rules forbade.
  const blocked = ruledOut({ params, request, forbidden: plan.forbiddenActivities ?? [] }, activity);
  if (blocked) return refuse(blocked);
  const context = await editContext(
    request,
    ruleSet,
    `${plan.seed}:swap:${edit.phaseIndex}:${edit.activityId}`,
  );
  const before = lastPlayedBefore(plan, edit.phaseIndex);
  const rebuilt = rebuildPhase(context, plan, edit.phaseIndex, [activity], before);
  if (rebuilt.activityId !== activity.id) {
    return refuse(editWords.swapNoFit(request.players.length));
  }
  const phases = plan.phases.map((p, i) => (i === edit.phaseIndex ? { ...rebuilt, name: p.name } : p));
  const refreshed = refreshPlan({ ...plan, warnings: plan.warnings }, phases, params);
  const swapped = withChecks(
    {
      ...refreshed,
      trace: [
        ...plan.trace,
        {
          ruleId: 'edit.swap-activity',
          fired: true,
          effect: $localize`:a part of the session now plays the activity a coach chose:${phase.name}:part:: now ${activity.title}:activity:`,
        },
      ],
    },
    ruleSet,
  );
  return { plan: swapped, refused: null };
}
