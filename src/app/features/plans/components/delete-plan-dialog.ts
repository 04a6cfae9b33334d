import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import type { PlanSummaryDto } from '../../../../../shared/types';
import { PlansApi } from '../../../core/api/plans-api';
import { problemMessage } from '../../../core/http/problem-message';
import { planName } from '../services/plan-words';

/**
 * Asks before a plan is deleted, saying what goes with it, and deletes it. Closes with `true` once
 * the server has deleted it; a refusal stays in the dialog so the coach can read it.
 */
@Component({
  selector: 'cw-delete-plan-dialog',
  imports: [MatDialogModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title i18n>Delete this plan?</h2>
    <mat-dialog-content>
      <p>
        <strong>{{ name }}</strong>
      </p>
      <ul class="cw-consequences">
        <li i18n>The plan is deleted for everyone in the club, with its stations and groups.</li>
        <li i18n>Who came and how each station went in this session are deleted with it.</li>
        <li i18n>The players stay on the team.</li>
      </ul>
      <p i18n>You can't undo this.</p>
      @if (error(); as text) {
        <p class="cw-form-error" role="alert">{{ text }}</p>
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close cdkFocusInitial i18n>Keep plan</button>
      <button
        mat-flat-button
        type="button"
        class="cw-danger"
        [disabled]="busy()"
        data-testid="confirm-delete-plan"
        (click)="deletePlan()"
      >
        {{ deleteLabel() }}
      </button>
    </mat-dialog-actions>
  `,
  styleUrl: '../../../shared/components/confirm-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DeletePlanDialog {
  private readonly plansApi = inject(PlansApi);
  private readonly ref = inject<MatDialogRef<DeletePlanDialog, boolean>>(MatDialogRef);
  private readonly plan = inject<PlanSummaryDto>(MAT_DIALOG_DATA);
  protected readonly name = planName(this.plan);
  protected readonly busy = signal(false);
  protected readonly deleteLabel = computed(() =>
    this.busy() ? $localize`:While a plan is being deleted:Deleting…` : $localize`Delete plan`,
  );
  protected readonly error = signal<string | null>(null);

  protected deletePlan(): void {
    if (this.busy()) return;
    this.busy.set(true);
    this.error.set(null);
    this.plansApi.remove(this.plan.id).subscribe({
      next: () => this.ref.close(true),
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }
}
