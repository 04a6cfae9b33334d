import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { PlayerDto } from '../../../../../shared/types';
import { PlayersApi } from '../../../core/api/players-api';
import { controlMessage, showProblem } from '../../../core/forms/form-errors';
import { checkAgainstSchema } from '../../../core/forms/schema-form';
import { RetryKey } from '../../../core/http/retry-key';

/** The team a new player joins, or the player being edited. */
export interface PlayerDialogData {
  teamId: string;
  player: PlayerDto | null;
}

/**
 * Adds or edits one player: a first name and initial is enough, no contact details. Saves itself
 * and closes with the saved player; while saving the button is off, and a refusal stays here with
 * the name as typed.
 */
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
    <h2 mat-dialog-title>
      @if (player) {
        <ng-container i18n>Edit player</ng-container>
      } @else {
        <ng-container i18n>Add a player</ng-container>
      }
    </h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content>
        @if (error(); as text) {
          <p class="cw-form-error" role="alert">{{ text }}</p>
        }
        <mat-form-field appearance="outline" class="cw-wide">
          <mat-label i18n>Name shown on plans</mat-label>
          <input matInput formControlName="displayName" required cdkFocusInitial />
          <mat-hint i18n>A first name and initial is enough, e.g. "Sam T."</mat-hint>
          <mat-error>{{ message(form.controls.displayName, nameLabel) }}</mat-error>
        </mat-form-field>
        <mat-checkbox formControlName="goalkeeper" i18n>Goalkeeper</mat-checkbox>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close i18n>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()" data-testid="save-player">
          @if (saving()) {
            <ng-container i18n>Saving…</ng-container>
          } @else if (player) {
            <ng-container i18n="Button that saves the changed player">Save</ng-container>
          } @else {
            <ng-container i18n="Button that adds the player to the squad">Add</ng-container>
          }
        </button>
      </mat-dialog-actions>
    </form>
  `,
  styles: '.cw-wide { width: 100%; min-width: 240px; margin-top: 8px; }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlayerDialog {
  private readonly data = inject<PlayerDialogData>(MAT_DIALOG_DATA);
  private readonly playersApi = inject(PlayersApi);
  private readonly ref = inject<MatDialogRef<PlayerDialog, PlayerDto>>(MatDialogRef);
  /** The player being edited; null when adding one. */
  protected readonly player = this.data.player;
  protected readonly message = controlMessage;
  /** The name field as a refusal names it. */
  protected readonly nameLabel = $localize`Name`;
  /** True from the tap on Add or Save until the server has answered. */
  protected readonly saving = signal(false);
  private readonly addKey = new RetryKey();
  protected readonly error = signal<string | null>(null);
  protected readonly form = inject(NonNullableFormBuilder).group({
    displayName: [this.player?.displayName ?? '', [Validators.required, Validators.maxLength(40)]],
    goalkeeper: [this.player?.goalkeeper ?? false],
  });

  protected async save(): Promise<void> {
    if (this.saving()) return;
    this.saving.set(true);
    this.error.set(null);
    const value = this.form.getRawValue();
    const body = { ...value, displayName: value.displayName.trim() };
    const check = await checkAgainstSchema(this.form, this.player ? 'player-update' : 'player-create', body, {
      displayName: this.nameLabel,
    });
    if (!check.ok) {
      this.saving.set(false);
      return;
    }
    const call = this.player
      ? this.playersApi.update(this.player.id, body)
      : this.playersApi.create(this.data.teamId, body, this.addKey.for(body));
    call.subscribe({
      next: (saved) => this.ref.close(saved),
      error: (error: unknown) => {
        this.saving.set(false);
        this.error.set(showProblem(this.form, error, { displayName: this.nameLabel }));
      },
    });
  }
}
