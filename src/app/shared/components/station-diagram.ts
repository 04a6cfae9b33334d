import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import {
  ACTIVITY_KIND_LABELS,
  MARKER_STYLE,
  POSITION_ROLES,
  POSITION_STYLE,
  type GoalPlacement,
  type MarkedLine,
  type Point,
  type PositionRole,
  type Station,
  type Zone,
} from '../../../../shared/types';
import { formatSize } from '../../../../shared/units';
import { UnitChoice } from '../../core/units/unit-choice';

/** One start position as drawn: where, its colours and the number in its circle. */
interface Dot extends Point {
  id: string;
  role: PositionRole;
  fill: string;
  text: string;
  /** The player's number in the group (1-based), or "C" for a joining coach. */
  mark: string;
}

/** A goal or a gate, with the ends of its mouth already worked out. */
interface Target extends GoalPlacement {
  from: Point;
  to: Point;
  /** Whether the two end cones come from the engine's cone list (else they are drawn here). */
  conesListed: boolean;
}

/** One legend row: a role's colour or a marker's swatch, and its words. */
interface LegendItem {
  key: string;
  label: string;
  swatch: 'dot' | 'cone' | 'goal' | 'gate' | 'zone' | 'line';
  fill?: string;
  text?: string;
}

/** Gate cones are found within this distance of a gate's centre, in metres. */
const GATE_REACH = 2.6;

/**
 * A station drawn to scale from the engine's own coordinates (metres): the area, zones, lines,
 * cones, goals and gates, and everyone where the plan starts them, coloured by role with the
 * colours the printed card uses. Nothing is placed here that the plan did not place.
 */
@Component({
  selector: 'cw-station-diagram',
  templateUrl: './station-diagram.html',
  styleUrl: './station-diagram.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StationDiagram {
  /** The station to draw. */
  readonly station = input.required<Station>();
  /** Whether to show a key below the drawing, listing only the roles and markers drawn. */
  readonly legend = input(false);
  /** Player names by id, read out in the drawing's accessible label. */
  readonly names = input<ReadonlyMap<string, string> | Record<string, string> | null>(null);

  protected readonly marker = MARKER_STYLE;
  /** The reader's units, for the size read out in the label (the drawing itself has no numbers). */
  private readonly units = inject(UnitChoice);

  /** Marks are sized to the area so a 60 m pitch and a 9 m square both read clearly on a phone. */
  protected readonly scale = computed(() => {
    const { width, length } = this.station().area;
    return Math.max(0.45, Math.min(2.6, Math.max(width, length) / 24));
  });

  protected readonly radius = computed(() => this.scale() * 0.95);

  protected readonly zones = computed<Zone[]>(() => this.station().zones ?? []);
  protected readonly lines = computed<MarkedLine[]>(() => this.station().lines ?? []);

  /** Goals and gates; a gate's mouth runs between its two cones when the plan listed them. */
  protected readonly targets = computed<Target[]>(() => {
    const { conePositions: cones, area } = this.station();
    // A drawn mouth (a goal, or a gate whose cones are not listed) in proportion to the area.
    const half = Math.max(2, Math.min(5, Math.min(area.width, area.length) / 6)) / 2;
    return (this.station().goalPositions ?? []).map((goal) => {
      const ends = goal.kind === 'gate' ? gateCones(goal, cones) : null;
      if (ends) return { ...goal, from: ends[0], to: ends[1], conesListed: true };
      // facing 0 = mouth along +y; the mouth runs across it.
      const rad = (goal.facing * Math.PI) / 180;
      const ux = Math.cos(rad);
      const uy = -Math.sin(rad);
      return {
        ...goal,
        from: { x: goal.x - ux * half, y: goal.y - uy * half },
        to: { x: goal.x + ux * half, y: goal.y + uy * half },
        conesListed: false,
      };
    });
  });

  /** Cones that do not stand at the end of a gate (those are counted with their gate). */
  private readonly looseCones = computed(() => {
    const gateEnds = this.targets()
      .filter((t) => t.conesListed)
      .flatMap((t) => [t.from, t.to]);
    return this.station().conePositions.filter((c) => !gateEnds.some((e) => e.x === c.x && e.y === c.y));
  });

  protected readonly dots = computed<Dot[]>(() => {
    const { positions, playerIds } = this.station();
    return positions.map((p) => {
      const style = POSITION_STYLE[p.role] ?? POSITION_STYLE.player;
      const index = playerIds.indexOf(p.id);
      return {
        id: p.id,
        x: p.x,
        y: p.y,
        role: p.role,
        fill: style.fill,
        text: style.text,
        mark: p.id === 'coach' ? COACH_MARK : index >= 0 ? String(index + 1) : '',
      };
    });
  });

  /** Everything drawn fits, with a margin: keepers on the goal line and gates on the edge included. */
  protected readonly viewBox = computed(() => {
    const { position, area } = this.station();
    const xs = [position.x, position.x + area.width];
    const ys = [position.y, position.y + area.length];
    for (const p of [
      ...this.station().conePositions,
      ...this.dots(),
      ...this.targets().flatMap((t) => [t.from, t.to]),
    ]) {
      xs.push(p.x);
      ys.push(p.y);
    }
    const m = 1 + this.scale() * 1.2;
    const minX = Math.min(...xs) - m;
    const minY = Math.min(...ys) - m;
    const w = Math.max(...xs) + m - minX;
    const h = Math.max(...ys) + m - minY;
    return `${round(minX)} ${round(minY)} ${round(w)} ${round(h)}`;
  });

  protected readonly legendItems = computed<LegendItem[]>(() => {
    const items: LegendItem[] = [];
    const used = new Set(this.dots().map((d) => d.role));
    for (const role of POSITION_ROLES) {
      if (!used.has(role)) continue;
      const style = POSITION_STYLE[role];
      items.push({ key: role, label: style.label, swatch: 'dot', fill: style.fill, text: style.text });
    }
    if (this.station().conePositions.length)
      items.push({ key: 'cone', label: $localize`:Key to a drawing:Cone`, swatch: 'cone' });
    const targets = this.targets();
    if (targets.some((t) => t.kind === 'goal'))
      items.push({ key: 'goal', label: $localize`:Key to a drawing:Goal`, swatch: 'goal' });
    if (targets.some((t) => t.kind === 'gate'))
      items.push({ key: 'gate', label: $localize`:Key to a drawing:Gate`, swatch: 'gate' });
    for (const label of new Set(this.zones().map((z) => zoneWords(z.label)))) {
      items.push({ key: 'zone-' + label, label, swatch: 'zone' });
    }
    for (const label of new Set(this.lines().map((l) => lineWords(l.label)))) {
      items.push({ key: 'line-' + label, label, swatch: 'line' });
    }
    return items;
  });

  /**
   * What is drawn, in words, the size in the reader's units: "Keep-ball, 4v1 in 12 × 12 m: 4
   * attackers, 1 defender (bib), 4 cones, 2 gates" ("13 × 13 yd" for yards).
   */
  protected readonly label = computed(() => {
    const s = this.station();
    const size = formatSize(this.units.distance(), s.area);
    const activity = ACTIVITY_KIND_LABELS[s.activityKind] ?? s.title;
    const head = s.format
      ? $localize`:A drawn station, e.g. Keep-ball, 4v1 in 12 × 12 m:${activity}:activity:, ${s.format}:format: in ${size}:size:`
      : $localize`:A drawn station, e.g. Keep-ball in 12 × 12 m:${activity}:activity: in ${size}:size:`;
    const names = this.names();
    const nameOf = (id: string): string | undefined =>
      names instanceof Map ? names.get(id) : names ? (names as Record<string, string>)[id] : undefined;
    const parts: string[] = [];
    for (const role of POSITION_ROLES) {
      const dots = this.dots().filter((d) => d.role === role);
      if (!dots.length) continue;
      const who = names
        ? ` (${dots.map((d) => (d.id === 'coach' ? COACH_MARK : `${d.mark} ${nameOf(d.id) ?? d.id}`)).join(', ')})`
        : '';
      parts.push(`${ROLE_COUNT[role](dots.length)}${who}`);
    }
    const cones = this.looseCones().length;
    if (cones) parts.push(cones === 1 ? $localize`1 cone` : $localize`${cones}:count: cones`);
    const targets = this.targets();
    const goals = targets.filter((t) => t.kind === 'goal').length;
    const gates = targets.length - goals;
    if (goals) parts.push(goals === 1 ? $localize`1 goal` : $localize`${goals}:count: goals`);
    if (gates) parts.push(gates === 1 ? $localize`1 gate` : $localize`${gates}:count: gates`);
    for (const [label, n] of tally(this.zones().map((z) => zoneWords(z.label).toLowerCase()))) {
      parts.push(
        n === 1
          ? $localize`:One marked zone, e.g. a safe zone:a ${label}:zone:`
          : $localize`${n}:count: × ${label}:zone:`,
      );
    }
    for (const label of new Set(this.lines().map((l) => lineWords(l.label).toLowerCase())))
      parts.push($localize`:One marked line, e.g. a halfway line:a ${label}:line:`);
    return parts.length ? `${head}: ${parts.join(', ')}` : head;
  });

  /** A cone as a small triangle pointing up, centred on its spot. */
  protected conePoints(cone: Point): string {
    const r = this.scale() * 0.6;
    return `${round(cone.x)},${round(cone.y - r)} ${round(cone.x + r * 0.87)},${round(cone.y + r * 0.5)} ${round(cone.x - r * 0.87)},${round(cone.y + r * 0.5)}`;
  }

  /** A goal as a frame: posts at the mouth's ends and a back bar behind, away from where it faces. */
  protected goalPath(goal: Target): string {
    const depth = this.scale() * 0.9;
    const rad = (goal.facing * Math.PI) / 180;
    // Facing 0 points along +y; the net lies the other way.
    const bx = -Math.sin(rad) * depth;
    const by = -Math.cos(rad) * depth;
    const { from, to } = goal;
    return `M ${round(from.x)} ${round(from.y)} L ${round(from.x + bx)} ${round(from.y + by)} L ${round(to.x + bx)} ${round(to.y + by)} L ${round(to.x)} ${round(to.y)}`;
  }
}

/** The letter in a joining coach's circle, and for them in the accessible label. */
const COACH_MARK = $localize`:Letter in the circle of a coach who joins in, short for Coach:C`;

/** How many of each role a station holds, in the accessible label ("4 attackers"). */
const ROLE_COUNT: Record<PositionRole, (n: number) => string> = {
  player: (n) => (n === 1 ? $localize`1 player` : $localize`${n}:count: players`),
  attacker: (n) => (n === 1 ? $localize`1 attacker` : $localize`${n}:count: attackers`),
  defender: (n) => (n === 1 ? $localize`1 defender (bib)` : $localize`${n}:count: defenders (bibs)`),
  goalkeeper: (n) => (n === 1 ? $localize`1 goalkeeper` : $localize`${n}:count: goalkeepers`),
  'team-a': (n) => $localize`:Players in the team wearing bibs:${n}:count: on side A (bibs)`,
  'team-b': (n) => $localize`:Players in the other team:${n}:count: on side B`,
  server: (n) => (n === 1 ? $localize`1 server` : $localize`${n}:count: servers`),
  neutral: (n) => (n === 1 ? $localize`1 neutral` : $localize`${n}:count: neutrals`),
  coach: (n) =>
    n === 1 ? $localize`:A coach who joins in:1 coach` : $localize`:Coaches who join in:${n}:count: coaches`,
};

/** The two cones nearest a gate's centre, when the plan listed them there. */
function gateCones(gate: Point, cones: Point[]): [Point, Point] | null {
  const near = cones
    .map((c) => ({ c, d: Math.hypot(c.x - gate.x, c.y - gate.y) }))
    .filter((n) => n.d > 0.05 && n.d <= GATE_REACH)
    .sort((a, b) => a.d - b.d);
  if (near.length < 2) return null;
  const [a, b] = near;
  // The gate's centre lies between its two cones.
  const mid = { x: (a.c.x + b.c.x) / 2, y: (a.c.y + b.c.y) / 2 };
  return Math.hypot(mid.x - gate.x, mid.y - gate.y) < 0.3 ? [a.c, b.c] : null;
}

/** A zone's name as the plan gives it ("end zone"), else "safe zone" for "safe", or "zone". */
function zoneWords(label: string): string {
  const text = label.trim();
  const words = !text
    ? $localize`:A marked area inside a drawn station:zone`
    : /zone/i.test(text)
      ? text
      : $localize`:A marked area named by the plan, e.g. safe zone:${text}:name: zone`;
  return words.charAt(0).toUpperCase() + words.slice(1);
}

/** A line's name as the plan gives it, else "halfway line" for "halfway", or "marked line". */
function lineWords(label: string | undefined): string {
  const text = label?.trim();
  const words = !text
    ? $localize`:A line drawn inside a station:marked line`
    : /line/i.test(text)
      ? text
      : $localize`:A line named by the plan, e.g. halfway line:${text}:name: line`;
  return words.charAt(0).toUpperCase() + words.slice(1);
}

function tally(labels: string[]): Map<string, number> {
  const out = new Map<string, number>();
  for (const l of labels) out.set(l, (out.get(l) ?? 0) + 1);
  return out;
}

function round(n: number): number {
  return Math.round(n * 100) / 100;
}
