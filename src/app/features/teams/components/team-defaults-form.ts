import { ChangeDetectionStrategy, Component, effect, inject, input, output, signal } from '@angular/core';
import {
  NonNullableFormBuilder,
  ReactiveFormsModule,
  Validators,
  type AbstractControl,
} from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { AGE_GROUPS, LEVELS, type AgeGroup, type Level, type TeamDto } from '../../../../../shared/types';
import {
  distanceLimitsIn,
  distanceSymbol,
  formatSize,
  metresFrom,
  wholeDistance,
} from '../../../../../shared/units';
import type { TeamBody } from '../../../core/api/teams-api';
import { applyFieldErrors, controlMessage } from '../../../core/forms/form-errors';
import { schemaNumberValidators } from '../../../core/forms/schema-limits';
import { checkAgainstSchema } from '../../../core/forms/schema-form';
import { UnitChoice } from '../../../core/units/unit-choice';
import { LEVEL_LABELS } from '../../../core/labels/plan-labels';
import { AgeGroupLabelPipe } from '../../../shared/pipes/age-group-label';

/** Field names in the words a refusal uses ("Team name is needed."). */
const LABELS = {
  name: $localize`Team name`,
  'usualSpace.width': $localize`Usual space width`,
  'usualSpace.length': $localize`Usual space length`,
};
/** The two space fields' own names, under each field. */
const SPACE_LABELS = {
  width: $localize`:Width of the usual space:Width`,
  length: $localize`:Length of the usual space:Length`,
};

/** The team's name, age group, level and the space it usually trains on: a form, or plain values. */
@Component({
  selector: 'cw-team-defaults-form',
  imports: [
    AgeGroupLabelPipe,
    ReactiveFormsModule,
    MatFormFieldModule,
    MatInputModule,
    MatSelectModule,
    MatButtonModule,
  ],
  templateUrl: './team-defaults-form.html',
  styleUrl: './read-only-facts.scss',
  styles: `
    .cw-defaults {
      display: grid;
      gap: 4px 12px;
      grid-template-columns: repeat(auto-fit, minmax(160px, 1fr));
    }
    .cw-defaults__actions {
      display: flex;
      gap: 8px;
      align-items: center;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TeamDefaultsForm {
  readonly team = input<TeamDto | null>(null);
  /** False shows the values without a form: the member may not change this team. */
  readonly editable = input(true);
  /** Words on the submit button: "Save team details" on the team page, "Create team" when adding one. */
  readonly submitLabel = input($localize`Save team details`);
  /** The server schema the value must meet: creating a team asks for more than updating one. */
  readonly schemaName = input<'team-update' | 'team-create'>('team-update');
  /** Whether to offer a Cancel button (adding a team), which emits `dismiss`. */
  readonly cancelable = input(false);
  /** Field messages from a refused save, pinned to their inputs. */
  readonly serverErrors = input<Record<string, string>>({});
  /** True while the parent's save is under way: the button is off and says so. */
  readonly pending = input(false);
  readonly save = output<TeamBody>();
  readonly dismiss = output<void>();

  protected readonly ageGroups = AGE_GROUPS;
  protected readonly levels = LEVELS;
  protected readonly levelLabels = LEVEL_LABELS;
  protected readonly message = controlMessage;
  protected readonly labels = LABELS;
  protected readonly spaceLabels = SPACE_LABELS;
  /** True while the value is checked against the schema, before `save` is emitted. */
  protected readonly checking = signal(false);
  /** The person's distance unit: the usual space is typed and shown in it, and kept in metres. */
  private readonly unit = inject(UnitChoice).distance();
  protected readonly unitSymbol = distanceSymbol(this.unit);
  protected readonly sizeText = (space: { width: number; length: number }) => formatSize(this.unit, space);
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', Validators.required],
    ageGroup: ['U10' as AgeGroup],
    level: ['beginner' as Level],
    usualSpace: inject(NonNullableFormBuilder).group({
      width: [this.inUnit(30), Validators.required],
      length: [this.inUnit(40), Validators.required],
    }),
  });

  constructor() {
    effect(() => {
      const team = this.team();
      if (!team) return;
      const { width, length } = team.usualSpace;
      this.form.reset({ ...team, usualSpace: { width: this.inUnit(width), length: this.inUnit(length) } });
    });
    effect(() => applyFieldErrors(this.form, this.serverErrors()));
    void this.loadLimits();
  }

  /** The schema's limits for a space (metres), converted to the person's unit, on both fields. */
  private async loadLimits(): Promise<void> {
    const common = (await import('../../../../../shared/schemas/api/common.schema.json')).default;
    const inUnit = (limits: Parameters<typeof distanceLimitsIn>[1]) => distanceLimitsIn(this.unit, limits);
    const { width, length } = this.form.controls.usualSpace.controls;
    for (const control of [width, length] as AbstractControl[]) {
      control.addValidators(schemaNumberValidators(common, '/definitions/metres', inUnit));
      control.updateValueAndValidity({ emitEvent: false });
    }
  }

  /** Metres as typed in the person's unit: whole yards, metres as they are. */
  private inUnit(metres: number): number {
    return this.unit === 'metres' ? metres : wholeDistance(this.unit, metres);
  }

  protected async submit(): Promise<void> {
    if (this.pending() || this.checking()) return;
    this.checking.set(true);
    try {
      const typed = this.form.getRawValue();
      const value = {
        ...typed,
        usualSpace: {
          width: metresFrom(this.unit, typed.usualSpace.width),
          length: metresFrom(this.unit, typed.usualSpace.length),
        },
      };
      const check = await checkAgainstSchema(this.form, this.schemaName(), value, LABELS);
      if (check.ok) this.save.emit(value);
    } finally {
      this.checking.set(false);
    }
  }
}
