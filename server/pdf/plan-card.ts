import '../../shared/i18n/localize';
import type { Column, Content, TDocumentDefinitions, TableCell } from 'pdfmake/interfaces';
import { LANGUAGES } from '../../shared/i18n/languages';
import { currentLanguage } from '../i18n/translations';
import type { Changeover, Equipment, Phase, Plan, PositionRole, Station } from '../../shared/types';
import { ACTIVITY_KIND_LABELS, FOCUS_LABELS, POSITION_STYLE } from '../../shared/types/activity-words';
import { ageGroupLabel, LEVEL_LABELS } from '../../shared/types/squad-words';
import { planLength, sessionClock } from '../../shared/time/session-clock';
import { dayInWords, minuteInWords, timeInWords } from '../services/session-day';
import { DEFAULT_UNITS, formatSize, inUnitsDeep, type DistanceUnit, type Units } from '../../shared/units';
import { CARD_FONT } from './fonts';
import { printableContent } from './printable';
import {
  coachMark,
  diagramMarks,
  legendSymbolSvg,
  stationDiagramSvg,
  type LegendKey,
} from './station-diagram';

export type Paper = 'a4' | 'letter';
export const PAPERS: readonly Paper[] = ['a4', 'letter'];

/** What the card needs besides the plan itself. */
export interface CardInput {
  plan: Plan;
  teamName: string;
  /** ISO date (YYYY-MM-DD) of the session, if set. */
  date?: string | null;
  /** "HH:MM": kick-off for a match warm-up (the plan ends there), start time for training. */
  kickOff?: string | null;
  /** "Club rules: Fernmoor rules, published 3 Dec": the footer says which rules made the plan. */
  rules?: string;
  /** Locale of dates and clock times (BCP 47): the person's stored one, else the club's. */
  locale?: string;
  /** Units of the person printing or sharing (their own, else the club's); metres and °C when absent. */
  units?: Units;
  /** Display names by player id; falls back to names in the request, then the id. */
  playerNames?: Record<string, string>;
}

/** Printed on every card, whatever the plan says (US CPSC movable-goal guidance; common practice otherwise). */
export const goalSafetyNote = (): string =>
  $localize`:safety note printed on every card:Anchor or weight every movable goal and never let anyone climb or hang on one (US Consumer Product Safety Commission, movable soccer goal safety).`;
export const standingSafetyNote = (): string =>
  $localize`:safety note printed on every card:Check the surface before you start, keep water to hand and give breaks in the heat. Follow your local rules, the club safeguarding policy and qualified first-aid advice.`;

/** Sizes that shrink when a card would run onto a second page. */
export interface CardDensity {
  /** Page margin in points. */
  margin: number;
  /** Points between phases. */
  gap: number;
  /** Most stations in one row of a phase. */
  perRow: number;
  baseFont: number;
  lineHeight: number;
  smallFont: number;
  gridDiagramHeight: number;
  soloDiagramHeight: number;
}

export const REGULAR: CardDensity = {
  margin: 22,
  gap: 6,
  perRow: 5,
  baseFont: 7.5,
  lineHeight: 1.1,
  smallFont: 6.8,
  gridDiagramHeight: 64,
  soloDiagramHeight: 88,
};
export const COMPACT: CardDensity = {
  margin: 22,
  gap: 5,
  perRow: 6,
  baseFont: 6.8,
  lineHeight: 1.1,
  smallFont: 6.2,
  gridDiagramHeight: 50,
  soloDiagramHeight: 66,
};
/** For a long session with many groups. */
export const TIGHT: CardDensity = {
  margin: 18,
  gap: 3,
  perRow: 8,
  baseFont: 6.3,
  lineHeight: 1.02,
  smallFont: 5.8,
  gridDiagramHeight: 36,
  soloDiagramHeight: 48,
};
/** The last resort before a second page: fine print, as on a fixture list. */
export const SMALLEST: CardDensity = {
  margin: 16,
  gap: 2,
  perRow: 8,
  baseFont: 5.9,
  lineHeight: 1,
  smallFont: 5.5,
  gridDiagramHeight: 32,
  soloDiagramHeight: 42,
};

const KIT_KEYS: (keyof Equipment)[] = ['balls', 'cones', 'bibs', 'goals'];

/** "12 cones", "1 small goal": a number of a kind of kit; `short` for a station's line ("1 goal"). */
function kitCount(kind: keyof Equipment, count: number, short = false): string {
  const one = count === 1;
  switch (kind) {
    case 'balls':
      return one ? $localize`:kit on the card:1 ball` : $localize`:kit on the card:${count}:count: balls`;
    case 'cones':
      return one ? $localize`:kit on the card:1 cone` : $localize`:kit on the card:${count}:count: cones`;
    case 'bibs':
      return one ? $localize`:kit on the card:1 bib` : $localize`:kit on the card:${count}:count: bibs`;
    case 'goals':
      if (short)
        return one
          ? $localize`:small goals a station needs, in short:1 goal`
          : $localize`:small goals a station needs, in short:${count}:count: goals`;
      return one
        ? $localize`:kit on the card:1 small goal`
        : $localize`:kit on the card:${count}:count: small goals`;
  }
}

const PAGE_WIDTH: Record<Paper, number> = { a4: 595.28, letter: 612 };
/** Up to this many stations sit in fixed-width cells with their coaching beside them. */
const SIDE_BY_SIDE_MAX = 4;
/** Those cells take at most two thirds of the width, each between these widths. */
const SIDE_CELL_WIDTH = { min: 88, max: 150 };
const TINT = ['#f3f7f1', '#e4efdf', '#d5e7cc', '#f4e4c8', '#f1d2bd'];
const BREAK_TINT = '#dcebf3';
const MUTED = '#44524a';

/** The legend's order and words: the start-position roles, then the kit markers. */
const legendEntries = (): [LegendKey, string][] => [
  ...(Object.keys(POSITION_STYLE) as PositionRole[]).map((role): [LegendKey, string] => [
    role,
    POSITION_STYLE[role].label,
  ]),
  ['cone', $localize`:in the key to the card's diagrams:Cone`],
  ['goal', $localize`:in the key to the card's diagrams, a small goal:Goal`],
  ['gate', $localize`:in the key to the card's diagrams:Gate (two cones)`],
];

/** Short role tags in the group list, so the list still reads on a grey printout. */
const roleTags = (): Partial<Record<PositionRole, string>> => ({
  goalkeeper: $localize`:a player's role in brackets after their name on the card:goalkeeper`,
  defender: $localize`:a player's role in brackets after their name on the card:defender`,
  'team-a': $localize`:a player's side in brackets after their name on the card, short for Team A:A`,
  'team-b': $localize`:a player's side in brackets after their name on the card, short for Team B:B`,
  server: $localize`:a player's role in brackets after their name on the card, the one who serves the ball:server`,
  neutral: $localize`:a player's role in brackets after their name on the card, plays for whichever side has the ball:neutral`,
});

/** The pdfmake document for one plan's card: header, timeline, legend, a block per phase, kit and cautions. */
export function planCardDefinition(
  input: CardInput,
  paper: Paper = 'a4',
  density: CardDensity = REGULAR,
  onPageCount?: (pages: number) => void,
): TDocumentDefinitions {
  const units = input.units ?? DEFAULT_UNITS;
  // The engine words its warnings and notes in metres and °C: the card reads in the printer's units.
  const plan = inUnitsDeep(input.plan, units);
  input = { ...input, plan, units };
  const MARGIN = density.margin;
  const contentWidth = PAGE_WIDTH[paper] - 2 * MARGIN;
  const locale = input.locale ?? 'en-GB';
  const clock = sessionClock(plan.request.kind, input.kickOff, planLength(plan.phases));
  const at = (minute: number) => minuteInWords(clock, minute, locale);
  const context: CardContext = {
    at,
    names: nameLookup(input),
    width: contentWidth,
    density,
    firstShown: firstPhases(plan),
    distance: units.distance,
  };

  return {
    pageSize: paper === 'a4' ? 'A4' : 'LETTER',
    language: cardLanguage(),
    pageMargins: [MARGIN, MARGIN, MARGIN, MARGIN + 6],
    info: { title: `${input.teamName} — ${kindLabel(plan)}`, creator: 'Conewise' },
    defaultStyle: {
      font: CARD_FONT,
      fontSize: density.baseFont,
      lineHeight: density.lineHeight,
      color: '#1d2620',
    },
    styles: {
      title: { fontSize: 15, bold: true },
      subtitle: { fontSize: 8.5, color: MUTED },
      phase: { fontSize: 9.5, bold: true, color: '#1f3d28' },
      station: { fontSize: 8, bold: true },
      label: { bold: true, color: '#3d6b47' },
      small: { fontSize: density.smallFont },
    },
    footer: (page: number, pages: number) => {
      onPageCount?.(pages);
      const rules = input.rules ?? $localize`:the card's footer when the club's rules are gone:Club rules`;
      return {
        text: $localize`:the card's footer, plan ref is the plan's reference:Conewise card · ${rules}:rules: · plan ref ${plan.seed}:planRef: · page ${page}:page: of ${pages}:pages:`,
        fontSize: 6,
        color: '#7a857e',
        margin: [MARGIN, 8, MARGIN, 0],
      };
    },
    content: printableContent([
      header(input, at, clock.start !== null),
      timeline(plan, at, contentWidth),
      kitChecklist(plan),
      legend(plan),
      ...plan.phases.map((phase, i) => phaseBlock(phase, plan.phases.slice(0, i), context)),
      closingBlock(plan),
    ]),
  };
}

function header(input: CardInput, at: MinuteText, timed: boolean): Content {
  const { plan } = input;
  const request = plan.request;
  const when = [
    input.date ? dayInWords(input.date, input.locale ?? 'en-GB', 'short-day-year') : null,
    input.kickOff ? startInWords(plan, timeInWords(input.kickOff, input.locale ?? 'en-GB')) : null,
    minutesInWords(planLength(plan.phases)),
  ].filter(Boolean);
  const players = request.players.length;
  const size = formatSize((input.units ?? DEFAULT_UNITS).distance, request.space);
  const facts = [
    ageGroupLabel(request.ageGroup),
    LEVEL_LABELS[request.level],
    players === 1
      ? $localize`:how many players the session is for:1 player`
      : $localize`:how many players the session is for:${players}:count: players`,
    request.coaches === 1
      ? $localize`:how many coaches run the session:1 coach`
      : $localize`:how many coaches run the session:${request.coaches}:count: coaches`,
    $localize`:the space the session has, width by length:space ${size}:size:`,
    timed ? $localize`:when players should arrive:arrive by ${at(-10)}:time:` : null,
  ].filter(Boolean);
  const focus = plan.theme ? (FOCUS_LABELS[plan.theme] ?? plan.theme) : null;
  const theme = focus ? ` · ${$localize`:the session's focus:theme: ${focus}:theme:`}` : '';
  return {
    margin: [0, 0, 0, 6],
    columns: [
      {
        width: '*',
        stack: [
          { text: input.teamName, style: 'title' },
          { text: `${kindLabel(plan)}${theme}`, style: 'subtitle' },
        ],
      },
      {
        width: 'auto',
        alignment: 'right',
        stack: [
          { text: when.join(' · '), fontSize: 11, bold: true },
          { text: facts.join(' · '), style: 'subtitle' },
        ],
      },
    ],
  };
}

/** One row of phase cells, widths proportional to their minutes, ending at kick-off for a warm-up. */
function timeline(plan: Plan, at: MinuteText, width: number): Content {
  const total = Math.max(planLength(plan.phases), 1);
  const endCell = plan.request.kind === 'match-warm-up' ? 40 : 0;
  // A table is as wide as its columns plus each cell's padding (4 + 4) and the lines between
  // them (2 each, one more than the columns): all of it inside the page.
  const columns = plan.phases.length + (endCell ? 1 : 0);
  const usable = width - endCell - columns * 10 - 2;
  const cells: TableCell[] = plan.phases.map((phase) => ({
    fillColor: isBreak(phase) ? BREAK_TINT : TINT[Math.min(Math.max((phase.intensity ?? 2) - 1, 0), 4)],
    stack: [
      { text: `${at(phase.startMinute)}–${at(phase.endMinute)}`, bold: true },
      {
        text: isBreak(phase)
          ? $localize`:a drinks break on the card's timeline, in one word:Drinks`
          : phase.name,
        style: 'small',
      },
    ],
  }));
  const widths: number[] = plan.phases.map((phase) =>
    Math.max(38, ((phase.endMinute - phase.startMinute) / total) * usable),
  );
  const scale = usable / (widths.reduce((a, b) => a + b, 0) || 1);
  const fitted = widths.map((w) => Math.floor(w * Math.min(scale, 1)));
  if (endCell) {
    cells.push({
      fillColor: '#1f3d28',
      color: '#ffffff',
      stack: [
        { text: at(total), bold: true },
        { text: $localize`:the end of a match warm-up on the card's timeline:Kick-off`, style: 'small' },
      ],
    });
    fitted.push(endCell);
  }
  return {
    margin: [0, 0, 0, 4],
    table: { widths: fitted, body: [cells] },
    layout: {
      hLineColor: () => '#ffffff',
      vLineColor: () => '#ffffff',
      hLineWidth: () => 0,
      vLineWidth: () => 2,
      paddingTop: () => 3,
      paddingBottom: () => 3,
    },
  };
}

/** What this card's diagrams draw, in the diagrams' own colours: only the roles and kit that appear. */
export function legendKeys(plan: Plan): LegendKey[] {
  const marks = new Set<LegendKey>();
  for (const phase of plan.phases)
    for (const station of phase.stations) diagramMarks(station).forEach((m) => marks.add(m));
  return legendEntries()
    .map(([key]) => key)
    .filter((key) => marks.has(key));
}

const LEGEND_FONT = 6.6;

function legend(plan: Plan): Content {
  const keys = legendKeys(plan);
  if (!keys.length) return { text: '' };
  const words = new Map(legendEntries());
  // Fixed widths from the condensed face's character widths (about half the size, with room to
  // spare): auto-sized columns squeeze the last entries into two lines.
  const widthOf = (label: string) => Math.ceil(label.length * LEGEND_FONT * 0.5) + 2;
  return {
    margin: [0, 0, 0, 5],
    columnGap: 2,
    fontSize: LEGEND_FONT,
    columns: [
      // As wide as the word needs: "Key" is short, another language's word may not be.
      {
        width: 'auto',
        text: $localize`:heading of the key to the card's diagrams:Key`,
        style: 'label',
        margin: [0, 0, 4, 0],
      },
      ...keys.flatMap((key): Column[] => {
        const label = words.get(key) ?? key;
        return [
          { width: 8, svg: legendSymbolSvg(key), margin: [0, 0.2, 0, 0] },
          { width: widthOf(label) + 6, text: label },
        ];
      }),
    ],
  };
}

/** A plan minute as the card prints it: a clock time in the reader's locale, or "min 12". */
type MinuteText = (minute: number) => string;

/** What every phase block needs from the card. */
interface CardContext {
  at: MinuteText;
  names: (id: string) => string;
  width: number;
  density: CardDensity;
  /** Where each activity's coaching is first printed; later phases point back to it. */
  firstShown: Map<string, Phase>;
  /** The unit of the diagrams' side labels. */
  distance: DistanceUnit;
}

/** Each activity's first phase on the card (drinks breaks and resumed phases print none). */
function firstPhases(plan: Plan): Map<string, Phase> {
  const first = new Map<string, Phase>();
  plan.phases.forEach((phase, i) => {
    if (isBreak(phase) || resumed(phase, plan.phases.slice(0, i))) return;
    for (const station of phase.stations)
      if (!first.has(station.activityId)) first.set(station.activityId, phase);
  });
  return first;
}

function phaseBlock(phase: Phase, allBefore: Phase[], ctx: CardContext): Content {
  const { at, names, width, density } = ctx;
  const previous = allBefore.at(-1);
  if (isBreak(phase) || !phase.stations.length) return breakRow(phase, at, density);
  const heading = [phaseHeading(phase, previous, at)];
  const before = resumed(phase, allBefore);
  if (before) {
    const same = $localize`:a phase that carries on after a drinks break:same groups, set-up and coaching as ${at(before.startMinute)}:start:–${at(before.endMinute)}:end:: play on`;
    return { margin: [0, 2, 0, density.gap], stack: [phaseHeading(phase, previous, at, same)] };
  }
  if (phase.stations.length === 1) {
    return {
      unbreakable: true,
      margin: [0, 2, 0, density.gap],
      stack: [...heading, soloStation(phase, phase.stations[0], ctx)],
    };
  }
  const activities = distinctActivities(phase);
  const count = phase.stations.length;
  // A few stations leave room beside them: the coaching goes there instead of underneath. The
  // coaching of several activities is longer, so their cells give it more of the width.
  const share = activities.length > 1 ? 0.45 : 2 / 3;
  const sideCell = Math.min(SIDE_CELL_WIDTH.max, Math.floor((width * share) / count));
  const beside = count <= SIDE_BY_SIDE_MAX && sideCell >= SIDE_CELL_WIDTH.min;
  const perRow = beside ? count : Math.min(density.perRow, count);
  const cellWidth = beside ? sideCell : (width - (perRow - 1) * 6) / perRow;
  const rows: TableCell[][] = [];
  for (let i = 0; i < count; i += perRow) {
    const row: TableCell[] = phase.stations
      .slice(i, i + perRow)
      .map((station, j) => stationCell(phase, station, i + j + 1, names, cellWidth, density, ctx.distance));
    while (row.length < perRow) row.push({ text: '' });
    rows.push(row);
  }
  const grid: Content = {
    table: { widths: Array(perRow).fill(cellWidth - 6), body: rows, dontBreakRows: true },
    layout: cardLayout(),
  };
  if (beside) {
    return {
      unbreakable: true,
      margin: [0, 2, 0, density.gap],
      stack: [
        ...heading,
        {
          columnGap: 10,
          columns: [
            { width: perRow * cellWidth - 6, stack: [grid] },
            { width: '*', stack: [coachingParagraphs(phase, activities, activities.length > 1, ctx)] },
          ],
        },
      ],
    };
  }
  return {
    unbreakable: true,
    margin: [0, 2, 0, density.gap],
    stack: [
      ...heading,
      activities.length === 1 && activities[0].description && !shownBefore(activities[0], phase, ctx)
        ? { text: activities[0].description, margin: [0, 0, 0, 3] }
        : { text: '' },
      grid,
      activities.length > 1 || shownBefore(activities[0], phase, ctx)
        ? coachingParagraphs(phase, activities, true, ctx)
        : density === REGULAR
          ? coachingColumns(activities[0])
          : coachingRunOn(activities[0]),
    ],
  };
}

/** A drinks break: one tinted row with its time, no stations. */
function breakRow(phase: Phase, at: MinuteText, density: CardDensity): Content {
  const minutes = phase.endMinute - phase.startMinute;
  return {
    margin: [0, 0, 0, density.gap],
    table: {
      widths: ['*'],
      body: [
        [
          {
            fillColor: BREAK_TINT,
            text: [
              {
                text: `${at(phase.startMinute)}–${at(phase.endMinute)}  `,
                bold: true,
              },
              { text: phase.name || ACTIVITY_KIND_LABELS.break, bold: true },
              {
                text: `  · ${$localize`:a drinks break on the card:${minutes}:minutes: min · water for everyone; set up the next part now if you can`}`,
              },
            ],
          },
        ],
      ],
    },
    layout: 'noBorders',
  };
}

/** "10:05–10:12  Keep-ball and breakouts · Keep-ball · 7 min · intensity 4/5", then its set-up work. */
function phaseHeading(phase: Phase, previous: Phase | undefined, at: MinuteText, note?: string): Content {
  const setUp = changeoverText(phase.changeover, previous);
  const minutes = phase.endMinute - phase.startMinute;
  const kind = ACTIVITY_KIND_LABELS[phase.activityKind];
  const kindText = kind && kind.toLowerCase() !== phase.name.toLowerCase() ? ` · ${kind}` : '';
  return {
    text: [
      `${at(phase.startMinute)}–${at(phase.endMinute)}  `,
      { text: phase.name },
      {
        text: `${kindText}  · ${minutesInWords(minutes)}${
          phase.intensity
            ? ` · ${$localize`:how hard a phase is, out of 5:intensity ${phase.intensity}:intensity:/5`}`
            : ''
        }`,
        bold: false,
      },
      note ? { text: ` · ${note}`, bold: false, fontSize: 7.5 } : '',
      setUp ? { text: `     ${setUp}`, bold: false, fontSize: 7, color: MUTED } : '',
    ],
    style: 'phase',
    margin: [0, 0, 0, 2],
  };
}

/** "Set up: 12 cones, move 1 goal — 1 min": the kit work before a phase, where there is any. */
export function changeoverText(
  changeover: Changeover | undefined,
  previous: Phase | undefined,
): string | null {
  if (!changeover) return null;
  const { conesPlaced, conesLifted, goalsMoved, minutes } = changeover;
  const work = [
    conesPlaced ? kitCount('cones', conesPlaced) : null,
    conesLifted ? $localize`:cones to pick up before a phase:lift ${conesLifted}:count:` : null,
    goalsMoved
      ? goalsMoved === 1
        ? $localize`:small goals to carry to a new place before a phase:move 1 goal`
        : $localize`:small goals to carry to a new place before a phase:move ${goalsMoved}:count: goals`
      : null,
  ].filter(Boolean);
  if (!work.length) return null;
  const when =
    minutes > 0
      ? minutesInWords(minutes)
      : !previous
        ? $localize`:when the kit work before the first phase is done:before the start`
        : isBreak(previous)
          ? $localize`:when the kit work before a phase is done:during the drinks break`
          : '';
  const setUp = $localize`:the kit work before a phase:Set up: ${work.join(', ')}:work:`;
  return when ? `${setUp} — ${when}` : setUp;
}

/** A phase with one station: the diagram on the left, group and coaching beside it. */
function soloStation(phase: Phase, station: Station, ctx: CardContext): Content {
  const { names, width, density } = ctx;
  const shownAt = shownBefore(station, phase, ctx);
  const diagram = stationDiagramSvg(station, {
    maxWidth: 170,
    maxHeight: density.soloDiagramHeight,
    distance: ctx.distance,
  });
  return {
    columnGap: 10,
    columns: [
      { width: diagram.width, svg: diagram.svg, height: diagram.height },
      {
        width: width - diagram.width - 10,
        stack: [
          stationTitle(phase, station, 1),
          shownAt || !station.description ? '' : { text: station.description, margin: [0, 0, 0, 2] },
          { text: groupList(station, names).join(' · '), style: 'small' },
          notesLine(station),
          shownAt
            ? {
                text: $localize`:an activity explained earlier on the card, at these times:Coaching as at ${shownAt}:times:.`,
                style: 'small',
                italics: true,
              }
            : coachingStack(station),
        ],
      },
    ],
  };
}

/** "1. Title  4v1 · 2 balls, 8 cones": the station's title, its format beside it, then its kit. */
function stationTitle(phase: Phase, station: Station, index: number): Content {
  return {
    margin: [0, 0, 0, 2],
    text: [
      { text: `${index}. ${station.title}`, style: 'station' },
      station.format ? { text: `  ${station.format}`, style: 'station', bold: false, color: MUTED } : '',
      { text: `  · ${stationFacts(phase, station)}`, style: 'small', color: MUTED },
    ],
  };
}

/** "1 Ava K. (goalkeeper) · 2 Bilal R. …": numbers as in the diagram's circles, roles from the start positions. */
export function groupList(station: Station, names: (id: string) => string): string[] {
  const roleOf = new Map(station.positions.map((p) => [p.id, p.role]));
  const keepers = new Set(station.roles.goalkeeper ?? []);
  const defenders = new Set(station.roles.defenders ?? []);
  const allTags = roleTags();
  const entry = (id: string, tags: Partial<Record<PositionRole, string>>) => {
    const role =
      roleOf.get(id) ?? (keepers.has(id) ? 'goalkeeper' : defenders.has(id) ? 'defender' : undefined);
    const tag = role ? tags[role] : undefined;
    return `${station.playerIds.indexOf(id) + 1} ${names(id)}${tag ? ` (${tag})` : ''}`;
  };
  const sides = station.roles.teams;
  // Two sides: each listed under its name once rather than a tag on every player; anyone on
  // neither side (a neutral, a server) after them under their role.
  let group: string[];
  if (sides) {
    const onSide = new Set(sides.flat());
    const others = new Map<string, string[]>();
    for (const id of station.playerIds.filter((p) => !onSide.has(p))) {
      const label = POSITION_STYLE[roleOf.get(id) ?? 'player'].label;
      others.set(label, [...(others.get(label) ?? []), entry(id, {})]);
    }
    group = [
      ...sides.map(
        (side, i) =>
          `${POSITION_STYLE[i === 0 ? 'team-a' : 'team-b'].label}: ${side.map((id) => entry(id, { goalkeeper: allTags.goalkeeper })).join(', ')}`,
      ),
      ...[...others].map(([label, entries]) => `${label}: ${entries.join(', ')}`),
    ];
  } else {
    group = station.playerIds.map((id) => entry(id, allTags));
  }
  if (station.coachJoins)
    group.push(
      $localize`:the last line of a group list, after the coach's letter on the diagram:${coachMark()}:coachLetter:: a coach joins`,
    );
  return group;
}

function notesLine(station: Station): Content {
  return station.notes?.length
    ? {
        text: [
          { text: `${$localize`:label before a station's notes on the card:Note`}: `, style: 'label' },
          station.notes.join(' '),
        ],
        style: 'small',
        italics: true,
      }
    : '';
}

function stationCell(
  phase: Phase,
  station: Station,
  index: number,
  names: (id: string) => string,
  width: number,
  density: CardDensity,
  distance: DistanceUnit,
): TableCell {
  const inner = width - 6;
  const diagram = stationDiagramSvg(station, {
    maxWidth: Math.min(inner - 2, 150),
    maxHeight: density.gridDiagramHeight,
    distance,
  });
  const group = groupList(station, names);
  const picture: Content = { svg: diagram.svg, width: diagram.width, height: diagram.height };
  // Beside the diagram when it fits its height: one name a line in a narrow cell, else a paragraph
  // (its lines estimated from the condensed face: a character is about 0.45 of the font size wide).
  const lineHeight = density.smallFont * density.lineHeight * 1.2;
  const listWidth = inner - diagram.width - 4;
  const room = Math.floor((diagram.height + 4) / lineHeight);
  const flowing = listWidth >= 80;
  const lines = flowing
    ? Math.ceil((group.join(' · ').length * density.smallFont * 0.45) / listWidth) + 1
    : group.length;
  const beside = listWidth >= 44 && lines <= room;
  const list: Content = flowing
    ? { text: group.join(' · '), style: 'small' }
    : { stack: group.map((line) => ({ text: line, style: 'small' })) };
  return {
    stack: [
      stationTitle(phase, station, index),
      beside
        ? {
            columnGap: 4,
            columns: [
              { width: diagram.width, ...picture },
              { width: listWidth, stack: [list] },
            ],
            margin: [0, 0, 0, 2],
          }
        : {
            stack: [
              { ...picture, margin: [0, 0, 0, 2] },
              { text: group.join(' · '), style: 'small' },
            ],
          },
      notesLine(station),
    ],
  };
}

/** The station's kind (where it differs from its phase's) and kit; the diagram gives the area. */
function stationFacts(phase: Phase, station: Station): string {
  const kind =
    station.activityKind !== phase.activityKind ? ACTIVITY_KIND_LABELS[station.activityKind] : null;
  const kit = KIT_KEYS.filter((k) => station.equipment[k] > 0).map((k) =>
    kitCount(k, station.equipment[k], true),
  );
  return [kind, kit.join(', ') || $localize`:a station that needs no kit:no kit`].filter(Boolean).join(' · ');
}

/** The headings of an activity's coaching on the card. */
const coachingWords = () => ({
  points: $localize`:heading on the card, what the coach looks for and says:Coaching points`,
  easier: $localize`:heading on the card, ways to make an activity easier:Easier`,
  harder: $localize`:heading on the card, ways to make an activity harder:Harder`,
});

function coachingStack(station: Station): Content {
  const words = coachingWords();
  return {
    margin: [0, 2, 0, 0],
    style: 'small',
    stack: [
      station.coachingPoints.length
        ? { text: [{ text: `${words.points}: `, style: 'label' }, station.coachingPoints.join('; ')] }
        : '',
      station.progressions.easier.length
        ? { text: [{ text: `${words.easier}: `, style: 'label' }, station.progressions.easier.join('; ')] }
        : '',
      station.progressions.harder.length
        ? { text: [{ text: `${words.harder}: `, style: 'label' }, station.progressions.harder.join('; ')] }
        : '',
    ],
  };
}

/** Coaching points and easier/harder steps once per phase when every station runs the same activity. */
function coachingColumns(station: Station): Content {
  const list = (title: string, items: string[]): Column => ({
    width: '*',
    stack: [{ text: title, style: 'label' }, items.length ? { ul: items, style: 'small' } : { text: '—' }],
  });
  const words = coachingWords();
  return {
    margin: [0, 3, 0, 0],
    columnGap: 10,
    columns: [
      list(words.points, station.coachingPoints),
      list(words.easier, station.progressions.easier),
      list(words.harder, station.progressions.harder),
    ],
  };
}

/** The same in one paragraph, for a card short of room. */
function coachingRunOn(station: Station): Content {
  const words = coachingWords();
  return {
    margin: [0, 2, 0, 0],
    style: 'small',
    text: [
      ...coachingPart(words.points, station.coachingPoints),
      ...coachingPart(words.easier, station.progressions.easier),
      ...coachingPart(words.harder, station.progressions.harder),
    ],
  };
}

function coachingPart(label: string, items: string[]): Content[] {
  return items.length ? [{ text: `${label}: `, style: 'label' }, `${items.join('; ')}. `] : [];
}

/**
 * What each activity of a phase is and its coaching, once per activity: one paragraph each,
 * headed by the activity's title when there are several, else a line per heading.
 */
function coachingParagraphs(phase: Phase, activities: Station[], titled: boolean, ctx: CardContext): Content {
  const part = coachingPart;
  const words = coachingWords();
  if (!titled && !shownBefore(activities[0], phase, ctx)) {
    const [station] = activities;
    const line = (label: string, items: string[]): Content =>
      items.length ? { text: part(label, items), margin: [0, 0, 0, 1] } : '';
    return {
      style: 'small',
      stack: [
        station.description ? { text: station.description, margin: [0, 0, 0, 2] } : '',
        line(words.points, station.coachingPoints),
        line(words.easier, station.progressions.easier),
        line(words.harder, station.progressions.harder),
      ],
    };
  }
  return {
    margin: [0, 3, 0, 0],
    stack: activities.map((station) => {
      const shownAt = shownBefore(station, phase, ctx);
      return {
        margin: [0, 0, 0, 2],
        style: 'small',
        text: shownAt
          ? [
              { text: `${station.title}: `, bold: true },
              $localize`:an activity explained earlier on the card, at these times:coaching as at ${shownAt}:times:.`,
            ]
          : [
              { text: `${station.title}: `, bold: true },
              station.description ? `${station.description} ` : '',
              ...part(words.points, station.coachingPoints),
              ...part(words.easier, station.progressions.easier),
              ...part(words.harder, station.progressions.harder),
            ],
      };
    }),
  };
}

/** The kit to pack, one tick box each, with what the bag holds (in red where it is short). */
function kitChecklist(plan: Plan): Content {
  const kinds = KIT_KEYS.filter((k) => plan.equipmentNeeded[k] > 0);
  const fontSize = 7;
  const widthOf = (text: string) => Math.ceil(text.length * fontSize * 0.5) + 4;
  const box: Column = {
    width: 9,
    svg: '<svg xmlns="http://www.w3.org/2000/svg" width="8" height="8"><rect x="0.5" y="0.8" width="6.5" height="6.5" fill="none" stroke="#3d6b47" stroke-width="0.7"/></svg>',
  };
  return {
    margin: [0, 0, 0, 4],
    fontSize,
    columnGap: 2,
    columns: [
      {
        width: 48,
        text: $localize`:heading on the card, kit to pack with a box to tick:Kit checklist`,
        style: 'label',
      },
      ...(kinds.length
        ? kinds.flatMap((k): Column[] => {
            const need = kitCount(k, plan.equipmentNeeded[k]);
            const has = ` ${$localize`:how many of this kit the club's bag holds:(bag has ${plan.equipmentAvailable[k]}:count:)`}`;
            const short = plan.equipmentAvailable[k] < plan.equipmentNeeded[k];
            return [
              box,
              {
                width: widthOf(need + has) + 6,
                text: [need, { text: has, color: short ? '#b8342a' : '#7a857e' }],
              },
            ];
          })
        : [
            {
              width: '*',
              text: $localize`:the card's kit checklist when a plan needs none:No kit needed.`,
            } as Column,
          ]),
    ],
  };
}

/** Cautions and warnings, two columns of them when there are several, then the standing safety note. */
function closingBlock(plan: Plan): Content {
  const notices = [...plan.cautions, ...plan.warnings].map((n) => ({
    text: [n.message, n.source ? { text: ` (${n.source})`, color: '#7a857e' } : ''],
  }));
  const half = Math.ceil(notices.length / 2);
  const list: Content =
    notices.length > 2
      ? {
          columnGap: 12,
          columns: [
            { width: '*', ul: notices.slice(0, half) },
            { width: '*', ul: notices.slice(half) },
          ],
        }
      : { ul: notices };
  return {
    unbreakable: true,
    margin: [0, 4, 0, 0],
    stack: [
      { text: $localize`:heading of the card's safety notes:Safety`, style: 'phase', margin: [0, 0, 0, 2] },
      ...(notices.length ? [list] : []),
      {
        text: [
          // The club rules' caution says it already (by its code, whatever language it is in).
          plan.cautions.some((c) => c.code === 'goals-anchored' || /anchor|weight/i.test(c.message))
            ? ''
            : goalSafetyNote() + ' ',
          standingSafetyNote(),
        ],
        margin: [0, 2, 0, 0],
        italics: true,
      },
    ],
  };
}

function cardLayout() {
  return {
    hLineWidth: () => 0,
    vLineWidth: () => 0,
    paddingLeft: (i: number) => (i === 0 ? 0 : 6),
    paddingRight: () => 0,
    paddingTop: () => 2,
    paddingBottom: () => 4,
  };
}

/**
 * The phase this one carries on from across a drinks break (same activity, groups and places),
 * so the card points back to it instead of printing it twice.
 */
function resumed(phase: Phase, before: Phase[]): Phase | null {
  const last = before.at(-1);
  const earlier = before.at(-2);
  if (!last || !earlier || !isBreak(last)) return null;
  const key = (p: Phase) =>
    JSON.stringify(p.stations.map((s) => [s.activityId, s.playerIds, s.position, s.area, s.positions]));
  return key(earlier) === key(phase) ? earlier : null;
}

function isBreak(phase: Phase): boolean {
  return phase.activityKind === 'break';
}

/** "10:05–10:11" when the station's activity was explained in an earlier phase of the card, else null. */
function shownBefore(station: Station, phase: Phase, ctx: CardContext): string | null {
  const first = ctx.firstShown.get(station.activityId);
  if (!first || first === phase) return null;
  return `${ctx.at(first.startMinute)}–${ctx.at(first.endMinute)}`;
}

/** The phase's activities in station order, one station standing for each. */
function distinctActivities(phase: Phase): Station[] {
  const seen = new Map<string, Station>();
  for (const station of phase.stations)
    if (!seen.has(station.activityId)) seen.set(station.activityId, station);
  return [...seen.values()];
}

function nameLookup(input: CardInput): (id: string) => string {
  const fromRequest = new Map(input.plan.request.players.map((p) => [p.id, p.name]));
  return (id) => input.playerNames?.[id] ?? fromRequest.get(id) ?? id;
}

function kindLabel(plan: Plan): string {
  return plan.request.kind === 'match-warm-up'
    ? $localize`:the kind of session on the card:Match warm-up`
    : $localize`:the kind of session on the card:Training session`;
}

/** "kick-off 18:00" for a match warm-up, "start 10:00" for training. */
function startInWords(plan: Plan, time: string): string {
  return plan.request.kind === 'match-warm-up'
    ? $localize`:when the match kicks off, on the card:kick-off ${time}:time:`
    : $localize`:when training starts, on the card:start ${time}:time:`;
}

/** "12 min". */
function minutesInWords(minutes: number): string {
  return $localize`:a length of time in minutes:${minutes}:minutes: min`;
}

/** The language of the card's words (the reader's), as a BCP 47 tag: the PDF says it for screen readers. */
function cardLanguage(): string {
  const code = currentLanguage();
  return LANGUAGES.find((language) => language.code === code)?.locale ?? code;
}
