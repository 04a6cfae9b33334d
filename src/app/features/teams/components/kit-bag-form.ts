import { ChangeDetectionStrategy, Component, effect, inject, input, output } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { KitBagDto } from '../../../../../shared/types';
import { controlMessage } from '../../../core/forms/form-errors';
import { checkAgainstSchema } from '../../../core/forms/schema-form';

export const KIT_LABELS = {
  balls: $localize`Balls`,
  cones: $localize`Cones`,
  bibs: $localize`:Coloured vests players wear to show their side:Bibs`,
  goals: $localize`Small goals`,
};

/** What is in the team's kit bag, as a form or, for those who may not change it, as plain figures. */
@Component({
  selector: 'cw-kit-bag-form',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatButtonModule],
  template: `
    @if (editable()) {
      <form [formGroup]="form" (ngSubmit)="submit()" novalidate class="cw-kit">
        @for (key of keys; track key) {
          <mat-form-field appearance="outline">
            <mat-label>{{ labels[key] }}</mat-label>
            <input matInput type="number" inputmode="numeric" min="0" [formControlName]="key" />
            <mat-error>{{ message(form.controls[key], labels[key]) }}</mat-error>
          </mat-form-field>
        }
        <div><button mat-flat-button type="submit" i18n>Save kit bag</button></div>
      </form>
    } @else {
      <dl class="cw-facts">
        @for (key of keys; track key) {
          <div>
            <dt>{{ labels[key] }}</dt>
            <dd>{{ kit()?.[key] ?? '…' }}</dd>
          </div>
        }
      </dl>
    }
  `,
  styleUrl: './read-only-facts.scss',
  styles:
    '.cw-kit { display: grid; gap: 0 12px; grid-template-columns: repeat(auto-fit, minmax(140px, 1fr)); }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class KitBagForm {
  readonly kit = input<KitBagDto | null>(null);
  /** False shows the figures without a form: the member may not change this team. */
  readonly editable = input(true);
  readonly save = output<KitBagDto>();

  protected readonly keys = ['balls', 'cones', 'bibs', 'goals'] as const;
  protected readonly labels = KIT_LABELS;
  protected readonly message = controlMessage;
  private readonly count = [Validators.required, Validators.min(0), Validators.max(500)];
  protected readonly form = inject(NonNullableFormBuilder).group({
    balls: [0, this.count],
    cones: [0, this.count],
    bibs: [0, this.count],
    goals: [0, this.count],
  });

  constructor() {
    effect(() => {
      const kit = this.kit();
      if (kit) this.form.reset(kit);
    });
  }

  protected async submit(): Promise<void> {
    const value = this.form.getRawValue();
    const check = await checkAgainstSchema(this.form, 'kit-bag', value, KIT_LABELS);
    if (check.ok) this.save.emit(value);
  }
}
