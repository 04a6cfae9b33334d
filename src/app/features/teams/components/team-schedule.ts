import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import type { ScheduledSessionDto } from '../../../../../shared/types';
import { ScheduleApi } from '../../../core/api/schedule-api';
import { problemMessage } from '../../../core/http/problem-message';
import { ICONS } from '../../../core/icons/shipped-icon';
import { SCHEDULE_KIND_LABELS, sessionDay } from '../../../core/labels/schedule-labels';
import { timeWords } from '../../../core/locale/locale-format';
import { ScheduleDialog, type ScheduleDialogData } from './schedule-dialog';

/**
 * A team's coming training nights and matches (add one, add weekly, change, delete) and the
 * address of its calendar feed for assistants' and parents' calendar apps.
 */
/** Sessions listed before "Show all". */
export const SESSIONS_SHOWN = 5;

@Component({
  selector: 'cw-team-schedule',
  imports: [RouterLink, MatButtonModule, ...ICONS],
  templateUrl: './team-schedule.html',
  styleUrl: './team-schedule.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TeamSchedule {
  private readonly api = inject(ScheduleApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);

  readonly teamId = input.required<string>();
  /** The lead or one of the team's staff: may change the schedule and its calendar link. */
  readonly editable = input(false);
  /** May make plans for this team. */
  readonly canPlan = input(false);

  protected readonly sessions = signal<ScheduledSessionDto[]>([]);
  /** A term of weekly nights is long: the next few show, the rest behind one tap. */
  protected readonly showAll = signal(false);
  protected readonly shown = computed(() =>
    this.showAll() ? this.sessions() : this.sessions().slice(0, SESSIONS_SHOWN),
  );
  protected readonly loaded = signal(false);
  protected readonly error = signal<string | null>(null);
  /** The session whose delete waits for a second tap. */
  protected readonly confirming = signal<string | null>(null);
  protected readonly feedPath = signal<string | null>(null);
  protected readonly renewing = signal(false);
  protected readonly busy = signal(false);
  protected readonly kindLabels = SCHEDULE_KIND_LABELS;
  protected readonly day = sessionDay;
  protected readonly time = timeWords;

  protected readonly feedUrl = computed(() => {
    const path = this.feedPath();
    return path ? `${location.origin}${path}` : null;
  });
  /** The same address for calendar apps that subscribe from a link. */
  protected readonly webcalUrl = computed(() => {
    const path = this.feedPath();
    return path ? `webcal://${location.host}${path}` : null;
  });

  constructor() {
    effect(() => {
      const id = this.teamId();
      this.load(id);
      this.api.calendar(id).subscribe({
        next: (calendar) => this.feedPath.set(calendar.path),
        error: () => this.feedPath.set(null),
      });
    });
  }

  private load(id = this.teamId()): void {
    this.api.list(id).subscribe({
      next: (sessions) => {
        this.sessions.set(sessions);
        this.loaded.set(true);
      },
      error: (error: unknown) => {
        this.error.set(problemMessage(error));
        this.loaded.set(true);
      },
    });
  }

  // Words with a value in an attribute are set here: a marked attribute with {{ }} on a plain
  // element never reaches the page (angular/angular#43260).
  /** What a screen reader says for the question that asks before a session is deleted. */
  protected confirmLabel(session: ScheduledSessionDto): string {
    return $localize`:Names the day of the session about to be deleted:Delete ${this.day(session.date)}:day:`;
  }

  /** What a screen reader says for a session's change button. */
  protected changeLabel(session: ScheduledSessionDto): string {
    return $localize`:Kind of session, and its day:Change ${this.kindLabels[session.kind]}:kind: on ${this.day(session.date)}:day:`;
  }

  /** What a screen reader says for a session's delete button. */
  protected deleteLabel(session: ScheduledSessionDto): string {
    return $localize`:Kind of session, and its day:Delete ${this.kindLabels[session.kind]}:kind: on ${this.day(session.date)}:day:`;
  }

  protected open(session?: ScheduledSessionDto, weekly = false): void {
    this.dialog
      .open<ScheduleDialog, ScheduleDialogData, number>(ScheduleDialog, {
        data: { teamId: this.teamId(), session, weekly },
        width: '440px',
        maxWidth: 'calc(100vw - 24px)',
        autoFocus: 'first-tabbable',
      })
      .afterClosed()
      .subscribe((count) => {
        if (!count) return;
        this.say(
          session
            ? $localize`Session saved.`
            : count === 1
              ? $localize`Session added.`
              : $localize`${count}:count: sessions added.`,
        );
        this.load();
      });
  }

  protected remove(session: ScheduledSessionDto): void {
    if (this.busy()) return;
    this.busy.set(true);
    this.api.remove(this.teamId(), session.id).subscribe({
      next: () => {
        this.busy.set(false);
        this.confirming.set(null);
        this.sessions.update((list) => list.filter((s) => s.id !== session.id));
        this.say($localize`Session deleted.`);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }

  protected async copyLink(): Promise<void> {
    const url = this.feedUrl();
    if (!url) return;
    try {
      await navigator.clipboard.writeText(url);
      this.say($localize`Calendar link copied.`);
    } catch {
      this.say($localize`Copying is blocked here: press and hold the link to copy it.`);
    }
  }

  /** Turns the link on, or replaces it (the old one stops working). */
  protected renewLink(): void {
    if (this.busy()) return;
    this.busy.set(true);
    const replacing = !!this.feedPath();
    this.api.renewCalendar(this.teamId()).subscribe({
      next: (calendar) => {
        this.busy.set(false);
        this.renewing.set(false);
        this.feedPath.set(calendar.path);
        this.say(
          replacing
            ? $localize`New calendar link made; the old one no longer works.`
            : $localize`Calendar link turned on.`,
        );
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }

  protected stopLink(): void {
    if (this.busy()) return;
    this.busy.set(true);
    this.api.stopCalendar(this.teamId()).subscribe({
      next: () => {
        this.busy.set(false);
        this.renewing.set(false);
        this.feedPath.set(null);
        this.say($localize`Calendar link turned off.`);
      },
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }

  private say(text: string): void {
    this.snackBar.open(text, undefined, { duration: 3000, politeness: 'polite' });
  }
}
