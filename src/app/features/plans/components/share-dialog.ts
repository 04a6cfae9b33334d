import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import {
  AbstractControl,
  NonNullableFormBuilder,
  ReactiveFormsModule,
  ValidationErrors,
  Validators,
} from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { ErrorStateMatcher, ShowOnDirtyErrorStateMatcher } from '@angular/material/core';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { CardPaper, PlansApi } from '../../../core/api/plans-api';
import { controlMessage, showProblem } from '../../../core/forms/form-errors';
import { checkAgainstSchema } from '../../../core/forms/schema-form';
import { PAPER_LABELS } from '../services/paper-preference';
import { HelperLinks } from './helper-links';

const EMAIL = /^[^\s@]+@[^\s@]+\.[^\s@]+$/;

/** The form's fields as a refusal names them. */
const FIELD_NAMES = {
  recipients: $localize`:The e-mail addresses field, as an error names it:Recipients`,
  message: $localize`:The optional note field, as an error names it:Note`,
};

/** Splits "a@x.org, b@y.org" or one address a line into addresses. */
export function parseRecipients(text: string): string[] {
  return text
    .split(/[\s,;]+/)
    .map((s) => s.trim())
    .filter(Boolean);
}

function recipientsValidator(control: AbstractControl): ValidationErrors | null {
  const list = parseRecipients(String(control.value ?? ''));
  if (list.length === 0) return { message: $localize`Add at least one e-mail address.` };
  const bad = list.filter((address) => !EMAIL.test(address));
  if (bad.length) return { message: $localize`Not an e-mail address: ${bad.join(', ')}:addresses:` };
  if (list.length > 20) return { message: $localize`At most 20 recipients at once.` };
  return null;
}

/** What the plan page hands the dialog: the plan, and the paper the coach prints on. */
export interface ShareDialogData {
  planId: string;
  paper: CardPaper;
  /** E-mailing the card is for the lead and coaches; assistants share helper links only. */
  canEmail: boolean;
}

/** Sends the printed card by e-mail to the people the coach names. */
@Component({
  selector: 'cw-share-dialog',
  imports: [
    ReactiveFormsModule,
    MatDialogModule,
    MatFormFieldModule,
    MatInputModule,
    MatButtonModule,
    HelperLinks,
  ],
  template: `
    <h2 mat-dialog-title i18n>Share the plan</h2>
    <form [formGroup]="form" (ngSubmit)="send()" novalidate>
      <mat-dialog-content>
        @if (data.canEmail) {
          <p i18n="Paper is A4 or US Letter">
            Each person gets an e-mail with the one-page card attached as a PDF on
            {{ paperLabels[data.paper] }} paper, and a link to see the plan on their phone.
          </p>
          @if (error(); as text) {
            <p class="cw-form-error" role="alert">{{ text }}</p>
          }
          <mat-form-field appearance="outline" class="cw-wide">
            <mat-label i18n>E-mail addresses</mat-label>
            <textarea
              matInput
              formControlName="recipients"
              rows="3"
              cdkFocusInitial
              data-testid="share-recipients"
            ></textarea>
            <mat-hint i18n>Separate with commas or put one a line.</mat-hint>
            <mat-error>{{ message(form.controls.recipients, fieldNames.recipients) }}</mat-error>
          </mat-form-field>
          <mat-form-field appearance="outline" class="cw-wide">
            <mat-label i18n>Note (optional)</mat-label>
            <input matInput formControlName="message" maxlength="500" />
          </mat-form-field>
        } @else {
          <p i18n>
            E-mailing the card is for the team's coaches and the head of coaching. You can make a helper link
            below and send it yourself: it shows the plan on a phone, with first names only.
          </p>
        }
        <cw-helper-links [planId]="data.planId" />
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>
          @if (data.canEmail) {
            <ng-container i18n>Cancel</ng-container>
          } @else {
            <ng-container i18n="Closes the dialog (verb)">Close</ng-container>
          }
        </button>
        @if (data.canEmail) {
          <button mat-flat-button type="submit" [disabled]="sending()" data-testid="share-send">
            {{ sendLabel() }}
          </button>
        }
      </mat-dialog-actions>
    </form>
  `,
  styles: '.cw-wide { width: 100%; min-width: 260px; }',
  // A coach who only makes a helper link leaves the address field empty: no red until typed in or sent.
  providers: [{ provide: ErrorStateMatcher, useClass: ShowOnDirtyErrorStateMatcher }],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShareDialog {
  protected readonly data = inject<ShareDialogData>(MAT_DIALOG_DATA);
  protected readonly paperLabels = PAPER_LABELS;
  private readonly plansApi = inject(PlansApi);
  private readonly ref = inject<MatDialogRef<ShareDialog, number>>(MatDialogRef);
  protected readonly message = controlMessage;
  protected readonly error = signal<string | null>(null);
  protected readonly sending = signal(false);
  protected readonly sendLabel = computed(() =>
    this.sending()
      ? $localize`:While the e-mails are being sent:Sending…`
      : $localize`:Sends the e-mails (verb):Send`,
  );
  protected readonly fieldNames = FIELD_NAMES;
  protected readonly form = inject(NonNullableFormBuilder).group({
    recipients: ['', [Validators.required, recipientsValidator]],
    message: [''],
  });

  protected async send(): Promise<void> {
    // Set before the schema check, which waits: a second tap meanwhile sends nothing.
    if (this.sending()) return;
    this.sending.set(true);
    const recipients = [...new Set(parseRecipients(this.form.controls.recipients.value))];
    const message = this.form.controls.message.value.trim();
    const body = { recipients, ...(message ? { message } : {}) };
    const check = await checkAgainstSchema(this.form, 'plan-share', body, FIELD_NAMES);
    if (!check.ok) {
      this.sending.set(false);
      return;
    }
    this.plansApi.share(this.data.planId, recipients, message, this.data.paper).subscribe({
      // The server's count of e-mails queued, which the plan page reports.
      next: (result) => this.ref.close(result.queued),
      error: (error: unknown) => {
        this.sending.set(false);
        this.error.set(showProblem(this.form, error, FIELD_NAMES));
      },
    });
  }
}
