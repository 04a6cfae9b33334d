import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { PlayerDto } from '../../../../../shared/types';
import type { PlayerBody } from '../../../core/api/players-api';
import { controlMessage } from '../../../core/forms/form-errors';
import { checkAgainstSchema } from '../../../core/forms/schema-form';

/** Adds or edits one player: a first name and initial is enough, no contact details. */
@Component({
  selector: 'cw-player-dialog',
  imports: [
    ReactiveFormsModule,
    MatDialogModule,
    MatFormFieldModule,
    MatInputModule,
    MatCheckboxModule,
    MatButtonModule,
  ],
  template: `
    <h2 mat-dialog-title>{{ data ? 'Edit player' : 'Add a player' }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content>
        <mat-form-field appearance="outline" class="cw-wide">
          <mat-label>Name shown on plans</mat-label>
          <input matInput formControlName="displayName" required cdkFocusInitial />
          <mat-hint>A first name and initial is enough, e.g. "Sam T."</mat-hint>
          <mat-error>{{ message(form.controls.displayName, 'Name') }}</mat-error>
        </mat-form-field>
        <mat-checkbox formControlName="goalkeeper">Plays in goal</mat-checkbox>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit">{{ data ? 'Save' : 'Add' }}</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: '.cw-wide { width: 100%; min-width: 240px; margin-top: 8px; }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlayerDialog {
  protected readonly data = inject<PlayerDto | null>(MAT_DIALOG_DATA);
  private readonly ref = inject<MatDialogRef<PlayerDialog, PlayerBody>>(MatDialogRef);
  protected readonly message = controlMessage;
  protected readonly form = inject(NonNullableFormBuilder).group({
    displayName: [this.data?.displayName ?? '', [Validators.required, Validators.maxLength(40)]],
    goalkeeper: [this.data?.goalkeeper ?? false],
  });

  protected async save(): Promise<void> {
    const value = this.form.getRawValue();
    const body = { ...value, displayName: value.displayName.trim() };
    const check = await checkAgainstSchema(this.form, this.data ? 'player-update' : 'player-create', body, {
      displayName: 'Name',
    });
    if (check.ok) this.ref.close(body);
  }
}
