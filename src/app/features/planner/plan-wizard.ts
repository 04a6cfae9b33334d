import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  ElementRef,
  inject,
  input,
  signal,
  viewChild,
} from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import {
  AbstractControl,
  FormArray,
  FormGroup,
  NonNullableFormBuilder,
  ReactiveFormsModule,
  ValidationErrors,
  ValidatorFn,
  Validators,
} from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatChipsModule } from '@angular/material/chips';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatListModule } from '@angular/material/list';
import { MatSelectModule } from '@angular/material/select';
import { MatStepper, MatStepperIntl, MatStepperModule } from '@angular/material/stepper';
import { Router, RouterLink } from '@angular/router';
import { firstValueFrom, forkJoin } from 'rxjs';
import {
  FOCUSES,
  PLAN_KIND_OF,
  PLAN_KINDS,
  type Focus,
  type PlanKind,
  type PlayerDto,
  type TeamDto,
} from '../../../../shared/types';
import { PlansApi } from '../../core/api/plans-api';
import { ScheduleApi } from '../../core/api/schedule-api';
import { ICONS } from '../../core/icons/shipped-icon';
import { mediaMatches } from '../../core/layout/media-query';
import { PlayersApi } from '../../core/api/players-api';
import { TeamsApi } from '../../core/api/teams-api';
import { applyFieldErrors, controlMessage } from '../../core/forms/form-errors';
import { loadApiSchema } from '../../core/forms/api-schemas';
import { NumberField } from '../../core/forms/number-field';
import { schemaNumberValidators } from '../../core/forms/schema-limits';
import { schemaCheck, type SchemaCheck } from '../../core/forms/schema-validator';
import { problemFieldErrors, problemMessage } from '../../core/http/problem-message';
import { RetryKey } from '../../core/http/retry-key';
import { FOCUS_LABELS, KIND_LABELS } from '../../core/labels/plan-labels';
import { SCHEDULE_KIND_LABELS, sessionDay } from '../../core/labels/schedule-labels';
import { dayWords, timeWords } from '../../core/locale/locale-format';
import { isoDate } from '../../core/time/dates';
import { GIVEN_TIME_LABELS } from '../../../../shared/time/session-clock';
import { buildPlanRequest, wizardFieldOf, type WizardValue } from './services/plan-request-builder';
import { SpacePreset, SpacePresets } from './services/space-presets';
import { PlanHandover } from '../plans/services/plan-handover';
import { UnitChoice } from '../../core/units/unit-choice';
import {
  distanceLimitsIn,
  distanceSymbol,
  distanceUnitName,
  temperatureLimitsIn,
  temperatureSymbol,
  wholeDistance,
  type NumberLimits,
} from '../../../../shared/units';
import { AgeGroupLabelPipe } from '../../shared/pipes/age-group-label';

/** The wizard's steps, in order, as named in its form. */
type Step = 'who' | 'kit' | 'time';
const STEPS: Step[] = ['who', 'kit', 'time'];

/** Where each number field's limits live in the plan request's schema (the API's own limits). */
const LIMITS: Record<string, string> = {
  'who.coaches': '/properties/coaches',
  'kit.balls': '/properties/equipment/properties/balls',
  'kit.cones': '/properties/equipment/properties/cones',
  'kit.bibs': '/properties/equipment/properties/bibs',
  'kit.goals': '/properties/equipment/properties/goals',
  'kit.width': '/properties/space/properties/width',
  'kit.length': '/properties/space/properties/length',
  'time.minutes': '/properties/minutes',
  'time.temperature': '/properties/conditions/properties/temperatureC',
};

/** The fields typed in the coach's units, whose schema limits (metres, °C) are converted. */
const IN_UNITS: Record<string, 'distance' | 'temperature'> = {
  'kit.width': 'distance',
  'kit.length': 'distance',
  'time.temperature': 'temperature',
};

/** The names the fields go by in messages, as on their labels. */
const FIELD_LABELS = {
  teamId: $localize`:Field name in messages:Team`,
  present: $localize`:Field name in messages:Players`,
  guestName: $localize`:Field name in messages:Guest name`,
  coaches: $localize`:Field name in messages, for the adults helping:Adults`,
  balls: $localize`:Field name in messages:Balls`,
  cones: $localize`:Field name in messages:Cones`,
  bibs: $localize`:Field name in messages:Bibs`,
  goals: $localize`:Field name in messages:Goals`,
  width: $localize`:Field name in messages:Width`,
  length: $localize`:Field name in messages:Length`,
  minutes: $localize`:Field name in messages:Minutes`,
  temperature: $localize`:Field name in messages:Temperature`,
};

/** Someone must be there to plan for: a ticked player or a guest. */
const somebodyHere: ValidatorFn = (group: AbstractControl): ValidationErrors | null => {
  const value = (group as FormGroup).getRawValue() as { present: string[]; guests: unknown[] };
  return value.present.length + value.guests.length > 0 ? null : { nobodyHere: true };
};

/** An adult runs the session; the coach counts. */
const someAdult: ValidatorFn = (control) =>
  typeof control.value === 'number' && control.value < 1
    ? { message: $localize`Count at least one adult: you, the coach, count.` }
    : null;

/** Who is here → kit and space → time and aim → the plan. */
@Component({
  selector: 'cw-plan-wizard',
  imports: [
    AgeGroupLabelPipe,
    ReactiveFormsModule,
    RouterLink,
    MatStepperModule,
    MatButtonModule,
    MatButtonToggleModule,
    MatCheckboxModule,
    MatChipsModule,
    MatFormFieldModule,
    ...ICONS,
    MatInputModule,
    MatListModule,
    MatSelectModule,
    NumberField,
  ],
  templateUrl: './plan-wizard.html',
  styleUrl: './plan-wizard.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PlanWizard {
  private readonly teamsApi = inject(TeamsApi);
  private readonly playersApi = inject(PlayersApi);
  private readonly plansApi = inject(PlansApi);
  private readonly scheduleApi = inject(ScheduleApi);
  private readonly presetsService = inject(SpacePresets);
  /** The units the coach reads and types (theirs, else the club's); the request is metric. */
  protected readonly units = inject(UnitChoice).units();
  protected readonly distanceSymbol = distanceSymbol(this.units.distance);
  protected readonly distanceName = distanceUnitName(this.units.distance);
  protected readonly temperatureSymbol = temperatureSymbol(this.units.temperature);
  private readonly router = inject(Router);
  private readonly handover = inject(PlanHandover);
  private readonly fb = inject(NonNullableFormBuilder);
  /** The words the stepper says for a finished step, for the mark that replaces its own. */
  protected readonly stepperWords = inject(MatStepperIntl);

  /** Pre-selects a team (?teamId=…). */
  readonly teamId = input<string>();
  /** Starts from a past plan's kit, space and timing (?from=planId). */
  readonly from = input<string>();
  /** Plans a scheduled session (?session=id): its team, day, kick-off, kind and minutes. */
  readonly session = input<string>();
  /** The scheduled session this plan is for, in words, once read. */
  protected readonly fromSession = signal<string | null>(null);
  private scheduledSessionId: string | undefined;

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
  /** "Kick-off" for a match warm-up (the plan ends there), "Start time" for a training session. */
  protected readonly givenTimeLabels = GIVEN_TIME_LABELS;
  protected readonly focuses = FOCUSES;
  protected readonly focusLabels = FOCUS_LABELS;
  protected readonly message = controlMessage;
  protected readonly fieldLabels = FIELD_LABELS;
  protected readonly narrow = mediaMatches('(max-width: 720px)');
  private readonly stepper = viewChild.required(MatStepper);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef).nativeElement;
  /** The step whose "Next" found something to fix, and what (shown by its buttons). */
  protected readonly stepProblem = signal<{ step: Step; text: string } | null>(null);
  /** Checks a guest's name with the rules for a player's name (null until loaded). */
  private guestName: SchemaCheck | null = null;
  /** The request schema's limits on every number field, and the player-name rule, once loaded. */
  private readonly rulesReady: Promise<void> = this.loadRules();

  protected readonly form = this.fb.group({
    who: this.fb.group(
      {
        teamId: ['', Validators.required],
        present: [[] as string[]],
        guests: this.fb.array<ReturnType<PlanWizard['guestGroup']>>([]),
        coaches: [1, [Validators.required, someAdult]],
      },
      { validators: somebodyHere },
    ),
    kit: this.fb.group({
      balls: [0, Validators.required],
      cones: [0, Validators.required],
      bibs: [0, Validators.required],
      goals: [0, Validators.required],
      width: [30, Validators.required],
      length: [40, Validators.required],
    }),
    time: this.fb.group({
      minutes: [20, Validators.required],
      date: [isoDate(new Date())],
      kickOff: [''],
      kind: ['match-warm-up' as PlanKind, Validators.required],
      focus: [[] as Focus[]],
      temperature: [null as number | null],
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
  private readonly temperature = toSignal(this.form.controls.time.controls.temperature.valueChanges, {
    initialValue: null,
  });
  /** A safety line for a hot or cold day, whatever the figure: the coach judges the weather. */
  protected readonly weatherNote = computed(() => {
    const t = this.temperature();
    return typeof t === 'number' && !Number.isNaN(t);
  });

  constructor() {
    this.teamsApi.list().subscribe({
      next: (teams) => {
        this.teams.set(teams);
        const session = this.session();
        if (session) return this.startFromSession(session);
        const wanted = this.teamId() ?? (teams.length === 1 ? teams[0].id : '');
        if (wanted) this.form.controls.who.controls.teamId.setValue(wanted);
      },
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
    this.form.controls.who.controls.teamId.valueChanges.subscribe((id) => this.loadTeam(id));
    effect(() => {
      const team = this.team();
      if (team)
        void this.presetsService
          .forAgeGroup(team.ageGroup, this.units.distance)
          .then((list) => this.presets.set(list));
    });
  }

  protected get guests(): FormArray {
    return this.form.controls.who.controls.guests;
  }

  private guestGroup(name = '') {
    return this.fb.group({
      name: [name, [Validators.required, (c: AbstractControl) => this.checkGuestName(c)]],
      goalkeeper: [false],
    });
  }

  /** A guest's name follows the rules for a player's name (the API's own, from its schema). */
  private checkGuestName(control: AbstractControl): ValidationErrors | null {
    const text = String(control.value ?? '').trim();
    const problem = this.guestName?.({ displayName: text })['displayName'];
    return problem ? { message: problem } : null;
  }

  /** Puts the request schema's limits on the number fields and loads the player-name rule. */
  private async loadRules(): Promise<void> {
    const [request, player] = await Promise.all([
      loadApiSchema('plan-request'),
      loadApiSchema('player-create'),
    ]);
    if (request) {
      for (const [path, pointer] of Object.entries(LIMITS)) {
        const control = this.form.get(path)!;
        control.addValidators(schemaNumberValidators(request, pointer, this.limitsInUnits(path)));
        control.updateValueAndValidity({ emitEvent: false });
      }
    }
    if (player) {
      this.guestName = await schemaCheck(player, { displayName: FIELD_LABELS.guestName });
      for (const guest of this.guests.controls)
        guest.get('name')!.updateValueAndValidity({ emitEvent: false });
    }
  }

  /**
   * "Next": checks this step's answers (the form's rules and the request schema) and moves on
   * only when they hold; otherwise says what to fix under each field and by the button.
   */
  protected async next(step: Step): Promise<void> {
    await this.rulesReady;
    const group = this.form.controls[step];
    group.markAllAsTouched();
    group.updateValueAndValidity();
    await this.pinSchemaErrors(step);
    if (group.invalid) {
      this.stepProblem.set({ step, text: this.problemWords(step) });
      this.focusFirstProblem();
      return;
    }
    this.stepProblem.set(null);
    this.stepper().next();
  }

  /**
   * The request schema's last word on a step the form's own rules pass (those rules already carry
   * the schema's number limits): anything else it refuses is pinned to its field.
   */
  private async pinSchemaErrors(step: Step): Promise<void> {
    const team = this.team();
    const schema = await loadApiSchema('plan-request');
    if (!team || !schema || this.form.controls[step].invalid) return;
    const raw = this.form.getRawValue();
    const request = buildPlanRequest(
      team,
      this.roster(),
      { ...raw.who, ...raw.kit, ...raw.time },
      this.units,
    );
    const errors = (await schemaCheck(schema))(request);
    const mine: Record<string, string> = {};
    for (const [path, text] of Object.entries(errors)) {
      const field = wizardFieldOf(path);
      if (field.startsWith(`${step}.`)) mine[field] = text;
    }
    applyFieldErrors(this.form, mine);
  }

  /** What stops this step, said by its "Next" button: the first field's message and how many more. */
  private problemWords(step: Step): string {
    if (step === 'who' && this.form.controls.who.hasError('nobodyHere')) {
      return $localize`Tick at least one player who is here, or add a guest.`;
    }
    const group = this.form.controls[step] as FormGroup;
    const messages: string[] = [];
    for (const [name, control] of Object.entries(group.controls)) {
      if (control instanceof FormArray) {
        control.controls.forEach((guest, i) => {
          const text = this.message(guest.get('name'), $localize`Guest ${i + 1}:number: name`);
          if (text) messages.push(text);
        });
      } else {
        const text = this.message(control, (FIELD_LABELS as Record<string, string>)[name] ?? name);
        if (text) messages.push(text);
      }
    }
    if (!messages.length) return $localize`Something on this step needs a look.`;
    const more = messages.length - 1;
    return more
      ? $localize`${messages[0]}:firstProblem: (and ${more}:count: more on this step)`
      : messages[0];
  }

  /** Puts the cursor in the first field with a problem, so a phone scrolls to it. */
  private focusFirstProblem(): void {
    setTimeout(() => {
      const field = this.host.querySelector<HTMLElement>(
        '.mat-mdc-step-content input.ng-invalid, .mat-horizontal-stepper-content-current input.ng-invalid, [data-testid="no-players"]',
      );
      field?.focus();
      field?.scrollIntoView?.({ block: 'center' });
    });
  }

  protected addGuest(): void {
    this.form.controls.who.controls.guests.push(this.guestGroup());
  }

  /** The name a screen reader gives a guest's remove button: "Remove guest 2". */
  protected removeGuestLabel(index: number): string {
    return $localize`:Button that removes the first, second… guest:Remove guest ${index + 1}:number:`;
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
          ...(team ? this.spaceInUnits(team.usualSpace) : {}),
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
        this.form.controls.kit.patchValue({ ...r.equipment, ...this.spaceInUnits(r.space) });
        this.form.controls.time.patchValue({
          minutes: r.minutes,
          kind: r.kind,
          focus: r.focus ?? [],
          kickOff: past.kickOff ?? '',
        });
        this.status.set(
          past.date
            ? $localize`Started from the plan of ${dayWords(past.date, 'long-day')}:day:. Tick who is here today.`
            : $localize`Started from the plan of an earlier day. Tick who is here today.`,
        );
      },
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  /** Fills in the team and the time step from a session on the team's schedule. */
  private startFromSession(id: string): void {
    this.scheduleApi.get(id).subscribe({
      next: (s) => {
        this.scheduledSessionId = s.id;
        this.form.controls.who.controls.teamId.setValue(s.teamId);
        this.form.controls.time.patchValue({
          date: s.date,
          kickOff: s.startTime,
          kind: PLAN_KIND_OF[s.kind],
          minutes: s.minutes,
        });
        const words = [
          `${s.teamName}: ${SCHEDULE_KIND_LABELS[s.kind].toLowerCase()}`,
          sessionDay(s.date),
          timeWords(s.startTime),
          s.place,
        ]
          .filter(Boolean)
          .join(' · ');
        this.fromSession.set(words);
        this.status.set($localize`Planning from the schedule: ${words}:session:.`);
      },
      error: (error: unknown) => this.error.set(problemMessage(error)),
    });
  }

  /** A field's schema limits in the coach's unit (the schema's own for unitless fields). */
  private limitsInUnits(path: string): ((limits: NumberLimits) => NumberLimits) | undefined {
    const quantity = IN_UNITS[path];
    if (quantity === 'distance') return (limits) => distanceLimitsIn(this.units.distance, limits);
    if (quantity === 'temperature') return (limits) => temperatureLimitsIn(this.units.temperature, limits);
    return undefined;
  }

  /** A space in metres in the coach's unit (whole yards; metres as they are), for the width and length fields. */
  private spaceInUnits(space: { width: number; length: number }): { width: number; length: number } {
    if (this.units.distance === 'metres') return { width: space.width, length: space.length };
    return {
      width: wholeDistance(this.units.distance, space.width),
      length: wholeDistance(this.units.distance, space.length),
    };
  }

  protected tickAll(present: boolean): void {
    this.form.controls.who.controls.present.setValue(present ? this.activeRoster().map((p) => p.id) : []);
  }

  protected usePreset(preset: SpacePreset): void {
    this.form.controls.kit.patchValue({ width: preset.size.width, length: preset.size.length });
    this.status.set(
      $localize`Space set to ${preset.label}:preset:: ${preset.size.width}:width: by ${preset.size.length}:length: ${this.distanceName}:unit: (${preset.source}:source:).`,
    );
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
    await this.rulesReady;
    const firstBad = STEPS.findIndex((step) => this.form.controls[step].invalid);
    if (!team || firstBad >= 0) {
      // Open the step that needs a look, rather than leave every step folded.
      const step = team ? STEPS[firstBad] : 'who';
      this.stepper().selectedIndex = STEPS.indexOf(step);
      const chooseTeam = $localize`Choose a team first.`;
      this.stepProblem.set({ step, text: team ? this.problemWords(step) : chooseTeam });
      this.error.set(team ? $localize`Some answers need a look: see the step that is open.` : chooseTeam);
      this.focusFirstProblem();
      return;
    }
    const raw = this.form.getRawValue();
    const value: WizardValue = { ...raw.who, ...raw.kit, ...raw.time };
    const request = buildPlanRequest(team, this.roster(), value, this.units);
    if (request.players.length === 0) {
      const nobody = $localize`Tick at least one player who is here.`;
      this.form.controls.who.controls.present.setErrors({ message: nobody });
      this.error.set(nobody);
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
    this.status.set($localize`Making the plan…`);
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
      request: buildPlanRequest(team, this.roster(), value, this.units, guestIds),
      date: raw.time.date || undefined,
      kickOff: raw.time.kickOff || undefined,
      scheduledSessionId: this.scheduledSessionId,
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
    const wanted = guests.map((guest, i) => ({
      row: this.guests.at(i),
      body: { displayName: guest.name.trim(), goalkeeper: guest.goalkeeper },
    }));
    // A guest added before a plan that then failed is used again, not added a second time.
    const earlierId = ({ row, body }: (typeof wanted)[number]) => {
      const earlier = this.addedGuests.get(row);
      return earlier && earlier.teamId === teamId && earlier.name === body.displayName ? earlier.id : null;
    };
    const missing = wanted.filter((guest) => earlierId(guest) === null);
    // One request: every new guest is added, or none is.
    const added = missing.length
      ? await firstValueFrom(
          this.playersApi.addGuests(
            teamId,
            missing.map((guest) => guest.body),
          ),
        )
      : [];
    missing.forEach(({ row, body }, i) =>
      this.addedGuests.set(row, { teamId, name: body.displayName, id: added[i]!.id }),
    );
    return wanted.map((guest) => earlierId(guest)!);
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
    this.error.set([$localize`Some answers need a look.`, ...unmatched].join(' '));
    const firstBad = STEPS.findIndex((step) => this.form.controls[step].invalid);
    if (firstBad >= 0) this.stepper().selectedIndex = firstBad;
  }
}
