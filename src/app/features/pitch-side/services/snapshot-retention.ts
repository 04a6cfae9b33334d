/** How many plan copies the device keeps, and for how long. */
export interface RetentionPolicy {
  /** A copy not saved again within this time goes. */
  maxAgeMs: number;
  /** The most copies kept; past it the oldest go first. */
  maxCopies: number;
}

const DAY_MS = 24 * 60 * 60 * 1000;

/** A fortnight covers a week of training nights and match days plus a week's slack. */
export const SNAPSHOT_RETENTION: RetentionPolicy = { maxAgeMs: 14 * DAY_MS, maxCopies: 20 };

/** A saved time this far ahead of the device clock is a clock error, not a recent save. */
const FUTURE_TOLERANCE_MS = DAY_MS;

/** One plan copy on the device and when it was last saved (epoch ms). */
export interface StoredCopy {
  planId: string;
  savedAt: number;
}

/** What must stay whatever the policy says. */
export interface RetentionGuard {
  now: number;
  /** Plans with actions still waiting to reach the server: their copy is the only record of them. */
  queuedPlanIds: ReadonlySet<string>;
  /** The plan being saved now, whether or not it has a copy yet. */
  keepPlanId?: string;
}

/**
 * The plan ids whose copy should go: those older than the policy allows, then the oldest past its
 * count. Guarded copies always stay, and take up places in the count.
 */
export function copiesToDrop(
  copies: readonly StoredCopy[],
  guard: RetentionGuard,
  policy: RetentionPolicy,
): string[] {
  const isGuarded = (copy: StoredCopy) =>
    copy.planId === guard.keepPlanId || guard.queuedPlanIds.has(copy.planId);
  const guarded = copies.filter(isGuarded);
  const candidates = copies
    .filter((copy) => !isGuarded(copy))
    .map((copy) => ({ planId: copy.planId, savedAt: trustedTime(copy.savedAt, guard.now) }))
    .sort((a, b) => b.savedAt - a.savedAt);
  // The copy being saved takes a place even when this is its first save.
  const keepIsNew =
    guard.keepPlanId !== undefined && !copies.some((copy) => copy.planId === guard.keepPlanId);
  const places = Math.max(0, policy.maxCopies - guarded.length - (keepIsNew ? 1 : 0));
  const drop: string[] = [];
  candidates.forEach((copy, rank) => {
    if (rank >= places || guard.now - copy.savedAt > policy.maxAgeMs) drop.push(copy.planId);
  });
  return drop;
}

/** Unreadable or far-future times count as the oldest, so a broken stamp cannot keep a copy forever. */
function trustedTime(savedAt: number, now: number): number {
  return Number.isFinite(savedAt) && savedAt <= now + FUTURE_TOLERANCE_MS
    ? savedAt
    : Number.NEGATIVE_INFINITY;
}
