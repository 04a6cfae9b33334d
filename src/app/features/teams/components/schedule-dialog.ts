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
import { applyFieldErrors, controlMessage } from '../../../core/forms/form-errors';
import { checkAgainstSchema } from '../../../core/forms/schema-form';
import { problemFieldErrors, problemMessage } from '../../../core/http/problem-message';
import { isoDate } from '../../../core/time/dates';

/** What the dialog is opened with: the team, and the session to change or whether to repeat a new one. */
export interface ScheduleDialogData {
  teamId: string;
  session?: ScheduledSessionDto;
  weekly?: boolean;
}

/** Usual minutes a plan fills: a match warm-up, a training night. */
const DEFAULT_MINUTES: Record<ScheduleKind, number> = { match: 20, training: 60 };

const LABELS = {
  date: 'Day',
  startTime: 'Start time',
  minutes: 'Minutes',
  place: 'Place',
  until: 'Last week',
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
        <mat-button-toggle-group formControlName="kind" aria-label="Kind of session" class="cw-kind">
          <mat-button-toggle value="training">Training</mat-button-toggle>
          <mat-button-toggle value="match">Match</mat-button-toggle>
        </mat-button-toggle-group>
        <mat-form-field appearance="outline">
          <mat-label>{{ repeat() ? 'First day' : 'Day' }}</mat-label>
          <input matInput type="date" formControlName="date" data-testid="session-date" />
          <mat-error>{{ message(form.controls.date, 'Day') }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>{{ isMatch() ? 'Kick-off' : 'Start time' }}</mat-label>
          <input matInput type="time" formControlName="startTime" data-testid="session-time" />
          <mat-error>{{ message(form.controls.startTime, isMatch() ? 'Kick-off' : 'Start time') }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>{{ isMatch() ? 'Warm-up minutes' : 'Session minutes' }}</mat-label>
          <input matInput type="number" inputmode="numeric" min="5" max="120" formControlName="minutes" />
          <mat-hint>{{
            isMatch() ? 'The warm-up Conewise plans before kick-off.' : 'How long the session runs.'
          }}</mat-hint>
          <mat-error>{{ message(form.controls.minutes, 'Minutes') }}</mat-error>
        </mat-form-field>
        <mat-form-field appearance="outline">
          <mat-label>Place (optional)</mat-label>
          <input matInput formControlName="place" maxlength="120" placeholder="e.g. Meadow Lane, pitch 2" />
          <mat-error>{{ message(form.controls.place, 'Place') }}</mat-error>
        </mat-form-field>
        @if (!data.session) {
          <mat-checkbox formControlName="repeat" data-testid="session-repeat">Every week</mat-checkbox>
          @if (repeat()) {
            <mat-form-field appearance="outline">
              <mat-label>Until</mat-label>
              <input matInput type="date" formControlName="until" data-testid="session-until" />
              <mat-hint>{{ countHint() }}</mat-hint>
              <mat-error>{{ message(form.controls.until, 'Until') }}</mat-error>
            </mat-form-field>
          }
        }
        @if (error(); as text) {
          <p class="cw-form-error" role="alert">{{ text }}</p>
        }
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()" data-testid="session-save">
          {{ data.session ? 'Save' : 'Add' }}
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
  protected readonly title = this.data.session
    ? 'Change this session'
    : this.data.weekly
      ? 'Add a weekly session'
      : 'Add a session';

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
  protected readonly countHint = computed(() => {
    const { date, until } = this.value();
    if (!date || !until || until < date) return `Up to ${MAX_WEEKLY_SESSIONS} weeks at once.`;
    const count = weeklyDates(date, until).length;
    return count > MAX_WEEKLY_SESSIONS
      ? `That is more than ${MAX_WEEKLY_SESSIONS} weeks: choose an earlier day.`
      : `Adds ${count} ${count === 1 ? 'session' : 'sessions'}, one a week.`;
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
      this.form.controls.until.setErrors({ message: 'Choose the last week to repeat on.' });
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
        const unmatched = applyFieldErrors(this.form, problemFieldErrors(error));
        this.error.set(unmatched.length ? problemMessage(error) : null);
      },
    });
  }
}
