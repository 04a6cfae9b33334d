import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import {
  AbstractControl,
  FormControl,
  FormGroup,
  ReactiveFormsModule,
  ValidationErrors,
} from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { TeamDto } from '../../../../../shared/types';
import { TeamsApi } from '../../../core/api/teams-api';
import { problemMessage } from '../../../core/http/problem-message';

/** What the delete-team dialog is told: the team and how many players (active or not) it has. */
export interface DeleteTeamData {
  team: TeamDto;
  playerCount: number;
}

/** Spaces and letter case do not count when the name is typed back. */
function sameName(typed: string, name: string): boolean {
  const plain = (text: string) => text.trim().replace(/\s+/g, ' ').toLocaleLowerCase();
  return plain(typed) === plain(name);
}

/**
 * Deletes a team once the lead or one of its coaches has typed its name, saying first everything
 * that goes with it.
 * Closes with `true` once the server has deleted it; a refusal stays in the dialog, typed name kept.
 */
@Component({
  selector: 'cw-delete-team-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule],
  template: `
    <form [formGroup]="form" (ngSubmit)="deleteTeam()" novalidate>
      <!-- Title and content side by side, so the dialog's spacing between them still applies. -->
      <h2 mat-dialog-title i18n>Delete {{ data.team.name }}?</h2>
      <mat-dialog-content>
        <p i18n>This deletes the team for everyone in the club, together with:</p>
        <ul class="cw-consequences">
          @if (playersText; as text) {
            <li>{{ text }}</li>
          }
          <li i18n>all its plans, with their attendance and station feedback</li>
          <li i18n>its kit bag</li>
        </ul>
        <p i18n>Its coaches and assistants stay in the club. You can't undo this.</p>
        @if (error(); as text) {
          <p class="cw-form-error" role="alert">{{ text }}</p>
        }
        <mat-form-field appearance="outline" class="cw-wide">
          <mat-label i18n>Type the team name to confirm</mat-label>
          <input
            matInput
            [formControl]="typedName"
            autocomplete="off"
            autocapitalize="off"
            spellcheck="false"
            cdkFocusInitial
            data-testid="delete-team-name"
          />
          <mat-hint i18n="What to type: the team's name">Type: {{ data.team.name }}</mat-hint>
          <mat-error i18n>Type {{ data.team.name }} to confirm.</mat-error>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close i18n>Keep team</button>
        <button
          mat-flat-button
          type="submit"
          class="cw-danger"
          [disabled]="busy()"
          data-testid="confirm-delete-team"
          i18n
        >
          Delete team
        </button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: '../../../shared/components/confirm-dialog.scss',
  styles: `
    .cw-wide {
      width: 100%;
      margin-top: 8px;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DeleteTeamDialog {
  private readonly teamsApi = inject(TeamsApi);
  private readonly ref = inject<MatDialogRef<DeleteTeamDialog, boolean>>(MatDialogRef);
  /** The team to delete and the size of its squad. */
  protected readonly data = inject<DeleteTeamData>(MAT_DIALOG_DATA);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly typedName = new FormControl('', {
    nonNullable: true,
    validators: (control: AbstractControl): ValidationErrors | null =>
      sameName(String(control.value ?? ''), this.data.team.name) ? null : { mismatch: true },
  });
  protected readonly playersText =
    this.data.playerCount === 0
      ? null
      : this.data.playerCount === 1
        ? $localize`:Goes with the deleted team:its 1 player`
        : $localize`:Goes with the deleted team:its ${this.data.playerCount}:count: players`;
  protected readonly form = new FormGroup({ typedName: this.typedName });

  protected deleteTeam(): void {
    if (this.busy()) return;
    if (this.typedName.invalid) {
      this.typedName.markAsTouched();
      return;
    }
    this.busy.set(true);
    this.error.set(null);
    this.teamsApi.remove(this.data.team.id).subscribe({
      next: () => this.ref.close(true),
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }
}
