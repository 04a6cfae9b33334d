/**
 * Where last time's feedback says an area should start. A verdict belongs to the activity it
 * was given on: it moves that activity's area one step (as the club's feedback rules decide)
 * from the area that ran, for the group that gave it, and leaves other activities of the same
 * kind alone. Each new group scales the start to its own size (`widthForGroup`).
 */
import '../../shared/i18n/localize';
import { ACTIVITY_KIND_LABELS, type FeedbackFact, type Phase, type StationKind } from '../../shared/types';
import type { ProgressionStep } from '../club-rules/evaluate-rules';
import { verdictKey, type VerdictSteps } from '../club-rules/feedback-steps';
import { activityById } from './activities';
import { areaTable, baseWidth, describeArea, steppedWidth, type StartWidths } from './areas';
import type { BuildContext } from './context';

/** One start: what it came from, for the why panel. */
export interface FeedbackStart {
  /** `activity:<id>` or `kind:<kind>` (see `startWidthFor`). */
  key: string;
  kind: StationKind;
  activityId?: string;
  verdict?: FeedbackFact['verdict'];
  /** The side that ran (or the table's for the typical group) and the side to start from. */
  from: number;
  width: number;
  forGroup?: number;
  step: ProgressionStep;
}

export function feedbackStarts(
  ctx: BuildContext,
  steps: VerdictSteps,
): { widths: StartWidths; starts: FeedbackStart[] } {
  const starts: FeedbackStart[] = [];
  const seen = new Set<string>();
  const judgedKinds = new Set<string>();
  // Newest first: each activity (or kind, for a verdict that names none) takes its latest verdict.
  for (const fb of ctx.request.recentFeedback ?? []) {
    judgedKinds.add(fb.activityKind);
    const kind = fb.activityKind as StationKind;
    const key = fb.activityId ? `activity:${fb.activityId}` : `kind:${kind}`;
    if (seen.has(key)) continue;
    seen.add(key);
    const step = steps.get(verdictKey(kind, fb.verdict));
    if (!step || !ctx.params.areas[kind]) continue;
    starts.push(startOf(ctx, kind, step, fb, key));
  }
  // A club rule's step for a kind nobody judged applies kind-wide, from the table's typical group.
  for (const [kind, step] of Object.entries(ctx.outcome.steps) as [StationKind, ProgressionStep][]) {
    if (judgedKinds.has(kind) || !ctx.params.areas[kind]) continue;
    starts.push(startOf(ctx, kind, step, undefined, `kind:${kind}`));
  }
  const widths: StartWidths = {};
  for (const s of starts)
    widths[s.key] = s.forGroup ? { width: s.width, forGroup: s.forGroup } : { width: s.width };
  return { widths, starts };
}

function startOf(
  ctx: BuildContext,
  kind: StationKind,
  step: ProgressionStep,
  fb: FeedbackFact | undefined,
  key: string,
): FeedbackStart {
  const table = areaTable(ctx.params, kind, ctx.band);
  const typical = ctx.params.groupSizes[kind][ctx.request.level].preferred;
  const reported =
    fb?.areaWidth !== undefined ? Math.min(fb.areaWidth, fb.areaLength ?? fb.areaWidth) : undefined;
  const from = reported ?? Math.round(baseWidth(ctx.params, kind, ctx.band, ctx.request.level, typical));
  const forGroup = reported !== undefined ? fb?.groupSize : typical;
  const harderSign = ctx.params.kinds[kind].harderWhenArea === 'smaller' ? -1 : 1;
  const stepBy = step.direction === 'keep' ? 0 : step.direction === 'harder' ? harderSign : -harderSign;
  return {
    key,
    kind,
    ...(fb?.activityId ? { activityId: fb.activityId } : {}),
    ...(fb ? { verdict: fb.verdict } : {}),
    from,
    width: steppedWidth(table, from, stepBy),
    ...(forGroup ? { forGroup } : {}),
    step,
  };
}

/** A coach's verdict inside a sentence: "was marked too easy". */
function verdictWords(verdict: FeedbackFact['verdict']): string {
  switch (verdict) {
    case 'too-easy':
      return $localize`:a coach's verdict on an activity, was marked …:too easy`;
    case 'too-hard':
      return $localize`:a coach's verdict on an activity, was marked …:too hard`;
    case 'right':
      return $localize`:a coach's verdict on an activity, was marked …:about right`;
  }
}

/** How the start compares with the usual area: "17% smaller", "the same size". */
function sizeWords(change: number): string {
  if (change < 0) return $localize`:an area compared with the usual one:${-change}:percent:% smaller`;
  if (change > 0) return $localize`:an area compared with the usual one:${change}:percent:% larger`;
  return $localize`:an area compared with the usual one:the same size`;
}

/**
 * One trace entry per start that a station of the plan really uses, its description a sentence
 * for the why panel: "Last time ‘Rondo 4v1’ was marked too easy for groups of 5, so its area is
 * 17% smaller today."
 */
export function feedbackTrace(ctx: BuildContext, starts: FeedbackStart[], phases: Phase[]): void {
  const stations = phases.flatMap((p) => p.stations);
  const own = new Set(starts.filter((s) => s.activityId).map((s) => s.activityId));
  for (const start of starts) {
    const used = stations.find((st) =>
      start.activityId
        ? st.activityId === start.activityId
        : st.activityKind === start.kind && !own.has(st.activityId),
    );
    if (!used) continue;
    const kindName = ACTIVITY_KIND_LABELS[start.kind];
    const title = start.activityId
      ? `‘${activityById(ctx.params, start.activityId)?.title ?? used.title}’`
      : $localize`:a station of some kind, e.g. a keep-ball station:a ${kindName.toLowerCase()}:kindName: station`;
    const change = Math.round((start.width / start.from - 1) * 100);
    const size = sizeWords(change);
    const stuck = start.step.direction !== 'keep' && change === 0;
    const group = start.forGroup;
    const verdict = start.verdict ? verdictWords(start.verdict) : '';
    const description = !start.verdict
      ? change === 0
        ? $localize`A club rule starts ${title}:station: at its usual size today.`
        : group
          ? $localize`A club rule starts ${title}:station: ${size}:size: than usual today, scaled to each group’s size.`
          : $localize`A club rule starts ${title}:station: ${size}:size: than usual today.`
      : stuck
        ? group
          ? $localize`Last time ${title}:station: was marked ${verdict}:verdict: for groups of ${group}:groupSize:, but its area is already at the club’s limit, so it is the same size today.`
          : $localize`Last time ${title}:station: was marked ${verdict}:verdict:, but its area is already at the club’s limit, so it is the same size today.`
        : group
          ? $localize`Last time ${title}:station: was marked ${verdict}:verdict: for groups of ${group}:groupSize:, so its area is ${size}:size: today, scaled to each group’s size.`
          : $localize`Last time ${title}:station: was marked ${verdict}:verdict:, so its area is ${size}:size: today.`;
    const side = describeArea({ width: start.width, length: start.width });
    const reason = start.step.reason;
    ctx.trace.push({
      ruleId: 'engine.feedback-start',
      description,
      fired: true,
      effect: group
        ? $localize`${kindName}:kindName: area starts at ${side}:side: wide for a group of ${group}:groupSize:, scaled to each group's size (last ${start.from}:lastSide: m): ${reason}:reason:`
        : $localize`${kindName}:kindName: area starts at ${side}:side: wide (last ${start.from}:lastSide: m): ${reason}:reason:`,
    });
  }
}
