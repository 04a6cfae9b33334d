import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { Observable } from 'rxjs';
import {
  MAX_WEEKLY_SESSIONS,
  weeklyDates,
  type ScheduledSessionBody,
  type ScheduledSessionDto,
  type ScheduleKind,
} from '../../../../../shared/types';
import { ScheduleApi } from '../../../core/api/schedule-api';
import { controlMessage, showProblem } from '../../../core/forms/form-errors';
import { checkAgainstSchema } from '../../../core/forms/schema-form';
import { isoDate } from '../../../core/time/dates';

/** What the dialog is opened with: the team, and the session to change or whether to repeat a new one. */
export interface ScheduleDialogData {
  teamId: string;
  session?: ScheduledSessionDto;
  weekly?: boolean;
}

/** Usual minutes a plan fills: a match warm-up, a training night. */
const DEFAULT_MINUTES: Record<ScheduleKind, number> = { match: 20, training: 60 };

/** Field names in the words a refusal uses ("Day is needed."). */
const LABELS = {
  date: $localize`Day`,
  startTime: $localize`Start time`,
  minutes: $localize`Minutes`,
  place: $localize`Place`,
  until: $localize`Last week`,
};

/**
 * Adds a training night or match (once, or every week until a day) or changes one. Saves through
 * the API itself, so a refusal is shown beside its field and nothing typed is lost.
 */
@Component({
  selector: 'cw-schedule-dialog',
  imports: [
    ReactiveFormsModule,
    MatDialogModule,
    MatButtonModule,
    MatButtonToggleModule,
    MatCheckboxModule,
    MatFormFieldModule,
    MatInputModule,
  ],
  template: `
    <h2 mat-dialog-title>{{ title }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="cw-fields">
        <mat-button-toggle-group
          formControlName="kind"
          i18n-aria-label
          aria-label="Kind of session"
          class="cw-kind"
        >
          <mat-button-toggle value="training" i18n="Kind of session: a training night"
            >Training</mat-button-toggle
          >
          <mat-button-toggle value="match" i18n="Kind of session: a football match">Match</mat-button-toggle>
        </mat-button-toggle-group>
        <mat-form-field appearance="outline">
          <mat-label>
            @if (repeat()) {
              <ng-container i18n="Day of the first of the weekly sessions">First day</ng-container>
            } @else {
              <ng-container i18n="Day of the session">Day</ng-container>
            }
          </mat-label>
          <input matInput type="date" formControlName="date" data-testid="session-date" />
          <mat-error>{{ message(form.controls.date, labels.date) }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>{{ startLabel() }}</mat-label>
          <input matInput type="time" formControlName="startTime" data-testid="session-time" />
          <mat-error>{{ message(form.controls.startTime, startLabel()) }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>
            @if (isMatch()) {
              <ng-container i18n>Warm-up minutes</ng-container>
            } @else {
              <ng-container i18n>Session minutes</ng-container>
            }
          </mat-label>
          <input matInput type="number" inputmode="numeric" min="5" max="120" formControlName="minutes" />
          <mat-hint>
            @if (isMatch()) {
              <ng-container i18n>The warm-up Conewise plans before kick-off.</ng-container>
            } @else {
              <ng-container i18n>How long the session runs.</ng-container>
            }
          </mat-hint>
          <mat-error>{{ message(form.controls.minutes, labels.minutes) }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label i18n="Where the session is held">Place (optional)</mat-label>
          <input
            matInput
            formControlName="place"
            maxlength="120"
            i18n-placeholder="An example of a place: a ground and its pitch"
            placeholder="e.g. Meadow Lane, pitch 2"
          />
          <mat-error>{{ message(form.controls.place, labels.place) }}</mat-error>
        </mat-form-field>
        @if (!data.session) {
          <mat-checkbox formControlName="repeat" data-testid="session-repeat" i18n>Every week</mat-checkbox>
          @if (repeat()) {
            <mat-form-field appearance="outline">
              <mat-label i18n="Last day the weekly session repeats on">Until</mat-label>
              <input matInput type="date" formControlName="until" data-testid="session-until" />
              <mat-hint>{{ countHint() }}</mat-hint>
              <mat-error>{{ message(form.controls.until, untilLabel) }}</mat-error>
            </mat-form-field>
          }
        }
        @if (error(); as text) {
          <p class="cw-form-error" role="alert">{{ text }}</p>
        }
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close i18n>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()" data-testid="session-save">
          @if (data.session) {
            <ng-container i18n="Button that saves the changed session">Save</ng-container>
          } @else {
            <ng-container i18n="Button that adds the session to the schedule">Add</ng-container>
          }
        </button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .cw-fields {
      display: flex;
      flex-direction: column;
      gap: 4px;
      padding-top: 8px;
    }
    .cw-kind {
      align-self: flex-start;
      margin: 8px 0 12px;
    }
    mat-form-field {
      width: 100%;
      min-width: 240px;
    }
    mat-checkbox {
      margin-bottom: 8px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ScheduleDialog {
  protected readonly data = inject<ScheduleDialogData>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<ScheduleDialog, number>>(MatDialogRef);
  private readonly api = inject(ScheduleApi);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly labels = LABELS;
  /** The name the last-day field gives itself in a message. */
  protected readonly untilLabel = $localize`Until`;
  protected readonly title = this.data.session
    ? $localize`Change this session`
    : this.data.weekly
      ? $localize`Add a weekly session`
      : $localize`Add a session`;

  protected readonly form = inject(NonNullableFormBuilder).group({
    kind: [this.data.session?.kind ?? ('training' as ScheduleKind)],
    date: [this.data.session?.date ?? isoDate(new Date()), Validators.required],
    startTime: [this.data.session?.startTime ?? '18:00', Validators.required],
    minutes: [
      this.data.session?.minutes ?? DEFAULT_MINUTES.training,
      [Validators.required, Validators.min(5), Validators.max(120)],
    ],
    place: [this.data.session?.place ?? ''],
    repeat: [this.data.weekly ?? false],
    until: [''],
  });

  private readonly value = toSignal(this.form.valueChanges, { initialValue: this.form.getRawValue() });
  protected readonly isMatch = computed(() => this.value().kind === 'match');
  protected readonly repeat = computed(() => !!this.value().repeat);
  /** A match starts at kick-off; a training night at its start time. */
  protected readonly startLabel = computed(() => (this.isMatch() ? $localize`Kick-off` : LABELS.startTime));
  protected readonly countHint = computed(() => {
    const { date, until } = this.value();
    if (!date || !until || until < date)
      return $localize`Up to ${MAX_WEEKLY_SESSIONS}:maxWeeks: weeks at once.`;
    const count = weeklyDates(date, until).length;
    if (count > MAX_WEEKLY_SESSIONS)
      return $localize`That is more than ${MAX_WEEKLY_SESSIONS}:maxWeeks: weeks: choose an earlier day.`;
    return count === 1
      ? $localize`Adds 1 session, one a week.`
      : $localize`Adds ${count}:count: sessions, one a week.`;
  });

  constructor() {
    // A new session's minutes follow its kind until the coach types their own.
    this.form.controls.kind.valueChanges.subscribe((kind) => {
      if (!this.form.controls.minutes.dirty) this.form.controls.minutes.setValue(DEFAULT_MINUTES[kind]);
    });
  }

  protected async save(): Promise<void> {
    if (this.saving()) return;
    this.error.set(null);
    const raw = this.form.getRawValue();
    const body: ScheduledSessionBody = {
      date: raw.date,
      startTime: raw.startTime,
      kind: raw.kind,
      minutes: Number(raw.minutes),
      place: raw.place.trim(),
    };
    const weekly = !this.data.session && raw.repeat;
    if (weekly && !raw.until) {
      this.form.controls.until.setErrors({ message: $localize`Choose the last week to repeat on.` });
      this.form.controls.until.markAsTouched();
      return;
    }
    const sent = weekly ? { ...body, until: raw.until } : body;
    const check = await checkAgainstSchema(
      this.form,
      weekly ? 'weekly-sessions' : 'scheduled-session',
      sent,
      LABELS,
    );
    if (!check.ok) {
      if (check.unmatched.length) this.error.set(check.unmatched.join(' '));
      return;
    }
    this.saving.set(true);
    const call: Observable<unknown> = this.data.session
      ? this.api.update(this.data.teamId, this.data.session.id, body)
      : weekly
        ? this.api.createWeekly(this.data.teamId, { ...body, until: raw.until })
        : this.api.create(this.data.teamId, body);
    call.subscribe({
      next: (saved) => this.ref.close(Array.isArray(saved) ? saved.length : 1),
      error: (error: unknown) => {
        this.saving.set(false);
        this.error.set(showProblem(this.form, error, LABELS));
      },
    });
  }
}
