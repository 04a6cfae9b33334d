import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { GoalPlacement, Point, Station } from '../../../../../shared/types';

interface Dot extends Point {
  n: number;
  goalkeeper: boolean;
}

const MARGIN = 2;

/**
 * A station drawn to scale from the engine's coordinates (metres): the area, its cones,
 * goals or gates, and the group as numbered players.
 */
@Component({
  selector: 'cw-station-diagram',
  template: `
    <svg
      [attr.viewBox]="viewBox()"
      role="img"
      [attr.aria-label]="label()"
      preserveAspectRatio="xMidYMid meet"
      class="cw-diagram"
    >
      <rect
        [attr.x]="station().position.x"
        [attr.y]="station().position.y"
        [attr.width]="station().area.width"
        [attr.height]="station().area.length"
        class="cw-area"
        [attr.rx]="scale() * 0.6"
      />
      @for (goal of goals(); track $index) {
        @if (goal.kind === 'goal') {
          <rect
            [attr.x]="goal.x - goalWidth() / 2"
            [attr.y]="goal.y - scale() * 0.5"
            [attr.width]="goalWidth()"
            [attr.height]="scale()"
            [attr.transform]="'rotate(' + goal.facing + ' ' + goal.x + ' ' + goal.y + ')'"
            class="cw-goal"
          />
        } @else {
          <line
            [attr.x1]="goal.x - goalWidth() / 2"
            [attr.y1]="goal.y"
            [attr.x2]="goal.x + goalWidth() / 2"
            [attr.y2]="goal.y"
            [attr.transform]="'rotate(' + goal.facing + ' ' + goal.x + ' ' + goal.y + ')'"
            class="cw-gate"
            [attr.stroke-width]="scale() * 0.25"
          />
        }
      }
      @for (cone of station().conePositions; track $index) {
        <polygon [attr.points]="conePoints(cone)" class="cw-cone" />
      }
      @for (dot of dots(); track dot.n) {
        <g [attr.transform]="'translate(' + dot.x + ' ' + dot.y + ')'">
          <circle [attr.r]="scale() * 0.95" [class.cw-keeper]="dot.goalkeeper" class="cw-player" />
          <text
            [attr.font-size]="scale() * 1.1"
            text-anchor="middle"
            dominant-baseline="central"
            class="cw-number"
          >
            {{ dot.n }}
          </text>
        </g>
      }
    </svg>
  `,
  styles: `
    :host {
      display: block;
    }
    .cw-diagram {
      width: 100%;
      height: auto;
      max-height: 240px;
      display: block;
      background: var(--cw-pitch);
      border-radius: 12px;
    }
    .cw-area {
      fill: #3a8d5c;
      stroke: var(--cw-pitch-line);
      stroke-width: 0.3;
      stroke-dasharray: 1 0.6;
    }
    .cw-cone {
      fill: var(--cw-cone);
      stroke: #7a3300;
      stroke-width: 0.1;
    }
    .cw-goal {
      fill: #fff;
      stroke: var(--cw-goal);
      stroke-width: 0.2;
    }
    .cw-gate {
      stroke: #ffd9bd;
      stroke-dasharray: 0.6 0.4;
    }
    .cw-player {
      fill: #0b4f56;
      stroke: #fff;
      stroke-width: 0.2;
    }
    .cw-keeper {
      fill: #f7d046;
    }
    .cw-keeper + .cw-number {
      fill: #1b1b1b;
    }
    .cw-number {
      fill: #fff;
      font-weight: 700;
      font-family: 'Roboto Condensed', sans-serif;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StationDiagram {
  readonly station = input.required<Station>();
  /** Ids of goalkeepers, drawn in a different colour. */
  readonly goalkeepers = input<ReadonlySet<string>>(new Set());

  /** Marks are sized to the area so a 40 m grid and a 8 m one both read clearly. */
  protected readonly scale = computed(() => {
    const { width, length } = this.station().area;
    return Math.max(0.45, Math.min(1.4, Math.max(width, length) / 22));
  });

  protected readonly goalWidth = computed(() => Math.max(2, Math.min(4, this.station().area.width / 4)));

  protected readonly viewBox = computed(() => {
    const { position, area } = this.station();
    const m = MARGIN + this.scale();
    return `${position.x - m} ${position.y - m} ${area.width + 2 * m} ${area.length + 2 * m}`;
  });

  protected readonly goals = computed<GoalPlacement[]>(() => this.station().goalPositions ?? []);

  /** Players spread on an ellipse inside the area, in group order. */
  protected readonly dots = computed<Dot[]>(() => {
    const { position, area, playerIds } = this.station();
    const count = playerIds.length;
    const cx = position.x + area.width / 2;
    const cy = position.y + area.length / 2;
    const rx = area.width * 0.32;
    const ry = area.length * 0.32;
    return playerIds.map((id, i) => {
      const angle = count === 1 ? 0 : (2 * Math.PI * i) / count - Math.PI / 2;
      return {
        n: i + 1,
        x: count === 1 ? cx : cx + rx * Math.cos(angle),
        y: count === 1 ? cy : cy + ry * Math.sin(angle),
        goalkeeper: this.goalkeepers().has(id),
      };
    });
  });

  protected readonly label = computed(() => {
    const s = this.station();
    const goals = this.goals();
    const goalText = goals.length
      ? `, ${goals.filter((g) => g.kind === 'goal').length} goals and ${goals.filter((g) => g.kind === 'gate').length} cone gates`
      : '';
    return `${s.title}: area ${s.area.width} by ${s.area.length} metres, ${s.conePositions.length} cones${goalText}, ${s.playerIds.length} players`;
  });

  protected conePoints(cone: Point): string {
    const r = this.scale() * 0.7;
    return `${cone.x},${cone.y - r} ${cone.x + r * 0.87},${cone.y + r * 0.5} ${cone.x - r * 0.87},${cone.y + r * 0.5}`;
  }
}
