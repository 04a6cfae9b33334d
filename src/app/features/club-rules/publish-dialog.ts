import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule } from '@angular/material/dialog';
import type { RuleSetReachDto } from '../../../../shared/types/rule-set-api';
import { problemMessage } from '../../core/http/problem-message';
import { RuleSetsApi } from '../../core/api/rule-sets-api';

/** What the dialog is asked about: the draft's version number. */
export interface PublishDialogData {
  version: number;
}

/** The dialog's sentence for who the published rules reach. */
export function reachWords(reach: RuleSetReachDto): string {
  if (reach.teams === 0)
    return $localize`No team plans from the club’s rules yet: publishing sets the rules for every plan made from now on.`;
  const teams = reach.teams === 1 ? $localize`1 team` : $localize`${reach.teams}:count: teams`;
  if (!reach.coaches)
    return $localize`:Then 1 team or 7 teams:Publishing changes the plans every coach makes from now on for ${teams}:teams:.`;
  const coaches = reach.coaches === 1 ? $localize`1 coach` : $localize`${reach.coaches}:count: coaches`;
  return $localize`:Then 1 team or 7 teams, and 1 coach or 12 coaches:Publishing changes the plans every coach makes from now on for ${teams}:teams: (${coaches}:coaches: on their staff).`;
}

/**
 * Asks before a draft becomes the club's rules, saying how many teams and coaches it reaches (the
 * server counts them). Closes with true when the head of coaching confirms; publishing is the page's.
 */
@Component({
  selector: 'cw-publish-dialog',
  imports: [MatDialogModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title i18n>Publish version {{ data.version }}?</h2>
    <mat-dialog-content data-testid="publish-reach">
      @if (reach(); as r) {
        <p>{{ words(r) }}</p>
      } @else if (error(); as text) {
        <p class="cw-form-error" role="alert" i18n>Conewise could not count the teams: {{ text }}</p>
      } @else {
        <p i18n>Counting the teams that plan from the club’s rules…</p>
      }
      <p i18n>Plans already made keep their rules.</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button
        mat-button
        type="button"
        [mat-dialog-close]="false"
        cdkFocusInitial
        i18n="Button closing the dialog without publishing"
      >
        Not yet
      </button>
      <button
        mat-flat-button
        type="button"
        [mat-dialog-close]="true"
        data-testid="confirm-publish"
        i18n="Button making the draft the rules coaches' new plans use"
      >
        Publish
      </button>
    </mat-dialog-actions>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PublishDialog {
  protected readonly data = inject<PublishDialogData>(MAT_DIALOG_DATA);
  protected readonly reach = signal<RuleSetReachDto | null>(null);
  protected readonly error = signal<string | null>(null);
  protected readonly words = reachWords;

  constructor() {
    inject(RuleSetsApi)
      .reach()
      .subscribe({
        next: (reach) => this.reach.set(reach),
        error: (error: unknown) => this.error.set(problemMessage(error)),
      });
  }
}
