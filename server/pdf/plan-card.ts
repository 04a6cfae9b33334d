import type { Column, Content, TDocumentDefinitions, TableCell } from 'pdfmake/interfaces';
import type { Equipment, Phase, Plan, Station } from '../../shared/types';
import { minuteLabel, planMinutes, sessionStart } from './clock';
import { CARD_FONT } from './fonts';
import { printable, printableContent } from './printable';
import { placePlayers, stationDiagramSvg } from './station-diagram';

export type Paper = 'a4' | 'letter';
export const PAPERS: readonly Paper[] = ['a4', 'letter'];

/** What the card needs besides the plan itself. */
export interface CardInput {
  plan: Plan;
  teamName: string;
  /** ISO date (YYYY-MM-DD) of the session, if set. */
  date?: string | null;
  /** "HH:MM": kick-off for a match warm-up, start time for training. */
  kickOff?: string | null;
  /** Display names by player id; falls back to names in the request, then the id. */
  playerNames?: Record<string, string>;
}

/** Printed on every card, whatever the plan says (US CPSC movable-goal guidance; common practice otherwise). */
export const GOAL_SAFETY_NOTE =
  'Anchor or weight every movable goal and never let anyone climb or hang on one (US Consumer Product Safety ' +
  'Commission, movable soccer goal safety).';
export const STANDING_SAFETY_NOTE =
  'Check the surface before you start, keep water to hand and give breaks in the heat. Follow your local ' +
  'rules, the club safeguarding policy and qualified first-aid advice.';

/** Sizes that shrink when a card would run onto a second page. */
export interface CardDensity {
  baseFont: number;
  smallFont: number;
  gridDiagramHeight: number;
  soloDiagramHeight: number;
}

export const REGULAR: CardDensity = {
  baseFont: 7.5,
  smallFont: 6.8,
  gridDiagramHeight: 64,
  soloDiagramHeight: 88,
};
export const COMPACT: CardDensity = {
  baseFont: 6.8,
  smallFont: 6.2,
  gridDiagramHeight: 50,
  soloDiagramHeight: 66,
};

const KIT_LABELS: Record<keyof Equipment, [one: string, many: string]> = {
  balls: ['ball', 'balls'],
  cones: ['disc cone', 'disc cones'],
  bibs: ['bib', 'bibs'],
  goals: ['small goal', 'small goals'],
};

const KIT_KEYS = Object.keys(KIT_LABELS) as (keyof Equipment)[];

function kitCount(kind: keyof Equipment, count: number): string {
  return `${count} ${KIT_LABELS[kind][count === 1 ? 0 : 1]}`;
}

const PAGE_WIDTH: Record<Paper, number> = { a4: 595.28, letter: 612 };
const MARGIN = 22;
const STATIONS_PER_ROW = 5;
const TINT = ['#f3f7f1', '#e4efdf', '#d5e7cc', '#f4e4c8', '#f1d2bd'];

/** The pdfmake document for one plan's card: header, timeline, a block per phase, kit and cautions. */
export function planCardDefinition(
  input: CardInput,
  paper: Paper = 'a4',
  density: CardDensity = REGULAR,
  onPageCount?: (pages: number) => void,
): TDocumentDefinitions {
  const { plan } = input;
  const contentWidth = PAGE_WIDTH[paper] - 2 * MARGIN;
  const start = sessionStart(plan, input.kickOff);
  const names = nameLookup(input);

  return {
    pageSize: paper === 'a4' ? 'A4' : 'LETTER',
    pageMargins: [MARGIN, MARGIN, MARGIN, MARGIN + 6],
    info: { title: printable(`${input.teamName} — ${kindLabel(plan)}`), creator: 'Conewise' },
    defaultStyle: { font: CARD_FONT, fontSize: density.baseFont, lineHeight: 1.1, color: '#1d2620' },
    styles: {
      title: { fontSize: 15, bold: true },
      subtitle: { fontSize: 8.5, color: '#44524a' },
      phase: { fontSize: 9.5, bold: true, color: '#1f3d28' },
      station: { fontSize: 8, bold: true },
      label: { bold: true, color: '#3d6b47' },
      small: { fontSize: density.smallFont },
    },
    footer: (page: number, pages: number) => {
      onPageCount?.(pages);
      return {
        text: `Conewise card · rules ${plan.ruleSet.id} v${plan.ruleSet.version} · seed ${plan.seed} · page ${page} of ${pages}`,
        fontSize: 6,
        color: '#7a857e',
        margin: [MARGIN, 8, MARGIN, 0],
      };
    },
    content: printableContent([
      header(input, start),
      timeline(plan, start, contentWidth),
      ...plan.phases.map((phase) => phaseBlock(phase, start, names, contentWidth, density)),
      closingBlock(plan),
    ]),
  };
}

function header(input: CardInput, start: number | null): Content {
  const { plan } = input;
  const request = plan.request;
  const when = [
    input.date ? formatDate(input.date) : null,
    input.kickOff ? `${plan.request.kind === 'match-warm-up' ? 'kick-off' : 'start'} ${input.kickOff}` : null,
    `${planMinutes(plan)} min`,
  ].filter(Boolean);
  const facts = [
    request.ageGroup,
    request.level,
    `${request.players.length} players`,
    `${request.coaches} ${request.coaches === 1 ? 'coach' : 'coaches'}`,
    `space ${request.space.width} × ${request.space.length} m`,
    start !== null ? `arrive by ${minuteLabel(start, -10)}` : null,
  ].filter(Boolean);
  return {
    margin: [0, 0, 0, 6],
    columns: [
      {
        width: '*',
        stack: [
          { text: input.teamName, style: 'title' },
          { text: kindLabel(plan), style: 'subtitle' },
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
function timeline(plan: Plan, start: number | null, width: number): Content {
  const total = Math.max(planMinutes(plan), 1);
  const endCell = plan.request.kind === 'match-warm-up' ? 46 : 0;
  const usable = width - endCell - plan.phases.length * 4;
  const cells: TableCell[] = plan.phases.map((phase) => ({
    fillColor: TINT[Math.min(Math.max((phase.intensity ?? 2) - 1, 0), 4)],
    stack: [
      { text: `${minuteLabel(start, phase.startMinute)}–${minuteLabel(start, phase.endMinute)}`, bold: true },
      { text: phase.name, style: 'small' },
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
        { text: minuteLabel(start, total), bold: true },
        { text: 'Kick-off', style: 'small' },
      ],
    });
    fitted.push(endCell - 4);
  }
  return {
    margin: [0, 0, 0, 6],
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

function phaseBlock(
  phase: Phase,
  start: number | null,
  names: (id: string) => string,
  width: number,
  density: CardDensity,
): Content {
  const shared = sharesOneActivity(phase);
  const perRow = Math.min(STATIONS_PER_ROW, Math.max(phase.stations.length, 1));
  const cellWidth = (width - (perRow - 1) * 6) / perRow;
  const rows: TableCell[][] = [];
  for (let i = 0; i < phase.stations.length; i += perRow) {
    const row: TableCell[] = phase.stations
      .slice(i, i + perRow)
      .map((station, j) => stationCell(station, i + j + 1, names, cellWidth, !shared, density));
    while (row.length < perRow) row.push({ text: '' });
    rows.push(row);
  }
  const first = phase.stations[0];
  if (phase.stations.length === 1) {
    return {
      unbreakable: true,
      margin: [0, 2, 0, 6],
      stack: [phaseHeading(phase, start), soloStation(first, names, width, density)],
    };
  }
  return {
    unbreakable: true,
    margin: [0, 2, 0, 6],
    stack: [
      phaseHeading(phase, start),
      shared && first?.description ? { text: first.description, margin: [0, 0, 0, 3] } : { text: '' },
      rows.length
        ? {
            table: { widths: Array(perRow).fill(cellWidth - 6), body: rows, dontBreakRows: true },
            layout: cardLayout(),
          }
        : { text: 'No stations in this phase.', italics: true },
      shared && first ? coachingColumns(first) : { text: '' },
    ],
  };
}

function phaseHeading(phase: Phase, start: number | null): Content {
  const minutes = phase.endMinute - phase.startMinute;
  return {
    text: [
      `${minuteLabel(start, phase.startMinute)}–${minuteLabel(start, phase.endMinute)}  `,
      { text: phase.name },
      {
        text: `  · ${minutes} min${phase.intensity ? ` · intensity ${phase.intensity}/5` : ''}`,
        bold: false,
      },
    ],
    style: 'phase',
    margin: [0, 0, 0, 2],
  };
}

/** A phase with one station: the diagram on the left, group and coaching beside it. */
function soloStation(
  station: Station,
  names: (id: string) => string,
  width: number,
  density: CardDensity,
): Content {
  const diagram = stationDiagramSvg(station, { maxWidth: 160, maxHeight: density.soloDiagramHeight });
  return {
    columnGap: 10,
    columns: [
      { width: diagram.width, svg: diagram.svg, height: diagram.height },
      {
        width: width - diagram.width - 10,
        stack: [
          { text: `1. ${station.title}`, style: 'station' },
          { text: stationFacts(station), style: 'small', color: '#44524a', margin: [0, 0, 0, 2] },
          station.description ? { text: station.description, margin: [0, 0, 0, 2] } : '',
          { text: groupList(station, names).join(' · '), style: 'small' },
          coachingStack(station),
        ],
      },
    ],
  };
}

function groupList(station: Station, names: (id: string) => string): string[] {
  const placed = new Map(placePlayers(station).map((p) => [p.playerId, p]));
  const group = station.playerIds.map((id) => {
    const p = placed.get(id);
    const role = p?.role === 'defender' ? ' (def)' : p?.role === 'goalkeeper' ? ' (GK)' : '';
    return `${p?.number ?? '?'} ${names(id)}${role}`;
  });
  if (station.coachJoins) group.push('+ a coach joins');
  return group;
}

function stationCell(
  station: Station,
  index: number,
  names: (id: string) => string,
  width: number,
  withCoaching: boolean,
  density: CardDensity,
): TableCell {
  const diagram = stationDiagramSvg(station, {
    maxWidth: Math.min(width - 8, 150),
    maxHeight: density.gridDiagramHeight,
  });
  const group = groupList(station, names);
  return {
    stack: [
      { text: `${index}. ${station.title}`, style: 'station' },
      { text: stationFacts(station), style: 'small', color: '#44524a', margin: [0, 0, 0, 2] },
      { svg: diagram.svg, width: diagram.width, height: diagram.height, margin: [0, 0, 0, 2] },
      { text: group.join(' · '), style: 'small' },
      ...(withCoaching ? [coachingStack(station)] : []),
    ],
  };
}

function stationFacts(station: Station): string {
  const attackers = station.roles.attackers?.length;
  const defenders = station.roles.defenders?.length;
  const shape = attackers && defenders ? `${attackers}v${defenders} · ` : '';
  const kit = KIT_KEYS.filter((k) => station.equipment[k] > 0).map((k) => kitCount(k, station.equipment[k]));
  return `${shape}${station.area.width} × ${station.area.length} m${kit.length ? ' · ' + kit.join(', ') : ''}`;
}

function coachingStack(station: Station): Content {
  return {
    margin: [0, 2, 0, 0],
    style: 'small',
    stack: [
      station.coachingPoints.length
        ? { text: [{ text: 'Look for: ', style: 'label' }, station.coachingPoints.join('; ')] }
        : '',
      station.progressions.easier.length
        ? { text: [{ text: 'Easier: ', style: 'label' }, station.progressions.easier.join('; ')] }
        : '',
      station.progressions.harder.length
        ? { text: [{ text: 'Harder: ', style: 'label' }, station.progressions.harder.join('; ')] }
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
  return {
    margin: [0, 3, 0, 0],
    columnGap: 10,
    columns: [
      list('Look for', station.coachingPoints),
      list('Easier', station.progressions.easier),
      list('Harder', station.progressions.harder),
    ],
  };
}

function closingBlock(plan: Plan): Content {
  const kitRows: TableCell[][] = KIT_KEYS.filter((k) => plan.equipmentNeeded[k] > 0).map((k) => [
    { canvas: [{ type: 'rect', x: 0, y: 1, w: 7, h: 7, lineWidth: 0.7, lineColor: '#3d6b47' }] },
    { text: kitCount(k, plan.equipmentNeeded[k]) },
    {
      text: `bag has ${plan.equipmentAvailable[k]}`,
      color: plan.equipmentAvailable[k] < plan.equipmentNeeded[k] ? '#b8342a' : '#7a857e',
    },
  ]);
  const notices = [...plan.cautions, ...plan.warnings].map((n) => ({
    text: [n.message, n.source ? { text: ` (${n.source})`, color: '#7a857e' } : ''],
  }));
  return {
    unbreakable: true,
    margin: [0, 4, 0, 0],
    columnGap: 14,
    columns: [
      {
        width: 150,
        stack: [
          { text: 'Kit checklist', style: 'phase', margin: [0, 0, 0, 2] },
          kitRows.length
            ? { table: { widths: [8, 'auto', '*'], body: kitRows }, layout: 'noBorders' }
            : { text: 'No kit needed.' },
        ],
      },
      {
        width: '*',
        stack: [
          { text: 'Cautions', style: 'phase', margin: [0, 0, 0, 2] },
          ...(notices.length ? [{ ul: notices }] : []),
          {
            text: [
              plan.cautions.some((c) => /anchor|weight/i.test(c.message)) ? '' : GOAL_SAFETY_NOTE + ' ',
              STANDING_SAFETY_NOTE,
            ],
            margin: [0, 2, 0, 0],
            italics: true,
          },
        ],
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

function sharesOneActivity(phase: Phase): boolean {
  return (
    phase.stations.length > 1 && phase.stations.every((s) => s.activityId === phase.stations[0].activityId)
  );
}

function nameLookup(input: CardInput): (id: string) => string {
  const fromRequest = new Map(input.plan.request.players.map((p) => [p.id, p.name]));
  return (id) => input.playerNames?.[id] ?? fromRequest.get(id) ?? id;
}

function kindLabel(plan: Plan): string {
  return plan.request.kind === 'match-warm-up' ? 'Match warm-up' : 'Training session';
}

function formatDate(iso: string): string {
  const date = new Date(`${iso}T12:00:00Z`);
  if (Number.isNaN(date.getTime())) return iso;
  return date.toLocaleDateString('en-GB', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  });
}
