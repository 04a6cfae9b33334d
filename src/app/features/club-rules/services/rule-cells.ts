import { HttpErrorResponse } from '@angular/common/http';
import type { ProblemDto } from '../../../../../shared/types';
import { pointerTokens } from '../../../../../shared/json-pointer';
import type { RuleProblem } from './rule-validation';

/** The folds of the rule tables, one per table. */
export type RulePanel =
  | 'keepBall'
  | 'groupSizes'
  | 'areas'
  | 'sessionShapes'
  | 'gameFormats'
  | 'adults'
  | 'touches'
  | 'ageGroups'
  | 'safety';

/** Where a cell is shown: its fold, and the level, age band or kind of session picked above it. */
export interface CellPlace {
  panel: RulePanel;
  level?: string;
  band?: string;
  planKind?: string;
}

const ANY = '[^/]+';
const INDEX = '\\d+';

/** Every cell of the rule tables that can show a problem (its number or text), with where it sits. */
const CELLS: { pattern: RegExp; place: (t: string[]) => CellPlace }[] = [
  {
    pattern: re(`keepBall/${ANY}/(formats|maxAttackersPerDefender)`),
    place: () => ({ panel: 'keepBall' }),
  },
  {
    pattern: re(`groupSizes/${ANY}/${ANY}/(min|preferred|max)`),
    place: (t) => ({ panel: 'groupSizes', level: t[3] }),
  },
  {
    pattern: re(`areas/${ANY}/${ANY}/(width|length|forPlayers|minWidth|maxWidth|step)`),
    place: (t) => ({ panel: 'areas', band: t[3] }),
  },
  {
    pattern: re(`sessionShapes/${ANY}/${ANY}/${INDEX}/(share|maxMinutes)`),
    place: (t) => ({ panel: 'sessionShapes', planKind: t[2], band: t[3] }),
  },
  {
    pattern: re(`gameFormats/${ANY}/(maxPerSide|minPerSide)`),
    place: () => ({ panel: 'gameFormats' }),
  },
  {
    pattern: re(`supervision/(ratios/${INDEX}/childrenPerAdult|minAdults|stationsPerAdult)`),
    place: () => ({ panel: 'adults' }),
  },
  {
    pattern: re(`(timing/(drinksEveryMinutes|heatDrinksEveryMinutes|drinksMinutes))`),
    place: () => ({ panel: 'adults' }),
  },
  {
    pattern: re(`keepBallLimits/(minM2PerPlayer|minSideM|twoDefendersFromAge)`),
    place: () => ({ panel: 'adults' }),
  },
  {
    pattern: re(
      `(touchTarget/(active|minPerPlayer|maxPerPlayer|fromMinutes)|touchRates/${ANY}/(perMinute|activeShare))`,
    ),
    place: () => ({ panel: 'touches' }),
  },
  { pattern: re(`cautions/(heatC|coldC)`), place: () => ({ panel: 'safety' }) },
];

function re(body: string): RegExp {
  return new RegExp(`^/parameters/${body}$`);
}

/**
 * The table cell that shows a problem: the problem's own place, or the nearest place above it
 * that is a cell ("/parameters/keepBall/beginner/formats/0" is shown at the formats cell).
 * Null when no table shows that part of the rules (the advanced text view does).
 */
export function cellOf(pointer: string): string | null {
  const tokens = pointerTokens(pointer);
  for (let n = tokens.length; n > 0; n--) {
    const candidate = '/' + tokens.slice(0, n).join('/');
    if (CELLS.some((cell) => cell.pattern.test(candidate))) return candidate;
  }
  return null;
}

/** Where a cell sits, so the page can open its fold and pick its level or age band. */
export function placeOf(cell: string): CellPlace | null {
  const hit = CELLS.find((c) => c.pattern.test(cell));
  return hit ? hit.place(pointerTokens(cell)) : null;
}

/** Whether the problem is about one of the club's activities (shown on "Our activities"). */
export function activityIndexOf(pointer: string): number | null {
  const match = /^\/parameters\/activities\/(\d+)(\/|$)/.exec(pointer);
  return match ? Number(match[1]) : null;
}

/** Each cell's problems, in the order the check found them. */
export function problemsByCell(problems: readonly RuleProblem[]): Map<string, string[]> {
  const cells = new Map<string, string[]>();
  for (const problem of problems) {
    const cell = cellOf(problem.pointer);
    if (!cell) continue;
    cells.set(cell, [...(cells.get(cell) ?? []), problem.message]);
  }
  return cells;
}

/**
 * The problems of a refused save or publish (400 or 422 problem+json): each field error of the
 * rule set's body ("body/parameters/…") as a problem at its pointer. Empty for other errors.
 */
export function refusalProblems(error: unknown): RuleProblem[] {
  if (!(error instanceof HttpErrorResponse) || (error.status !== 400 && error.status !== 422)) return [];
  const problem = error.error as Partial<ProblemDto> | null;
  return (problem?.errors ?? [])
    .filter((e) => e.field === 'body' || e.field.startsWith('body/'))
    .map((e) => ({ pointer: e.field.slice('body'.length), message: e.message }));
}
