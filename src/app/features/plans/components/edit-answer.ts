import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { ICONS } from '../../../core/icons/shipped-icon';

/** What a refused or failed edit says, shown beside the control that was tapped. */
export interface EditAnswerLines {
  kind: 'refused' | 'problems' | 'not-saved';
  lines: string[];
}

/** The answer to an edit in plain words, announced to screen readers, never printed. */
@Component({
  selector: 'cw-edit-answer',
  imports: [...ICONS],
  template: `
    <div
      class="cw-edit-answer cw-no-print"
      [class.cw-edit-answer--problem]="answer().kind !== 'refused'"
      role="status"
      data-testid="edit-feedback"
    >
      <mat-icon [svgIcon]="answer().kind === 'refused' ? 'block' : 'error'" aria-hidden="true" />
      <ul>
        @for (line of answer().lines; track line) {
          <li>{{ line }}</li>
        }
      </ul>
    </div>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EditAnswer {
  readonly answer = input.required<EditAnswerLines>();
}
