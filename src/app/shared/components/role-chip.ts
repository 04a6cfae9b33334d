import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { ROLE_LABELS, type Role } from '../../../../shared/types';

/** A member's role as a small coloured label, the same on the members and team pages. */
@Component({
  selector: 'cw-role-chip',
  template: `{{ labels[role()] }}`,
  host: { '[attr.data-role]': 'role()' },
  styles: `
    :host {
      display: inline-block;
      padding: 2px 10px;
      border-radius: 999px 4px 999px 4px;
      font-size: 0.8rem;
      font-weight: 700;
      letter-spacing: 0.03em;
      text-transform: uppercase;
      white-space: nowrap;
      background: var(--mat-sys-secondary-container);
      color: var(--mat-sys-on-secondary-container);
    }
    :host([data-role='lead']) {
      background: var(--mat-sys-tertiary-container);
      color: var(--mat-sys-on-tertiary-container);
    }
    :host([data-role='assistant']) {
      background: var(--mat-sys-surface-container-highest);
      color: var(--mat-sys-on-surface);
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RoleChip {
  /** The role to show. */
  readonly role = input.required<Role>();
  protected readonly labels = ROLE_LABELS;
}
