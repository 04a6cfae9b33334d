/**
 * Minutes for each part of the session: shares stretched by the focus, capped per part, whole
 * minutes that sum exactly; drinks breaks in the timeline at least every `drinksEveryMinutes`
 * (`heatDrinksEveryMinutes` in the heat), splitting a part that would run past one.
 */
import '../../shared/i18n/localize';
import type { ActivityDefinition, SlotRole, StationKind } from '../../shared/types';
import { breakName } from '../kinds/break';
import type { BuildContext } from './context';
import type { SlotPlan } from './session-shape';

export interface PhaseSpec {
  name: string;
  slot: SlotRole | 'break';
  /** Activities to try, best first (none for a drinks break). */
  candidates: ActivityDefinition[];
  /** The kinds the part is for; a phase that plays another kind is named after that kind. */
  kinds?: StationKind[];
  startMinute: number;
  endMinute: number;
  /** Goalkeepers do their own warm-up station in this phase. */
  keeperWarmUp?: boolean;
  /** Goalkeepers may stand in a real goal in this phase (after their warm-up). */
  keepersInGoal?: boolean;
  /** Second part of a phase split by a drinks break: same groups and set-up. */
  continues?: boolean;
}

export function planTimeline(ctx: BuildContext, slots: SlotPlan[]): PhaseSpec[] {
  const { request, params } = ctx;
  const t = params.timing;
  const stretch = ctx.hot ? t.heatDrinksEveryMinutes : t.drinksEveryMinutes;
  let breaks = request.minutes > stretch ? Math.ceil(request.minutes / stretch) - 1 : 0;
  if (breaks * t.drinksMinutes >= request.minutes / 3)
    breaks = Math.floor(request.minutes / 3 / t.drinksMinutes);
  let kept = slots;
  let timeline: PhaseSpec[] = [];
  for (let attempt = 0; attempt < 4; attempt++) {
    const available = request.minutes - breaks * t.drinksMinutes;
    kept = dropForTime(ctx, kept, available);
    const minutes = splitWithCaps(available, kept, t.minPhaseMinutes, ctx);
    timeline = withBreaks(kept, minutes, stretch, t.drinksMinutes, t.minPhaseMinutes, ctx.hot);
    const placed = timeline.filter((p) => p.slot === 'break').length;
    if (placed === breaks) break;
    breaks = placed;
  }
  fitToMinutes(timeline, request.minutes);
  const placed = timeline.filter((p) => p.slot === 'break').length;
  ctx.trace.push({
    ruleId: 'engine.timing',
    fired: true,
    effect: timeline
      .map(
        (s) =>
          $localize`:a part of the session and its minutes:${s.name}:phaseName: ${s.endMinute - s.startMinute}:minutes: min`,
      )
      .join(', '),
  });
  if (placed) {
    ctx.trace.push({
      ruleId: 'engine.drinks',
      fired: true,
      effect: drinksEffect(placed, t.drinksMinutes, stretch, ctx.hot),
    });
  }
  return timeline;
}

/** The drinks breaks placed, as a whole sentence for each case. */
function drinksEffect(breaks: number, minutes: number, stretch: number, hot: boolean): string {
  if (breaks === 1)
    return hot
      ? $localize`1 drinks break of ${minutes}:minutes: min: no stretch runs more than ${stretch}:stretch: min without one (heat)`
      : $localize`1 drinks break of ${minutes}:minutes: min: no stretch runs more than ${stretch}:stretch: min without one`;
  return hot
    ? $localize`${breaks}:breaks: drinks breaks of ${minutes}:minutes: min: no stretch runs more than ${stretch}:stretch: min without one (heat)`
    : $localize`${breaks}:breaks: drinks breaks of ${minutes}:minutes: min: no stretch runs more than ${stretch}:stretch: min without one`;
}

/** The name of a part's second half after a drinks break: "Passing practice (continued)". */
export function continuedName(name: string): string {
  return $localize`:a part of the session that goes on after a drinks break:${name}:phaseName: (continued)`;
}

/** The name without its "(continued)", in whatever order the language puts the two. */
export function withoutContinued(name: string): string {
  const [before, after] = continuedName('\u0000').split('\u0000');
  if (after === undefined || (!before && !after)) return name;
  const marked =
    name.length >= before.length + after.length && name.startsWith(before) && name.endsWith(after);
  return marked ? name.slice(before.length, name.length - after.length) : name;
}

/** When breaks and parts did not settle, the longest part absorbs the difference. */
function fitToMinutes(timeline: PhaseSpec[], minutes: number): void {
  const end = timeline.at(-1)?.endMinute ?? minutes;
  const diff = minutes - end;
  if (!diff || !timeline.length) return;
  let longest = -1;
  timeline.forEach((p, i) => {
    if (p.slot === 'break') return;
    if (
      longest < 0 ||
      p.endMinute - p.startMinute > timeline[longest].endMinute - timeline[longest].startMinute
    )
      longest = i;
  });
  if (longest < 0 || timeline[longest].endMinute - timeline[longest].startMinute + diff < 1) {
    // Nothing can absorb it: drop the breaks' time into the first part instead.
    return;
  }
  timeline[longest].endMinute += diff;
  for (let i = longest + 1; i < timeline.length; i++) {
    timeline[i].startMinute += diff;
    timeline[i].endMinute += diff;
  }
}

/** Short slots keep the most important parts: at most one per `minPhaseMinutes`. */
function dropForTime(ctx: BuildContext, slots: SlotPlan[], minutes: number): SlotPlan[] {
  const maxPhases = Math.max(1, Math.floor(minutes / ctx.params.timing.minPhaseMinutes));
  const kept = [...slots];
  while (kept.length > maxPhases) {
    const drop = kept.reduce((worst, e) => (e.priority > worst.priority ? e : worst), kept[0]);
    kept.splice(kept.indexOf(drop), 1);
    ctx.trace.push({
      ruleId: 'engine.short-slot',
      fired: true,
      effect:
        maxPhases === 1
          ? $localize`:why a part of the session was left out, the session is too short:${minutes}:minutes: min fits 1 part of ${ctx.params.timing.minPhaseMinutes}:minPhaseMinutes:+ min: left out ${drop.name}:phaseName:`
          : $localize`:why a part of the session was left out, the session is too short:${minutes}:minutes: min fits ${maxPhases}:parts: parts of ${ctx.params.timing.minPhaseMinutes}:minPhaseMinutes:+ min: left out ${drop.name}:phaseName:`,
    });
  }
  return kept;
}

/** Minutes by share (the focus stretching its kinds), each part within its cap where the total allows. */
function splitWithCaps(total: number, slots: SlotPlan[], minEach: number, ctx: BuildContext): number[] {
  const shares = slots.map(
    (s) => s.share * (s.candidates[0] ? (ctx.params.focusBoost[s.candidates[0].kind] ?? 1) : 1),
  );
  const caps = slots.map((s) => s.maxMinutes ?? Number.POSITIVE_INFINITY);
  // Water-filling: parts at their cap keep it, the rest share what is left by their shares.
  const exact = new Array<number>(slots.length).fill(0);
  const open = new Set(slots.map((_, i) => i));
  let left = total;
  for (;;) {
    const sum = [...open].reduce((s, i) => s + shares[i], 0) || 1;
    const over = [...open].filter((i) => (shares[i] / sum) * left > caps[i]);
    if (!over.length || over.length === open.size) {
      for (const i of open) exact[i] = (shares[i] / sum) * left;
      break;
    }
    for (const i of over) {
      exact[i] = caps[i];
      left -= caps[i];
      open.delete(i);
    }
  }
  return wholeMinutes(total, exact, minEach);
}

/**
 * Whole minutes by largest remainder, then each raised to `minEach` when the total allows by
 * taking from the longest parts; sums exactly to `total`.
 */
export function wholeMinutes(total: number, exact: number[], minEach: number): number[] {
  const sum = exact.reduce((s, x) => s + x, 0) || 1;
  const scaled = exact.map((x) => (x / sum) * total);
  const out = scaled.map((x) => Math.floor(x));
  let left = total - out.reduce((s, x) => s + x, 0);
  const order = scaled
    .map((x, i) => ({ i, frac: x - Math.floor(x) }))
    .sort((a, b) => b.frac - a.frac || a.i - b.i);
  for (let k = 0; left > 0 && order.length; k = (k + 1) % order.length, left--) out[order[k].i]++;
  const floor = Math.min(minEach, Math.floor(total / Math.max(1, exact.length)));
  for (let i = 0; i < out.length; i++) {
    while (out[i] < floor) {
      const donor = out.reduce((best, x, j) => (x > out[best] ? j : best), 0);
      out[donor]--;
      out[i]++;
    }
  }
  return out;
}

/** Lays the parts out in order with drinks breaks so no stretch runs past `stretch` minutes. */
function withBreaks(
  slots: SlotPlan[],
  minutes: number[],
  stretch: number,
  drinks: number,
  minPhase: number,
  hot: boolean,
): PhaseSpec[] {
  const out: PhaseSpec[] = [];
  let clock = 0;
  let run = 0;
  const total = minutes.reduce((s, m) => s + m, 0);
  let played = 0;
  const push = (slot: SlotPlan, length: number, continues: boolean) => {
    out.push({
      name: continues ? continuedName(slot.name) : slot.name,
      slot: slot.role,
      candidates: slot.candidates,
      kinds: slot.kinds,
      startMinute: clock,
      endMinute: clock + length,
      ...(continues ? { continues: true } : {}),
    });
    clock += length;
    run += length;
    played += length;
  };
  const drink = () => {
    out.push({
      name: breakName(hot),
      slot: 'break',
      candidates: [],
      startMinute: clock,
      endMinute: clock + drinks,
    });
    clock += drinks;
    run = 0;
  };
  slots.forEach((slot, i) => {
    let left = minutes[i];
    let continues = false;
    while (left > 0) {
      if (run + left <= stretch) {
        push(slot, left, continues);
        left = 0;
        break;
      }
      const room = stretch - run;
      if (run > 0 && (room < minPhase || left - room < minPhase)) {
        // The boundary before this part is the better place for the break.
        drink();
        continue;
      }
      // Split where the stretch ends, or earlier so what follows the break is a real phase too.
      const first = Math.max(minPhase, Math.min(room, left - minPhase));
      if (left - first < minPhase) {
        push(slot, left, continues);
        left = 0;
        break;
      }
      push(slot, first, continues);
      left -= first;
      continues = true;
      drink();
    }
    // A break at a boundary when the next part would not fit in what is left of the stretch.
    const next = minutes[i + 1];
    if (next !== undefined && run + Math.min(next, minPhase) > stretch && played < total) drink();
  });
  return out;
}
