import {
  afterRenderEffect,
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  ElementRef,
  inject,
  input,
  viewChild,
} from '@angular/core';
import {
  BarController,
  BarElement,
  CategoryScale,
  Chart,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  PointElement,
  Tooltip,
  type ChartConfiguration,
} from 'chart.js';

Chart.register(
  BarController,
  BarElement,
  LineController,
  LineElement,
  PointElement,
  CategoryScale,
  LinearScale,
  Tooltip,
  Legend,
);

/** A chart.js chart on a canvas; the canvas is an image whose words come from `summary`. */
@Component({
  selector: 'cw-insight-chart',
  template: `<div class="cw-chart" [style.height.px]="height()">
    <canvas #canvas role="img" [attr.aria-label]="summary()"></canvas>
  </div>`,
  styles: `
    .cw-chart {
      position: relative;
      width: 100%;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InsightChart {
  /** What to draw. */
  readonly config = input.required<ChartConfiguration>();
  /** The chart in one sentence, for screen readers. */
  readonly summary = input.required<string>();
  readonly height = input(280);

  private readonly canvas = viewChild.required<ElementRef<HTMLCanvasElement>>('canvas');
  private chart: Chart | null = null;

  constructor() {
    afterRenderEffect(() => {
      const config = this.config();
      this.chart?.destroy();
      this.chart = null;
      const canvas = this.canvas().nativeElement;
      // No 2D context (a test DOM, a locked-down browser): the text summary and tables still say it all.
      if (!canvas.getContext?.('2d')) return;
      this.chart = new Chart(canvas, {
        ...config,
        options: { responsive: true, maintainAspectRatio: false, animation: false, ...config.options },
      });
    });
    inject(DestroyRef).onDestroy(() => this.chart?.destroy());
  }
}
