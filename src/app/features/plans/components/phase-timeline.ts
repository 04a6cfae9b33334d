import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { Phase } from '../../../../../shared/types';
import { isBreak } from '../services/plan-words';
import { timelineClock } from '../services/timeline-clock';

interface TimelineRow {
  index: number;
  name: string;
  /** A drinks break: a row of its own, with no stations. */
  isBreak: boolean;
  /** The clock time the phase starts, else its minute ("min 12"). */
  clock: string;
  /** "8 min · 30 to kick-off · 1 min set-up". */
  left: string;
  share: number;
}

/**
 * The phases in order, drinks breaks among them, with clock times: a match warm-up counts down to
 * kick-off, a training session runs from its start time.
 */
@Component({
  selector: 'cw-phase-timeline',
  template: `
    <ol class="cw-timeline" i18n-aria-label aria-label="Timeline">
      @for (row of rows(); track row.index) {
        <li
          [style.flex-grow]="row.share"
          [class.cw-break-row]="row.isBreak"
          [attr.data-kind]="row.isBreak ? 'break' : null"
        >
          <a [href]="'#phase-' + row.index" class="cw-slot">
            <span class="cw-clock">{{ row.clock }}</span>
            <span class="cw-name">{{ row.name }}</span>
            <span class="cw-left">{{ row.left }}</span>
          </a>
        </li>
      }
      <li class="cw-end">
        <span class="cw-clock">{{ endClock() }}</span>
        <span class="cw-name">{{ endName() }}</span>
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
  /** The last row's name: the kick-off of a match warm-up, the end of a training session. */
  protected readonly endName = computed(() =>
    this.matchDay() ? $localize`:The timeline's last row:Kick-off` : $localize`:The timeline's last row:End`,
  );
  private readonly clock = computed(() =>
    timelineClock(this.phases(), this.matchDay() ? 'match-warm-up' : 'training', this.kickOff()),
  );
  protected readonly endClock = computed(() => this.clock().end ?? minuteWords(this.total()));

  protected readonly rows = computed<TimelineRow[]>(() =>
    this.phases().map((phase, index) => {
      const minutes = phase.endMinute - phase.startMinute;
      const toEnd = this.total() - phase.startMinute;
      const setUp = phase.changeover?.minutes ?? 0;
      const left = this.matchDay()
        ? $localize`:A phase's length and the minutes from its start to kick-off:${minutes}:minutes: min · ${toEnd}:minutesLeft: to kick-off`
        : $localize`:A phase's length and the minutes from its start to the end of training:${minutes}:minutes: min · ${toEnd}:minutesLeft: to the end`;
      return {
        index,
        name: phase.name,
        isBreak: isBreak(phase),
        clock: this.clock().starts[index] ?? minuteWords(phase.startMinute),
        left: setUp
          ? `${left} · ${$localize`:Minutes of a phase set aside to put out kit:${setUp}:minutes: min set-up`}`
          : left,
        share: Math.max(1, minutes),
      };
    }),
  );
}

/** "min 12": a plan minute on the timeline when the plan has no clock time. */
function minuteWords(minute: number): string {
  return $localize`:A minute of the session on the timeline, when it has no clock time:min ${minute}:minute:`;
}
