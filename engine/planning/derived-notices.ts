/**
 * The notices a plan's stations imply: the kit, markings and summary steps write them, and an
 * edit drops them and runs those steps again. Those steps can only write a code listed here
 * (their `warnings` are `DerivedNotices`), so a new one cannot be left out of the refresh.
 */
import type { Notice } from '../../shared/types';

export const DERIVED_CODES = [
  'waiting',
  'gates-for-goals',
  'shots-toward-station',
  'balls-short',
  'station-without-ball',
  'bibs-short',
  'touches-below-target',
] as const;

export type DerivedCode = (typeof DERIVED_CODES)[number];

export interface DerivedNotice extends Notice {
  code: DerivedCode;
}

/** Where a step writes its notices: a plan's warnings, open only to the codes above. */
export interface DerivedNotices {
  push(...notices: DerivedNotice[]): unknown;
  some(test: (notice: Notice) => boolean): boolean;
}

const derived: ReadonlySet<string> = new Set(DERIVED_CODES);

/** Whether a warning is one the stations imply (and an edit writes again). */
export function isDerivedNotice(notice: Notice): boolean {
  return derived.has(notice.code);
}
