import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import type { InstantSave } from '../../core/forms/instant-save';

/**
 * The line under a setting saved at once: "Saved for the club." once the server has taken it, or
 * the refusal in words, announced to screen readers as it changes.
 */
@Component({
  selector: 'cw-save-status',
  template: `
    <div aria-live="polite">
      @if (setting().saved()) {
        <p role="status" class="cw-muted" [attr.data-testid]="testId()" i18n>Saved for the club.</p>
      }
      @if (setting().error(); as text) {
        <p class="cw-form-error" role="alert">{{ text }}</p>
      }
    </div>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SaveStatus {
  readonly setting = input.required<Pick<InstantSave<unknown>, 'saved' | 'error'>>();
  /** The data-testid of the "saved" line. */
  readonly testId = input.required<string>();
}
