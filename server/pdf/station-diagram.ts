import type { GoalPlacement, Point, Station } from '../../shared/types';
import { CARD_FONT } from './fonts';

/** Colours of the card's diagrams: grass, lines, kit and the three player roles. */
const INK = {
  grass: '#e9f2e3',
  line: '#3d6b47',
  cone: '#e8742a',
  goal: '#2b2b2b',
  attacker: '#21508f',
  defender: '#b8342a',
  goalkeeper: '#6b3d98',
  label: '#44524a',
};

export interface PlacedPlayer extends Point {
  /** 1-based number printed in the circle and in the group list. */
  number: number;
  playerId: string;
  role: 'attacker' | 'defender' | 'goalkeeper';
}

/** Where each role stands inside the area (station-local metres): defenders in the middle, the rest round the edge. */
export function placePlayers(station: Station): PlacedPlayer[] {
  const defenders = new Set(station.roles.defenders ?? []);
  const keepers = new Set(station.roles.goalkeeper ?? []);
  const { width, length } = station.area;
  const outer = station.playerIds.filter((id) => !defenders.has(id) && !keepers.has(id));
  const inner = station.playerIds.filter((id) => defenders.has(id));
  const placed = new Map<string, PlacedPlayer>();
  const numberOf = (id: string) => station.playerIds.indexOf(id) + 1;

  outer.forEach((id, i) => {
    const p = pointOnPerimeter(width, length, (i + 0.5) / Math.max(outer.length, 1));
    placed.set(id, { ...p, number: numberOf(id), playerId: id, role: 'attacker' });
  });
  inner.forEach((id, i) => {
    const angle = (2 * Math.PI * i) / Math.max(inner.length, 1);
    const r = inner.length > 1 ? Math.min(width, length) * 0.15 : 0;
    placed.set(id, {
      x: width / 2 + r * Math.cos(angle),
      y: length / 2 + r * Math.sin(angle),
      number: numberOf(id),
      playerId: id,
      role: 'defender',
    });
  });
  const goal = station.goalPositions?.find((g) => g.kind === 'goal');
  [...keepers].forEach((id, i) => {
    const at = goal
      ? { x: goal.x - station.position.x, y: goal.y - station.position.y }
      : { x: width / 2 + i * 1.5, y: 0.6 };
    placed.set(id, { ...at, number: numberOf(id), playerId: id, role: 'goalkeeper' });
  });
  return station.playerIds.map((id) => placed.get(id)).filter((p): p is PlacedPlayer => !!p);
}

/** A point at fraction t (0–1) of the way round a rectangle's edge, starting bottom-left, inset a little. */
function pointOnPerimeter(width: number, length: number, t: number): Point {
  const inset = Math.min(width, length) * 0.12;
  const w = width - 2 * inset;
  const l = length - 2 * inset;
  let d = t * 2 * (w + l);
  if (d < w) return { x: inset + d, y: inset + l };
  d -= w;
  if (d < l) return { x: inset + w, y: inset + l - d };
  d -= l;
  if (d < w) return { x: inset + w - d, y: inset };
  d -= w;
  return { x: inset, y: inset + d };
}

export interface DiagramSize {
  maxWidth: number;
  maxHeight: number;
}

/** The station drawn to scale as SVG in points: area, cones, goals or gates, numbered players, side lengths. */
export function stationDiagramSvg(
  station: Station,
  size: DiagramSize,
): { svg: string; width: number; height: number } {
  const origin = station.position;
  const local = (p: Point): Point => ({ x: p.x - origin.x, y: p.y - origin.y });
  const cones = station.conePositions.map(local);
  const goals = (station.goalPositions ?? []).map((g) => ({ ...g, ...local(g) }));
  const xs = [0, station.area.width, ...cones.map((c) => c.x), ...goals.map((g) => g.x)];
  const ys = [0, station.area.length, ...cones.map((c) => c.y), ...goals.map((g) => g.y)];
  const margin = 2;
  const minX = Math.min(...xs) - margin;
  const minY = Math.min(...ys) - margin;
  const spanX = Math.max(...xs) + margin - minX;
  const spanY = Math.max(...ys) + margin - minY;
  const scale = Math.min(size.maxWidth / spanX, size.maxHeight / spanY);
  const width = round(spanX * scale);
  const height = round(spanY * scale);
  const px = (p: Point) => ({ x: round((p.x - minX) * scale), y: round((p.y - minY) * scale) });
  const radius = Math.max(4, Math.min(7, scale * 0.7));

  const parts: string[] = [];
  const corner = px({ x: 0, y: 0 });
  parts.push(
    `<rect x="${corner.x}" y="${corner.y}" width="${round(station.area.width * scale)}" height="${round(
      station.area.length * scale,
    )}" fill="${INK.grass}" stroke="${INK.line}" stroke-width="0.8"/>`,
  );
  parts.push(
    text(corner.x + (station.area.width * scale) / 4, corner.y - 2, `${fmt(station.area.width)} m`, 5.5),
  );
  parts.push(
    text(
      corner.x - 2,
      corner.y + (station.area.length * scale) / 2,
      `${fmt(station.area.length)} m`,
      5.5,
      -90,
    ),
  );
  for (const goal of goals) parts.push(goalSvg(goal, px(goal), scale));
  for (const cone of cones) parts.push(coneSvg(px(cone)));
  for (const player of placePlayers(station)) {
    const at = px(player);
    parts.push(
      `<circle cx="${at.x}" cy="${at.y}" r="${round(radius)}" fill="${INK[player.role]}" stroke="#ffffff" stroke-width="0.6"/>`,
    );
    parts.push(
      `<text x="${at.x}" y="${round(at.y + radius * 0.38)}" font-family="${CARD_FONT}" font-weight="bold" font-size="${round(
        radius * 1.15,
      )}" fill="#ffffff" text-anchor="middle">${player.number}</text>`,
    );
  }
  return {
    svg: `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}">${parts.join('')}</svg>`,
    width,
    height,
  };
}

function coneSvg(at: Point): string {
  const s = 2.6;
  return `<polygon points="${at.x},${round(at.y - s)} ${round(at.x + s)},${round(at.y + s * 0.8)} ${round(
    at.x - s,
  )},${round(at.y + s * 0.8)}" fill="${INK.cone}"/>`;
}

/** A small goal as a frame open towards `facing`; a gate as two cones with a dashed line between. */
function goalSvg(goal: GoalPlacement, at: Point, scale: number): string {
  const half = Math.max(4, scale * (goal.kind === 'goal' ? 1 : 0.75));
  const depth = Math.max(2.5, scale * 0.6);
  // facing 0 = mouth along +y (down the page); rotate the drawing about the goal's centre.
  const rotate = `rotate(${round(-goal.facing)} ${at.x} ${at.y})`;
  if (goal.kind === 'gate') {
    return `<g transform="${rotate}"><line x1="${round(at.x - half)}" y1="${at.y}" x2="${round(at.x + half)}" y2="${
      at.y
    }" stroke="${INK.cone}" stroke-width="0.7" stroke-dasharray="1.5,1.5"/>${coneSvg({
      x: round(at.x - half),
      y: at.y,
    })}${coneSvg({ x: round(at.x + half), y: at.y })}</g>`;
  }
  return `<g transform="${rotate}"><path d="M ${round(at.x - half)} ${at.y} L ${round(at.x - half)} ${round(
    at.y - depth,
  )} L ${round(at.x + half)} ${round(at.y - depth)} L ${round(at.x + half)} ${at.y}" fill="none" stroke="${
    INK.goal
  }" stroke-width="1.4"/></g>`;
}

function text(x: number, y: number, content: string, size: number, rotate = 0, anchor = 'middle'): string {
  const transform = rotate ? ` transform="rotate(${rotate} ${round(x)} ${round(y)})"` : '';
  return `<text x="${round(x)}" y="${round(y)}" font-family="${CARD_FONT}" font-size="${size}" fill="${
    INK.label
  }" text-anchor="${anchor}"${transform}>${escapeXml(content)}</text>`;
}

function escapeXml(value: string): string {
  return value.replace(/[<>&"']/g, (c) => `&#${c.charCodeAt(0)};`);
}

function fmt(metres: number): string {
  return Number.isInteger(metres) ? String(metres) : metres.toFixed(1);
}

function round(n: number): number {
  return Math.round(n * 100) / 100;
}
