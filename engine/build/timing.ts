/**
 * Phases from the rule set's template for the kind and age: kinds that are forbidden or cannot
 * be played are swapped for their substitutes, required kinds are added, focus stretches shares,
 * short slots drop the least important phases, and whole minutes sum exactly to the request.
 */
import type { ActivityDefinition, ActivityKind, PhaseTemplateEntry } from '../../shared/types';
import { chooseActivity, kindBlocked } from './activities';
import { kindFeasible, type AllocationRules } from './allocation';
import { addWarning, type BuildContext } from './context';

export interface PhaseSpec {
  name: string;
  kind: ActivityKind;
  activity: ActivityDefinition;
  startMinute: number;
  endMinute: number;
}

export function planPhases(ctx: BuildContext, rules: AllocationRules): PhaseSpec[] {
  const { request, params } = ctx;
  const n = request.players.length;
  const usable = (kind: ActivityKind) =>
    kindBlocked(params, request.ageGroup, ctx.forbidden, kind) === null &&
    kindFeasible(n, request.coaches, kind, rules);

  const entries: PhaseTemplateEntry[] = [];
  for (const entry of params.phaseTemplates[request.kind][ctx.band]) {
    const kind = usable(entry.kind) ? entry.kind : substituteFor(entry.kind, ctx, usable);
    if (!kind) continue;
    if (kind !== entry.kind) {
      ctx.trace.push({
        ruleId: 'engine.phase-substitute',
        fired: true,
        effect: `${entry.name}: ${entry.kind} → ${kind} (${whyNot(entry.kind, ctx, usable)})`,
      });
    }
    const same = entries.find((e) => e.kind === kind);
    if (same) {
      same.share += entry.share;
      same.priority = Math.min(same.priority, entry.priority);
    } else {
      entries.push({ ...entry, kind, name: kind === entry.kind ? entry.name : nameFor(kind) });
    }
  }
  for (const req of ctx.outcome.required) {
    if (!usable(req.kind)) continue;
    const present = entries.find((e) => e.kind === req.kind);
    if (present) present.priority = -1;
    else {
      const share = entries.length ? entries.reduce((s, e) => s + e.share, 0) / entries.length : 1;
      entries.push({ kind: req.kind, name: nameFor(req.kind), share, priority: -1 });
      ctx.trace.push({
        ruleId: 'engine.required-phase',
        fired: true,
        effect: `added ${req.kind}: ${req.reason}`,
      });
    }
  }
  if (!entries.length)
    entries.push({ kind: 'ball-mastery', name: nameFor('ball-mastery'), share: 1, priority: 0 });

  const maxPhases = Math.max(1, Math.floor(request.minutes / params.timing.minPhaseMinutes));
  const kept = [...entries];
  while (kept.length > maxPhases) {
    const drop = kept.reduce((worst, e) => (e.priority > worst.priority ? e : worst), kept[0]);
    kept.splice(kept.indexOf(drop), 1);
    ctx.trace.push({
      ruleId: 'engine.short-slot',
      fired: true,
      effect: `${request.minutes} min fits ${maxPhases} phase(s) of ${params.timing.minPhaseMinutes}+ min: dropped ${drop.name}`,
    });
  }

  const withActivity = kept.map((e) => {
    const activity = chooseActivity(
      params,
      request.ageGroup,
      ctx.forbidden,
      e.kind,
      request.focus ?? [],
      ctx.rng,
    );
    return { entry: e, activity: activity ?? fallbackActivity(ctx, e.kind) };
  });
  // Rising intensity towards the end; the template order breaks ties.
  withActivity.sort((a, b) => a.activity.intensity - b.activity.intensity);

  const shares = withActivity.map((w) => w.entry.share * (params.focusBoost[w.entry.kind] ?? 1));
  const minutes = splitMinutes(request.minutes, shares, params.timing.minPhaseMinutes);
  let start = 0;
  const specs = withActivity.map((w, i) => {
    const spec: PhaseSpec = {
      name: w.entry.name,
      kind: w.activity.kind,
      activity: w.activity,
      startMinute: start,
      endMinute: start + minutes[i],
    };
    start += minutes[i];
    return spec;
  });
  ctx.trace.push({
    ruleId: 'engine.timing',
    fired: true,
    effect: specs.map((s) => `${s.name} ${s.endMinute - s.startMinute} min`).join(', '),
  });
  return specs;
}

function substituteFor(
  kind: ActivityKind,
  ctx: BuildContext,
  usable: (k: ActivityKind) => boolean,
): ActivityKind | null {
  const seen = new Set<ActivityKind>([kind]);
  const queue = [...ctx.params.kinds[kind].substitutes];
  while (queue.length) {
    const next = queue.shift()!;
    if (seen.has(next)) continue;
    seen.add(next);
    if (usable(next)) return next;
    queue.push(...ctx.params.kinds[next].substitutes);
  }
  addWarning(
    ctx,
    'phase-dropped',
    `No activity could replace ${kind} for this group, so that phase is left out.`,
  );
  return null;
}

function whyNot(kind: ActivityKind, ctx: BuildContext, usable: (k: ActivityKind) => boolean): string {
  const blocked = kindBlocked(ctx.params, ctx.request.ageGroup, ctx.forbidden, kind);
  if (blocked) return blocked;
  return usable(kind) ? 'allowed' : 'too few players or not enough kit for it';
}

function fallbackActivity(ctx: BuildContext, kind: ActivityKind): ActivityDefinition {
  return ctx.params.activities.find((a) => a.kind === kind) ?? ctx.params.activities[0];
}

const KIND_NAMES: Record<ActivityKind, string> = {
  'ball-mastery': 'Arrival touches',
  'passing-finishing': 'Pass and finish',
  'keep-ball': 'Keep-ball',
  pairs: 'Passing in pairs',
  'small-sided-game': 'Small-sided game',
  'movement-prep': 'Movement preparation',
};

export function nameFor(kind: ActivityKind): string {
  return KIND_NAMES[kind];
}

/**
 * Whole minutes in proportion to the shares (largest remainder), then each raised to `minEach`
 * when the total allows by taking from the longest phases; sums exactly to `total`.
 */
export function splitMinutes(total: number, shares: number[], minEach: number): number[] {
  const sum = shares.reduce((s, x) => s + x, 0) || 1;
  const exact = shares.map((s) => (s / sum) * total);
  const out = exact.map((x) => Math.floor(x));
  let left = total - out.reduce((s, x) => s + x, 0);
  const order = exact
    .map((x, i) => ({ i, frac: x - Math.floor(x) }))
    .sort((a, b) => b.frac - a.frac || a.i - b.i);
  for (let k = 0; left > 0; k = (k + 1) % order.length, left--) out[order[k].i]++;
  const floor = Math.min(minEach, Math.floor(total / shares.length));
  for (let i = 0; i < out.length; i++) {
    while (out[i] < floor) {
      const donor = out.reduce((best, x, j) => (x > out[best] ? j : best), 0);
      out[donor]--;
      out[i]++;
    }
  }
  return out;
}
