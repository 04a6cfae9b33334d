import '../../shared/i18n/localize';
import type {
  GoalPlacement,
  MarkedLine,
  Point,
  PositionRole,
  StartPosition,
  Station,
  Zone,
} from '../../shared/types';
import { MARKER_STYLE, POSITION_STYLE } from '../../shared/types/activity-words';
import { CARD_FONT } from './fonts';
import { formatDistance, type DistanceUnit } from '../../shared/units';
import { printable } from './printable';

/** The card's own inks for what the shared styles leave to each medium: grass, edges, labels. */
const INK = {
  grass: '#e3efdc',
  edge: '#3d6b47',
  label: '#44524a',
};

/** What a card's legend can list: the start-position roles and the kit markers. */
export type LegendKey = PositionRole | 'cone' | 'goal' | 'gate';

/** The letter in a coach's circle ("C"); the group list's line for a coach who joins says it too. */
export function coachMark(): string {
  return $localize`:the letter in a coach's circle on the card's diagrams, short for coach:C`;
}

/** The text in a start position's circle: the player's number in the group list, "C" for a coach. */
export function positionLabel(station: Station, position: StartPosition): string {
  if (position.role === 'coach') return coachMark();
  const index = station.playerIds.indexOf(position.id);
  return index >= 0 ? String(index + 1) : '';
}

/** The roles and markers a station's diagram draws, for the card's legend. */
export function diagramMarks(station: Station): Set<LegendKey> {
  const marks = new Set<LegendKey>(station.positions.map((p) => p.role));
  if (station.conePositions.length) marks.add('cone');
  for (const goal of station.goalPositions ?? []) marks.add(goal.kind);
  return marks;
}

export interface DiagramSize {
  maxWidth: number;
  maxHeight: number;
  /** The unit of the side labels (the drawing stays in metres); metres when absent. */
  distance?: DistanceUnit;
}

/**
 * The station drawn to scale as SVG in points, from the engine's layout only: its area, marked
 * zones and lines, goals and gates, cones, and everyone's start position numbered as in the
 * group list. A plan stored before start positions existed draws without players.
 */
export function stationDiagramSvg(
  station: Station,
  size: DiagramSize,
): { svg: string; width: number; height: number } {
  const origin = station.position;
  const local = (p: Point): Point => ({ x: p.x - origin.x, y: p.y - origin.y });
  const cones = station.conePositions.map(local);
  const goals = (station.goalPositions ?? []).map((g) => ({ ...g, ...local(g) }));
  const zones = (station.zones ?? []).map((z) => ({ ...z, ...local(z) }));
  const lines = (station.lines ?? []).map((l) => ({ ...l, from: local(l.from), to: local(l.to) }));
  const people = station.positions.map((p) => ({ ...p, ...local(p) }));
  const points: Point[] = [
    { x: 0, y: 0 },
    { x: station.area.width, y: station.area.length },
    ...cones,
    ...goals,
    ...people,
    ...zones.flatMap((z) => [z, { x: z.x + z.width, y: z.y + z.length }]),
    ...lines.flatMap((l) => [l.from, l.to]),
  ];
  const margin = 2;
  // A band above and left of the drawing for the side lengths, clear of cones on the edge.
  const band = 6;
  const minX = Math.min(...points.map((p) => p.x)) - margin;
  const minY = Math.min(...points.map((p) => p.y)) - margin;
  const spanX = Math.max(...points.map((p) => p.x)) + margin - minX;
  const spanY = Math.max(...points.map((p) => p.y)) + margin - minY;
  const scale = Math.min((size.maxWidth - band) / spanX, (size.maxHeight - band) / spanY);
  const width = round(spanX * scale + band);
  const height = round(spanY * scale + band);
  const px = (p: Point) => ({ x: round((p.x - minX) * scale + band), y: round((p.y - minY) * scale + band) });
  const radius = Math.max(3.2, Math.min(6, scale * 0.75));

  const parts: string[] = [];
  const corner = px({ x: 0, y: 0 });
  const areaWidth = station.area.width * scale;
  const areaLength = station.area.length * scale;
  parts.push(
    `<rect x="${corner.x}" y="${corner.y}" width="${round(areaWidth)}" height="${round(areaLength)}" fill="${
      INK.grass
    }" stroke="${INK.edge}" stroke-width="0.8"/>`,
  );
  const unit = size.distance ?? 'metres';
  parts.push(text(corner.x + areaWidth / 2, 4.6, sideLabel(unit, station.area.width), 5));
  parts.push(text(4.4, corner.y + areaLength / 2, sideLabel(unit, station.area.length), 5, -90));
  for (const zone of zones) parts.push(zoneSvg(zone, px(zone), scale));
  for (const line of lines) parts.push(lineSvg(line, px(line.from), px(line.to)));
  for (const goal of goals) parts.push(goalSvg(goal, px(goal), scale));
  for (const cone of cones) parts.push(coneSvg(px(cone)));
  for (const person of people)
    parts.push(personSvg(person, positionLabel(station, person), px(person), radius));
  return {
    svg: `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}">${parts.join('')}</svg>`,
    width,
    height,
  };
}

/** One legend symbol, as the diagrams draw it, in a box of `size` points. */
export function legendSymbolSvg(key: LegendKey, size = 8): string {
  const c = size / 2;
  let body: string;
  if (key === 'cone') body = coneSvg({ x: c, y: c + 0.4 });
  else if (key === 'goal' || key === 'gate')
    body = goalSvg({ x: c, y: c + 1.5, facing: 0, kind: key }, { x: c, y: c + 1.5 }, 2.4);
  else body = personSvg({ id: '', role: key, x: c, y: c }, '', { x: c, y: c }, c - 0.6);
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${size}" height="${size}">${body}</svg>`;
}

function personSvg(position: StartPosition, label: string, at: Point, radius: number): string {
  const style = POSITION_STYLE[position.role];
  // A white circle (the coach) needs a dark rim to show on grass and paper.
  const rim = position.role === 'coach' ? style.text : '#ffffff';
  const circle = `<circle cx="${at.x}" cy="${at.y}" r="${round(radius)}" fill="${style.fill}" stroke="${rim}" stroke-width="0.6"/>`;
  if (!label) return circle;
  const fontSize = round(radius * (label.length > 1 ? 1.05 : 1.2));
  return `${circle}<text x="${at.x}" y="${round(at.y + fontSize * 0.35)}" font-family="${CARD_FONT}" font-weight="bold" font-size="${fontSize}" fill="${
    style.text
  }" text-anchor="middle">${escapeXml(label)}</text>`;
}

function zoneSvg(zone: Zone, at: Point, scale: number): string {
  const w = round(zone.width * scale);
  const h = round(zone.length * scale);
  const rect = `<rect x="${at.x}" y="${at.y}" width="${w}" height="${h}" fill="${MARKER_STYLE.zone}" stroke="${
    INK.edge
  }" stroke-width="0.4" stroke-dasharray="1.5,1"/>`;
  const fontSize = Math.min(4.5, Math.max(3, h * 0.6));
  return `${rect}${text(at.x + w / 2, at.y + h / 2 + fontSize * 0.35, zone.label, fontSize)}`;
}

/** A painted line: white as on grass, with a thin dark edge so it shows on a pale card. */
function lineSvg(line: MarkedLine, from: Point, to: Point): string {
  const d = `x1="${from.x}" y1="${from.y}" x2="${to.x}" y2="${to.y}"`;
  return `<line ${d} stroke="${INK.edge}" stroke-width="1.6"/><line ${d} stroke="${MARKER_STYLE.line}" stroke-width="0.8"/>`;
}

function coneSvg(at: Point): string {
  const s = 2.4;
  return `<polygon points="${at.x},${round(at.y - s)} ${round(at.x + s)},${round(at.y + s * 0.8)} ${round(
    at.x - s,
  )},${round(at.y + s * 0.8)}" fill="${MARKER_STYLE.cone}"/>`;
}

/** A small goal as a frame open towards `facing`; a gate as two cones with a dashed line between. */
function goalSvg(goal: GoalPlacement, at: Point, scale: number): string {
  const half = Math.max(3, scale * (goal.kind === 'goal' ? 1 : 0.75));
  const depth = Math.max(2, scale * 0.6);
  // facing 0 = mouth along +y (down the page); rotate the drawing about the goal's centre.
  const rotate = `rotate(${round(-goal.facing)} ${at.x} ${at.y})`;
  if (goal.kind === 'gate') {
    return `<g transform="${rotate}"><line x1="${round(at.x - half)}" y1="${at.y}" x2="${round(at.x + half)}" y2="${
      at.y
    }" stroke="${MARKER_STYLE.gate}" stroke-width="0.7" stroke-dasharray="1.5,1.5"/>${coneSvg({
      x: round(at.x - half),
      y: at.y,
    })}${coneSvg({ x: round(at.x + half), y: at.y })}</g>`;
  }
  return `<g transform="${rotate}"><path d="M ${round(at.x - half)} ${at.y} L ${round(at.x - half)} ${round(
    at.y - depth,
  )} L ${round(at.x + half)} ${round(at.y - depth)} L ${round(at.x + half)} ${at.y}" fill="none" stroke="${
    MARKER_STYLE.goal
  }" stroke-width="1.4"/></g>`;
}

function text(x: number, y: number, content: string, size: number, rotate = 0, anchor = 'middle'): string {
  const transform = rotate ? ` transform="rotate(${rotate} ${round(x)} ${round(y)})"` : '';
  return `<text x="${round(x)}" y="${round(y)}" font-family="${CARD_FONT}" font-size="${round(size)}" fill="${
    INK.label
  }" text-anchor="${anchor}"${transform}>${escapeXml(printable(content))}</text>`;
}

function escapeXml(value: string): string {
  return value.replace(/[<>&"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

/** A side's length as the card prints it: metres as planned (a tenth where needed), yards whole. */
function sideLabel(unit: DistanceUnit, metres: number): string {
  if (unit !== 'metres') return formatDistance(unit, metres);
  return `${Number.isInteger(metres) ? String(metres) : metres.toFixed(1)} m`;
}

function round(n: number): number {
  return Math.round(n * 100) / 100;
}
