import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import type { PlayerDto } from '../../../../../shared/types';
import { PlayersApi } from '../../../core/api/players-api';
import { problemMessage } from '../../../core/http/problem-message';

/**
 * Asks before a player is erased from Conewise, saying what goes and what stays, and does it.
 * Closes with `true` once the server has erased the player; a refusal stays in the dialog so the
 * coach can read it and retry.
 */
@Component({
  selector: 'cw-remove-player-dialog',
  imports: [MatDialogModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title i18n>Erase {{ player.displayName }} from Conewise?</h2>
    <mat-dialog-content>
      <p i18n>This takes {{ player.displayName }} out of Conewise for good.</p>
      <ul class="cw-consequences">
        <li i18n>They go off the player list, and their attendance ticks are deleted.</li>
        <li i18n>
          Old plans stay and still print. Where a plan or a station note named {{ player.displayName }}, it
          now says “Former player” and a number instead.
        </li>
        <li i18n>E-mails that name them and have not gone out yet are not sent.</li>
      </ul>
      @if (player.active) {
        <p class="cw-tip" i18n>
          <strong>Only away for a while, say injured?</strong> Switch off <em>Active</em> instead: they stay
          on the list with their record and can come back any time.
        </p>
      }
      <p i18n>You can't undo this.</p>
      @if (error(); as text) {
        <p class="cw-form-error" role="alert">{{ text }}</p>
      }
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close cdkFocusInitial i18n>
        Keep {{ player.displayName }}
      </button>
      <button
        mat-flat-button
        type="button"
        class="cw-danger"
        [disabled]="busy()"
        data-testid="confirm-remove-player"
        (click)="removePlayer()"
        i18n
      >
        Erase from Conewise
      </button>
    </mat-dialog-actions>
  `,
  styleUrl: '../../../shared/components/confirm-dialog.scss',
  styles: `
    .cw-tip {
      padding: 10px 12px;
      border-radius: 10px;
      background: var(--mat-sys-surface-container);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RemovePlayerDialog {
  private readonly playersApi = inject(PlayersApi);
  private readonly ref = inject<MatDialogRef<RemovePlayerDialog, boolean>>(MatDialogRef);
  /** The player the coach chose to remove. */
  protected readonly player = inject<PlayerDto>(MAT_DIALOG_DATA);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);

  protected removePlayer(): void {
    this.busy.set(true);
    this.error.set(null);
    this.playersApi.remove(this.player.id).subscribe({
      next: () => this.ref.close(true),
      error: (error: unknown) => {
        this.busy.set(false);
        this.error.set(problemMessage(error));
      },
    });
  }
}
