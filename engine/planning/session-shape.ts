/**
 * The parts of a session for the request, from the club's session shapes: a training theme
 * re-fills the technical and opposed parts, each part gets its activities ranked, the coach's
 * pins and the club's required kinds find a place, and short slots lose their least important parts.
 */
import '../../shared/i18n/localize';
import type { ActivityDefinition, Focus, SessionSlot, SlotRole, StationKind } from '../../shared/types';
import { ACTIVITY_KIND_LABELS, FOCUSES } from '../../shared/types';
import { activityById, kindBlocked, notEnoughForIt, rankedActivities, type Ranked } from './activities';
import { activityFeasible, type AllocationRules } from './allocation';
import { addWarning, type BuildContext } from './context';
import { whyUnusable } from './usable';

export interface SlotPlan {
  role: SlotRole;
  name: string;
  /** The kinds the part is for: a phase that ends up playing another kind is named after it. */
  kinds: StationKind[];
  share: number;
  priority: number;
  maxMinutes?: number;
  /** Activities that can fill it, best first; the phase builder falls back along the list. */
  candidates: ActivityDefinition[];
}

/** The training theme: the coach's first focus, else the one the team's recent plans used least. */
export function chooseTheme(ctx: BuildContext): Focus | undefined {
  const { request, params } = ctx;
  if (request.kind !== 'training') return undefined;
  if (request.focus?.length) return request.focus[0];
  const allowed = params.ageGroups[request.ageGroup].allowedKinds;
  const used = new Map<Focus, number>();
  for (const id of ctx.recent)
    for (const f of activityById(params, id)?.focus ?? []) used.set(f, (used.get(f) ?? 0) + 1);
  const options = FOCUSES.filter(
    (f) =>
      (f !== 'goalkeeping' || ctx.keepers.length > 0) &&
      params.themes[f].technical.some((k) => allowed.includes(k)) &&
      params.themes[f].opposed.some((k) => allowed.includes(k)),
  );
  if (!options.length) return undefined;
  const fewest = Math.min(...options.map((f) => used.get(f) ?? 0));
  const best = options.filter((f) => (used.get(f) ?? 0) === fewest);
  return best[Math.floor(ctx.rng() * best.length)];
}

export function sessionSlots(
  ctx: BuildContext,
  rules: AllocationRules,
  theme: Focus | undefined,
): SlotPlan[] {
  const { request, params } = ctx;
  const n = request.players.length;
  const fits = (a: ActivityDefinition) => activityFeasible(n, request.coaches, a, rules);
  const shape: SessionSlot[] = params.sessionShapes[request.kind][ctx.band];
  const chosen = new Set<string>();
  const slots: SlotPlan[] = [];

  // Parts are filled most important first, so a minor part gives way: it avoids the kind its
  // neighbours already play.
  const decided: (SlotPlan | null | undefined)[] = new Array(shape.length);
  const order = shape.map((_, i) => i).sort((a, b) => shape[a].priority - shape[b].priority || a - b);
  for (const index of order) {
    const slot = shape[index];
    const neighbours = [decided[index - 1], decided[index + 1]].flatMap((d) =>
      d?.candidates[0] ? [d.candidates[0].kind] : [],
    );
    let kinds = slot.kinds;
    let themed: StationKind[] = [];
    if (theme && (slot.role === 'technical' || slot.role === 'opposed')) {
      themed = params.themes[theme][slot.role];
      kinds = unique([...themed, ...slot.kinds]);
    }
    // Above the day's intensity limit (the heat) only when nothing calmer can fill the part.
    const calm = (r: Ranked) => r.activity.intensity <= params.intensity.max;
    const own = rankKinds(ctx, kinds, themed, neighbours).filter((r) => fits(r.activity));
    let ranked = own.filter(calm);
    if (!ranked.length && own.length) {
      // Only too intense for today (the heat): the part is left out, not swapped for something else.
      ctx.trace.push({
        ruleId: 'engine.intensity',
        fired: true,
        effect: $localize`${slot.name}:phaseName:: left out, nothing for it is gentle enough today (intensity ${params.intensity.max}:maxIntensity: or less)`,
      });
      decided[index] = null;
      continue;
    }
    if (!ranked.length) {
      const subs = substituteKinds(ctx, kinds);
      ranked = rankKinds(ctx, subs).filter((r) => fits(r.activity) && calm(r));
      if (ranked.length) {
        ctx.trace.push({
          ruleId: 'engine.phase-substitute',
          fired: true,
          effect: $localize`${slot.name}:phaseName:: ${eitherKind(kinds)}:kinds: could not be played (${whyNot(ctx, kinds[0])}:reason:), so ${ranked[0].activity.title}:activityTitle:`,
        });
      }
    }
    if (!ranked.length) {
      addWarning(
        ctx,
        'phase-dropped',
        $localize`No activity could fill “${slot.name}:phaseName:” for this group, so that part is left out.`,
      );
      decided[index] = null;
      continue;
    }
    const plan: SlotPlan = {
      role: slot.role,
      kinds,
      name:
        kinds.includes(ranked[0].activity.kind) || slot.kinds.includes(ranked[0].activity.kind)
          ? slot.name
          : ACTIVITY_KIND_LABELS[ranked[0].activity.kind],
      share: slot.share,
      priority: slot.priority,
      maxMinutes: slot.maxMinutes,
      candidates: ranked.map((r) => r.activity),
    };
    if (slot.maxMinutes === undefined) delete plan.maxMinutes;
    decided[index] = plan;
  }
  for (const plan of decided) if (plan) slots.push(plan);

  placePins(ctx, slots);
  placeRequired(ctx, slots, fits);
  if (request.equipment.balls < n) addShortBallOptions(ctx, slots, fits);
  if (!slots.length) {
    // Nothing in the shape can be played: everyone together in one grid (see sharedGridPhase).
    slots.push({
      role: 'arrival',
      name: $localize`:name of a part of the session:Everyone together`,
      kinds: [],
      share: 1,
      priority: 0,
      candidates: [],
    });
  }
  // Distinct activities: a later part does not repeat an earlier part's first choice.
  for (const s of slots) {
    const fresh = s.candidates.filter((a) => !chosen.has(a.id));
    if (fresh.length) s.candidates = [...fresh, ...s.candidates.filter((a) => chosen.has(a.id))];
    if (s.candidates[0]) chosen.add(s.candidates[0].id);
  }
  return slots;
}

/**
 * Activities of the kinds, best first: a kind lower in the list, or a kind a neighbouring part
 * plays, counts a little against; a kind the training theme names counts for.
 */
function rankKinds(
  ctx: BuildContext,
  kinds: StationKind[],
  themed: StationKind[] = [],
  neighbours: StationKind[] = [],
): Ranked[] {
  const out: Ranked[] = [];
  kinds.forEach((kind, i) => {
    if (kindBlocked(ctx.params, ctx.request.ageGroup, ctx.forbidden, kind)) return;
    const rank =
      i - (themed.includes(kind) ? THEME_BONUS : 0) + (neighbours.includes(kind) ? REPEAT_COST : 0);
    out.push(...rankedActivities(ctx, kind, rank));
  });
  return out.sort((a, b) => b.score - a.score);
}

/** How much a kind the theme names outranks others (more than one focus match). */
const THEME_BONUS = 6;
/** How much a neighbouring part's kind counts against playing it again next to it. */
const REPEAT_COST = 8;

/** Substitute kinds, breadth first, for kinds that cannot be played. */
function substituteKinds(ctx: BuildContext, kinds: StationKind[]): StationKind[] {
  const seen = new Set<StationKind>(kinds);
  const queue = kinds.flatMap((k) => ctx.params.kinds[k].substitutes);
  const out: StationKind[] = [];
  while (queue.length) {
    const next = queue.shift()!;
    if (seen.has(next)) continue;
    seen.add(next);
    out.push(next);
    queue.push(...ctx.params.kinds[next].substitutes);
  }
  return out;
}

function whyNot(ctx: BuildContext, kind: StationKind): string {
  const blocked = kindBlocked(ctx.params, ctx.request.ageGroup, ctx.forbidden, kind);
  if (blocked) return blocked;
  return notEnoughForIt();
}

/** Kinds in words as alternatives: "Keep-ball or Small-sided game". */
function eitherKind(kinds: StationKind[]): string {
  return kinds
    .map((k) => ACTIVITY_KIND_LABELS[k])
    .reduce(
      (list, next) =>
        list ? $localize`:one or another kind of activity:${list}:earlier: or ${next}:later:` : next,
      '',
    );
}

/** Pins go first in a part that plays their kind, else into a part of their own before the last. */
function placePins(ctx: BuildContext, slots: SlotPlan[]): void {
  const { params, request } = ctx;
  const taken = new Set<SlotPlan>();
  for (const id of request.pinnedActivityIds ?? []) {
    const a = activityById(params, id);
    const blocked = a
      ? whyUnusable(ctx, a)
      : $localize`:why an activity cannot be used today:not in the club’s activities`;
    if (!a || blocked) {
      addWarning(
        ctx,
        'pin-not-used',
        $localize`${a?.title ?? id}:activityTitle: was pinned but cannot be used today: ${blocked}:reason:.`,
      );
      continue;
    }
    let slot = slots.find((s) => !taken.has(s) && s.candidates.some((c) => c.kind === a.kind));
    if (!slot) {
      const average = slots.length ? slots.reduce((s, x) => s + x.share, 0) / slots.length : 1;
      slot = {
        role: 'technical',
        name: ACTIVITY_KIND_LABELS[a.kind],
        kinds: [a.kind],
        share: average,
        priority: 0,
        maxMinutes: 12,
        candidates: [],
      };
      // Before the session's closing parts (game, sharp finish, cool-down), so those still close it.
      let at = slots.length;
      while (at > 0 && CLOSING.has(slots[at - 1].role)) at--;
      slots.splice(a.kind === 'small-sided-game' || a.kind === 'cool-down' ? slots.length : at, 0, slot);
    }
    slot.candidates = [a, ...slot.candidates.filter((c) => c.id !== a.id)];
    slot.priority = Math.min(slot.priority, 0);
    taken.add(slot);
    ctx.trace.push({
      ruleId: 'engine.pinned',
      fired: true,
      effect: $localize`${a.title}:activityTitle: pinned by the coach: in “${slot.name}:phaseName:”`,
    });
  }
}

/** Kinds the club's rules require get a part of their own when no part plays them. */
function placeRequired(ctx: BuildContext, slots: SlotPlan[], fits: (a: ActivityDefinition) => boolean): void {
  for (const req of ctx.outcome.required) {
    const present = slots.find((s) => s.candidates[0]?.kind === req.kind);
    if (present) {
      present.priority = Math.min(present.priority, -1);
      continue;
    }
    const ranked = rankedActivities(ctx, req.kind).filter((r) => fits(r.activity));
    if (!ranked.length) continue;
    const average = slots.length ? slots.reduce((s, x) => s + x.share, 0) / slots.length : 1;
    const slot: SlotPlan = {
      role:
        req.kind === 'small-sided-game' ? 'game' : req.kind === 'movement-prep' ? 'movement' : 'technical',
      name: ACTIVITY_KIND_LABELS[req.kind],
      kinds: [req.kind],
      share: average,
      priority: -1,
      candidates: ranked.map((r) => r.activity),
    };
    if (req.kind === 'movement-prep') slots.unshift(slot);
    else slots.push(slot);
    ctx.trace.push({
      ruleId: 'engine.required-phase',
      fired: true,
      effect: $localize`:a part added to the session because a club rule requires its kind:added ${ACTIVITY_KIND_LABELS[req.kind]}:kindName:: ${req.reason}:reason:`,
    });
  }
}

/**
 * With fewer balls than players, every part may fall back on activities that share a ball in a
 * group (tried only when its own cannot keep everyone busy with the balls there are).
 */
function addShortBallOptions(
  ctx: BuildContext,
  slots: SlotPlan[],
  fits: (a: ActivityDefinition) => boolean,
): void {
  const shared: ActivityDefinition[] = [];
  for (const kind of SHARED_BALL_KINDS) {
    if (kindBlocked(ctx.params, ctx.request.ageGroup, ctx.forbidden, kind)) continue;
    const best = rankedActivities(ctx, kind).find((r) => fits(r.activity) && r.activity.balls !== 'each');
    if (best) shared.push(best.activity);
  }
  for (const s of slots) s.candidates = [...s.candidates, ...shared.filter((a) => !s.candidates.includes(a))];
}

/** Kinds whose activities keep a whole group busy with one or two balls. */
const SHARED_BALL_KINDS: StationKind[] = [
  'passing-pattern',
  'keep-ball',
  'directional-possession',
  'small-sided-game',
  'tag-game',
];

const CLOSING = new Set<SlotRole>(['game', 'finish', 'cool-down']);

function unique<T>(items: T[]): T[] {
  return [...new Set(items)];
}
