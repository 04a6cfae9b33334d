import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { Phase } from '../../../../../shared/types';
import { isBreak } from '../services/plan-words';
import { timelineClock } from '../services/timeline-clock';

interface TimelineRow {
  index: number;
  name: string;
  /** A drinks break: a row of its own, with no stations. */
  isBreak: boolean;
  minutes: number;
  /** Minutes of the phase set aside to put out kit first (0 when none). */
  setUpMinutes: number;
  clock: string | null;
  toKickOff: number;
  share: number;
}

/**
 * The phases in order, drinks breaks among them, with clock times: a match warm-up counts down to
 * kick-off, a training session runs from its start time.
 */
@Component({
  selector: 'cw-phase-timeline',
  template: `
    <ol class="cw-timeline" aria-label="Timeline">
      @for (row of rows(); track row.index) {
        <li
          [style.flex-grow]="row.share"
          [class.cw-break-row]="row.isBreak"
          [attr.data-kind]="row.isBreak ? 'break' : null"
        >
          <a [href]="'#phase-' + row.index" class="cw-slot">
            <span class="cw-clock">{{ row.clock ?? 'min ' + (total() - row.toKickOff) }}</span>
            <span class="cw-name">{{ row.name }}</span>
            <span class="cw-left"
              >{{ row.minutes }} min · {{ row.toKickOff }} to {{ endLabel()
              }}{{ row.setUpMinutes ? ' · ' + row.setUpMinutes + ' min set-up' : '' }}</span
            >
          </a>
        </li>
      }
      <li class="cw-end">
        <span class="cw-clock">{{ endClock() ?? 'min ' + total() }}</span>
        <span class="cw-name">{{ endLabel() === 'kick-off' ? 'Kick-off' : 'End' }}</span>
      </li>
    </ol>
  `,
  styleUrl: './phase-timeline.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhaseTimeline {
  /** The plan's phases, drinks breaks included. */
  readonly phases = input.required<Phase[]>();
  /** The plan's HH:MM time: kick-off for a match warm-up (the plan ends there), start time for training. */
  readonly kickOff = input<string | null>(null);
  /** Whether the plan ends at a kick-off (a match warm-up) rather than at the end of training. */
  readonly matchDay = input(true);

  protected readonly total = computed(() => this.phases().at(-1)?.endMinute ?? 0);
  protected readonly endLabel = computed(() => (this.matchDay() ? 'kick-off' : 'the end'));
  private readonly clock = computed(() =>
    timelineClock(this.phases(), this.matchDay() ? 'match-warm-up' : 'training', this.kickOff()),
  );
  protected readonly endClock = computed(() => this.clock().end);

  protected readonly rows = computed<TimelineRow[]>(() =>
    this.phases().map((phase, index) => ({
      index,
      name: phase.name,
      isBreak: isBreak(phase),
      minutes: phase.endMinute - phase.startMinute,
      setUpMinutes: phase.changeover?.minutes ?? 0,
      clock: this.clock().starts[index] ?? null,
      toKickOff: this.total() - phase.startMinute,
      share: Math.max(1, phase.endMinute - phase.startMinute),
    })),
  );
}
