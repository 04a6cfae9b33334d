import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import {
  AbstractControl,
  FormArray,
  NonNullableFormBuilder,
  ReactiveFormsModule,
  Validators,
} from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatChipsModule } from '@angular/material/chips';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatListModule } from '@angular/material/list';
import { MatSelectModule } from '@angular/material/select';
import { MatStepperModule } from '@angular/material/stepper';
import { Router, RouterLink } from '@angular/router';
import { firstValueFrom, forkJoin } from 'rxjs';
import {
  FOCUSES,
  PLAN_KINDS,
  type Focus,
  type PlanKind,
  type PlayerDto,
  type TeamDto,
} from '../../../../shared/types';
import { PlansApi } from '../../core/api/plans-api';
import { mediaMatches } from '../../core/layout/media-query';
import { PlayersApi } from '../../core/api/players-api';
import { TeamsApi } from '../../core/api/teams-api';
import { applyFieldErrors, controlMessage } from '../../core/forms/form-errors';
import { loadApiSchema } from '../../core/forms/api-schemas';
import { schemaCheck } from '../../core/forms/schema-validator';
import { problemFieldErrors, problemMessage } from '../../core/http/problem-message';
import { RetryKey } from '../../core/http/retry-key';
import { FOCUS_LABELS, KIND_LABELS } from '../../core/labels/plan-labels';
import { isoDate } from '../../core/time/dates';
import { buildPlanRequest, wizardFieldOf, type WizardValue } from './services/plan-request-builder';
import { SpacePreset, SpacePresets } from './services/space-presets';
import { PlanHandover } from '../plans/services/plan-handover';

const count = [Validators.required, Validators.min(0), Validators.max(500)];
const metres = [Validators.required, Validators.min(5), Validators.max(130)];

/** Who is here → kit and space → time and aim → the plan. */
@Component({
  selector: 'cw-plan-wizard',
  imports: [
    ReactiveFormsModule,
    RouterLink,
    MatStepperModule,
    MatButtonModule,
    MatButtonToggleModule,
    MatCheckboxModule,
    MatChipsModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatListModule,
    MatSelectModule,
  ],
  templateUrl: './plan-wizard.html',
  styleUrl: './plan-wizard.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanWizard {
  private readonly teamsApi = inject(TeamsApi);
  private readonly playersApi = inject(PlayersApi);
  private readonly plansApi = inject(PlansApi);
  private readonly presetsService = inject(SpacePresets);
  private readonly router = inject(Router);
  private readonly handover = inject(PlanHandover);
  private readonly fb = inject(NonNullableFormBuilder);

  /** Pre-selects a team (?teamId=…). */
  readonly teamId = input<string>();
  /** Starts from a past plan's kit, space and timing (?from=planId). */
  readonly from = input<string>();

  protected readonly teams = signal<TeamDto[]>([]);
  protected readonly roster = signal<PlayerDto[]>([]);
  protected readonly presets = signal<SpacePreset[]>([]);
  protected readonly error = signal<string | null>(null);
  protected readonly sending = signal(false);
  /** The plan's Idempotency-Key, kept while the answers stay the same. */
  private readonly planKey = new RetryKey();
  /** Guests already added to the team by an earlier try, by their row in the form. */
  private readonly addedGuests = new WeakMap<AbstractControl, { teamId: string; name: string; id: string }>();
  protected readonly status = signal('');
  protected readonly kinds = PLAN_KINDS;
  protected readonly kindLabels = KIND_LABELS;
  protected readonly focuses = FOCUSES;
  protected readonly focusLabels = FOCUS_LABELS;
  protected readonly message = controlMessage;
  protected readonly narrow = mediaMatches('(max-width: 720px)');

  protected readonly form = this.fb.group({
    who: this.fb.group({
      teamId: ['', Validators.required],
      present: [[] as string[]],
      guests: this.fb.array<ReturnType<PlanWizard['guestGroup']>>([]),
      coaches: [1, [Validators.required, Validators.min(0), Validators.max(20)]],
    }),
    kit: this.fb.group({
      balls: [0, count],
      cones: [0, count],
      bibs: [0, count],
      goals: [0, count],
      width: [30, metres],
      length: [40, metres],
    }),
    time: this.fb.group({
      minutes: [20, [Validators.required, Validators.min(5), Validators.max(120)]],
      date: [isoDate(new Date())],
      kickOff: [''],
      kind: ['match-warm-up' as PlanKind, Validators.required],
      focus: [[] as Focus[]],
      temperatureC: [null as number | null],
    }),
  });

  private readonly whoValue = toSignal(this.form.controls.who.valueChanges, {
    initialValue: this.form.controls.who.getRawValue(),
  });
  protected readonly team = computed(() => this.teams().find((t) => t.id === this.whoValue().teamId) ?? null);
  protected readonly activeRoster = computed(() => this.roster().filter((p) => p.active));
  protected readonly presentCount = computed(
    () => (this.whoValue().present?.length ?? 0) + (this.whoValue().guests?.length ?? 0),
  );

  constructor() {
    this.teamsApi.list().subscribe({
      next: (teams) => {
        this.teams.set(teams);
        const wanted = this.teamId() ?? (teams.length === 1 ? teams[0].id : '');
        if (wanted) this.form.controls.who.controls.teamId.setValue(wanted);
      },
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
    this.form.controls.who.controls.teamId.valueChanges.subscribe((id) => this.loadTeam(id));
    effect(() => {
      const team = this.team();
      if (team) void this.presetsService.forAgeGroup(team.ageGroup).then((list) => this.presets.set(list));
    });
  }

  protected get guests(): FormArray {
    return this.form.controls.who.controls.guests;
  }

  private guestGroup(name = '') {
    return this.fb.group({
      name: [name, [Validators.required, Validators.maxLength(40)]],
      goalkeeper: [false],
    });
  }

  protected addGuest(): void {
    this.form.controls.who.controls.guests.push(this.guestGroup());
  }

  protected removeGuest(index: number): void {
    this.form.controls.who.controls.guests.removeAt(index);
  }

  /** Ticks the whole active roster, fills kit from the bag and the space from the team's usual one. */
  private loadTeam(id: string): void {
    if (!id) return;
    forkJoin({ players: this.playersApi.list(id), kit: this.teamsApi.kit(id) }).subscribe({
      next: ({ players, kit }) => {
        this.roster.set(players);
        this.form.controls.who.controls.present.setValue(players.filter((p) => p.active).map((p) => p.id));
        const team = this.teams().find((t) => t.id === id);
        this.form.controls.kit.patchValue({
          ...kit,
          ...(team ? { width: team.usualSpace.width, length: team.usualSpace.length } : {}),
        });
        const from = this.from();
        if (from) this.reuse(from);
      },
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  /** Starts from a past plan's kit, space, timing and aim; who is here stays today's answer. */
  private reuse(planId: string): void {
    this.plansApi.get(planId).subscribe({
      next: (past) => {
        const r = past.request;
        this.form.controls.who.controls.coaches.setValue(r.coaches);
        this.form.controls.kit.patchValue({ ...r.equipment, width: r.space.width, length: r.space.length });
        this.form.controls.time.patchValue({
          minutes: r.minutes,
          kind: r.kind,
          focus: r.focus ?? [],
          kickOff: past.kickOff ?? '',
        });
        this.status.set(`Started from the plan of ${past.date ?? 'an earlier day'}. Tick who is here today.`);
      },
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  protected tickAll(present: boolean): void {
    this.form.controls.who.controls.present.setValue(present ? this.activeRoster().map((p) => p.id) : []);
  }

  protected usePreset(preset: SpacePreset): void {
    this.form.controls.kit.patchValue({ width: preset.space.width, length: preset.space.length });
    this.status.set(`Space set to ${preset.label}: ${preset.space.width} by ${preset.space.length} metres.`);
  }

  protected toggleFocus(focus: Focus): void {
    const control = this.form.controls.time.controls.focus;
    const current = control.value;
    control.setValue(current.includes(focus) ? current.filter((f) => f !== focus) : [...current, focus]);
  }

  /** Checks the request against the engine's schema, then asks the server for the plan. */
  protected async makePlan(): Promise<void> {
    // A second tap while the first is under way (the schema check below waits) makes nothing.
    if (this.sending()) return;
    this.error.set(null);
    this.form.markAllAsTouched();
    const team = this.team();
    if (!team || this.form.invalid) {
      this.error.set(team ? 'Some answers need a look: see the marked fields.' : 'Choose a team first.');
      return;
    }
    const raw = this.form.getRawValue();
    const value: WizardValue = { ...raw.who, ...raw.kit, ...raw.time };
    const request = buildPlanRequest(team, this.roster(), value);
    if (request.players.length === 0) {
      this.form.controls.who.controls.present.setErrors({ message: 'Tick at least one player who is here.' });
      this.error.set('Tick at least one player who is here.');
      return;
    }
    this.sending.set(true);
    const schema = await loadApiSchema('plan-request');
    if (schema) {
      const errors = (await schemaCheck(schema))(request);
      if (Object.keys(errors).length) {
        this.sending.set(false);
        this.showFieldErrors(errors);
        return;
      }
    }
    this.status.set('Making the plan…');
    let guestIds: string[];
    try {
      guestIds = await this.registerGuests(team.id, value.guests);
    } catch (error: unknown) {
      this.sending.set(false);
      this.status.set('');
      this.error.set(problemMessage(error));
      return;
    }
    const body = {
      teamId: team.id,
      request: buildPlanRequest(team, this.roster(), value, guestIds),
      date: raw.time.date || undefined,
      kickOff: raw.time.kickOff || undefined,
    };
    this.plansApi.create(body, this.planKey.for(body)).subscribe({
      next: (saved) => {
        this.handover.give(saved);
        void this.router.navigate(['/plans', saved.id]);
      },
      error: (error: unknown) => {
        this.sending.set(false);
        this.status.set('');
        const fields = problemFieldErrors(error);
        this.showFieldErrors(fields);
        this.error.set(problemMessage(error));
      },
    });
  }

  /**
   * The server plans only with the team's own players, so a guest joins the team's list as
   * not active: they appear in this plan and in attendance, but are not ticked next time.
   */
  private async registerGuests(teamId: string, guests: WizardValue['guests']): Promise<string[]> {
    const ids: string[] = [];
    for (const [i, guest] of guests.entries()) {
      const body = { displayName: guest.name.trim(), goalkeeper: guest.goalkeeper };
      // A guest added before a plan that then failed is used again, not added a second time.
      const row = this.guests.at(i);
      const earlier = this.addedGuests.get(row);
      if (earlier && earlier.teamId === teamId && earlier.name === body.displayName) {
        ids.push(earlier.id);
        continue;
      }
      const created = await firstValueFrom(this.playersApi.create(teamId, body));
      await firstValueFrom(this.playersApi.update(created.id, { active: false }));
      this.addedGuests.set(row, { teamId, name: body.displayName, id: created.id });
      ids.push(created.id);
    }
    return ids;
  }

  private showFieldErrors(errors: Record<string, string>): void {
    const mapped: Record<string, string> = {};
    for (const [path, text] of Object.entries(errors)) {
      mapped[
        wizardFieldOf(
          path
            .replace(/^\//, '')
            .replace(/\//g, '.')
            .replace(/^request\./, ''),
        )
      ] = text;
    }
    const unmatched = applyFieldErrors(this.form, mapped);
    this.error.set(['Some answers need a look.', ...unmatched].join(' '));
  }
}
