import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  ElementRef,
  inject,
  input,
  output,
  signal,
  untracked,
} from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { FormArray, FormControl, NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatChipsModule } from '@angular/material/chips';
import type { ErrorStateMatcher } from '@angular/material/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import {
  defaultRuleSet,
  kindLayouts,
  previewActivity,
  type ActivityPreview,
  type RuleSetDocument,
} from '../../core/engine/engine-adapter';
import {
  AGE_GROUPS,
  BALL_USES,
  FOCUSES,
  LEVELS,
  STATION_KINDS,
  type ActivityDefinition,
  type AgeGroup,
  type BallUse,
  type Focus,
  type Level,
  type StationKind,
} from '../../../../shared/types';
import { ICONS } from '../../core/icons/shipped-icon';
import { ACTIVITY_KIND_LABELS, FOCUS_LABELS, LEVEL_LABELS } from '../../core/labels/plan-labels';
import { StationDiagram } from '../../shared/components/station-diagram';
import { formatSize } from '../../../../shared/units';
import { UnitChoice } from '../../core/units/unit-choice';
import {
  ACTIVITY_LIMITS,
  activityOf,
  fieldMessages,
  formValueOf,
  type ActivityFormValue,
  type FieldMessages,
} from './services/activity-draft';

/** How an activity uses balls, in the form's words. */
export const BALL_WORDS: Record<BallUse, string> = {
  each: $localize`:How an activity uses balls:A ball each`,
  pair: $localize`:How an activity uses balls:One per pair`,
  group: $localize`:How an activity uses balls:A few per group`,
  none: $localize`:How an activity uses balls:No balls`,
};

/** An intensity of 1 to 5 in words, after "Intensity: 3 of 5,". */
const INTENSITY_WORDS = [
  '',
  $localize`:Intensity 1 of 5:gentle`,
  $localize`:Intensity 2 of 5:steady`,
  $localize`:Intensity 3 of 5:lively`,
  $localize`:Intensity 4 of 5:hard`,
  $localize`:Intensity 5 of 5:match pace`,
];

type ListKey = 'coachingPoints' | 'easier' | 'harder';

/**
 * The head of coaching's form for one club activity: every field a plan needs, no JSON, a live
 * diagram from the engine as they type, and messages under each field in a coach's words.
 * Read-only for the starting activities that come with Conewise.
 */
@Component({
  selector: 'cw-activity-form',
  imports: [
    ReactiveFormsModule,
    MatButtonModule,
    MatButtonToggleModule,
    MatCheckboxModule,
    MatChipsModule,
    MatFormFieldModule,
    ...ICONS,
    MatInputModule,
    MatSelectModule,
    StationDiagram,
  ],
  templateUrl: './activity-form.html',
  styleUrl: './activity-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ActivityForm {
  private readonly fb = inject(NonNullableFormBuilder);
  /** The reader's units, for the preview's size. */
  private readonly units = inject(UnitChoice);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  /** The rule-set document the activity goes into (the draft, or the rules in force when viewing). */
  readonly ruleSet = input.required<unknown>();
  /** The activity to show or change; null starts a blank one. */
  readonly activity = input<ActivityDefinition | null>(null);
  /** Its place in the rule set's activities; null for a new one (added at the end). */
  readonly index = input<number | null>(null);
  /** Shows the activity without letting anything change (the starting activities). */
  readonly readOnly = input(false);
  /** Disables saving while the draft is being saved. */
  readonly busy = input(false);
  /** Emits the finished activity when the lead saves and every field is right. */
  readonly save = output<ActivityDefinition>();
  /** Emits when the lead closes the form. */
  readonly closed = output<void>();

  protected readonly kinds = STATION_KINDS;
  protected readonly ageGroups = AGE_GROUPS;
  protected readonly levels = LEVELS;
  protected readonly focuses = FOCUSES;
  protected readonly ballUses = BALL_USES;
  protected readonly intensities = [1, 2, 3, 4, 5];
  protected readonly intensityWords = INTENSITY_WORDS;
  protected readonly kindLabels = ACTIVITY_KIND_LABELS;
  protected readonly focusLabels = FOCUS_LABELS;
  protected readonly levelLabels = LEVEL_LABELS;
  protected readonly ballWords = BALL_WORDS;
  protected readonly limits = ACTIVITY_LIMITS;
  protected readonly lists: { key: ListKey; title: string; item: string; add: string; max: number }[] = [
    {
      key: 'coachingPoints',
      title: $localize`Coaching points`,
      item: $localize`:One line of the coaching points, numbered after it:Coaching point`,
      add: $localize`Add a coaching point`,
      max: ACTIVITY_LIMITS.coachingPoints,
    },
    {
      key: 'easier',
      title: $localize`Make it easier`,
      item: $localize`:One line of Make it easier, numbered after it:Easier step`,
      add: $localize`Add an easier step`,
      max: ACTIVITY_LIMITS.easier,
    },
    {
      key: 'harder',
      title: $localize`Make it harder`,
      item: $localize`:One line of Make it harder, numbered after it:Harder step`,
      add: $localize`Add a harder step`,
      max: ACTIVITY_LIMITS.harder,
    },
  ];

  protected readonly form = this.fb.group({
    title: [''],
    summary: [''],
    description: [''],
    kind: ['ball-mastery' as StationKind],
    layout: [''],
    ages: this.fb.group({ from: ['U9' as AgeGroup], to: ['U12' as AgeGroup] }),
    levels: [[] as Level[]],
    focus: [[] as Focus[]],
    intensity: [3],
    balls: ['each' as BallUse],
    bibs: [false],
    players: this.fb.group({
      min: new FormControl<number | null>(4),
      max: new FormControl<number | null>(8),
    }),
    coachingPoints: this.fb.array<string>([]),
    easier: this.fb.array<string>([]),
    harder: this.fb.array<string>([]),
  });

  /** The form's values, kept as a signal so the preview and the messages follow every keystroke. */
  protected readonly value = signal<ActivityFormValue>(this.form.getRawValue() as ActivityFormValue);
  /** Set by the first save attempt: from then on every message shows, touched or not. */
  protected readonly submitted = signal(false);
  /** Bumped when a field is left, so messages of touched fields show. */
  private readonly touches = signal(0);

  protected readonly layouts = computed(() => kindLayouts(this.value().kind));
  private readonly activities = computed(
    () =>
      (this.ruleSet() as { parameters?: { activities?: ActivityDefinition[] } } | null)?.parameters
        ?.activities ?? [],
  );
  /** Where the activity sits in the rule set: its own place, or the end for a new one. */
  private readonly place = computed(() => this.index() ?? this.activities().length);

  /** The activity the form describes right now (one being changed keeps its id and origin). */
  protected readonly draft = computed<ActivityDefinition>(() => {
    const base = this.index() === null ? null : this.activity();
    return activityOf(
      this.value(),
      base,
      this.activities().map((a) => a.id),
    );
  });

  protected readonly messages = computed<FieldMessages>(() =>
    this.readOnly() ? {} : fieldMessages(this.value(), this.draft(), this.ruleSet(), this.place()),
  );
  protected readonly messageCount = computed(() => Object.keys(this.messages()).length);

  /** The engine's single-station set-up of the activity as typed, or null while it cannot be drawn. */
  protected readonly preview = computed<ActivityPreview | null>(() => {
    const activity = this.draft();
    if (!(activity.players.min >= 1) || !(activity.players.max >= 1)) return null;
    for (const rules of [this.ruleSet() as RuleSetDocument, defaultRuleSet]) {
      try {
        return previewActivity(activity, rules);
      } catch {
        // The draft has problems elsewhere: draw with the starting rules instead.
      }
    }
    return null;
  });

  /** "U10 intermediate group of 5, 4v1 · 10 × 10 m · 4 cones", the size in the reader's units. */
  protected readonly caption = computed(() => {
    const p = this.preview();
    if (!p) return '';
    const s = p.station;
    const format = s.format ? `, ${s.format}` : '';
    const level = LEVEL_LABELS[p.level].toLowerCase();
    const size = formatSize(this.units.distance(), s.area);
    return $localize`:Caption under the diagram preview, e.g. U10 intermediate group of 5, 4v1 · 10 × 10 m · 4 cones:${p.ageGroup}:ageGroup: ${level}:level: group of ${s.playerIds.length}:players:${format}:format: · ${size}:size: · ${s.equipment.cones}:cones: cones`;
  });

  private readonly matchers = new Map<string, ErrorStateMatcher>();

  constructor() {
    this.form.valueChanges
      .pipe(takeUntilDestroyed())
      .subscribe(() => this.value.set(this.form.getRawValue() as ActivityFormValue));
    this.form.events.pipe(takeUntilDestroyed()).subscribe(() => this.touches.update((n) => n + 1));
    effect(() => {
      const activity = this.activity();
      const readOnly = this.readOnly();
      untracked(() => this.load(activity, readOnly));
    });
  }

  /** The message under a field, once it was left or a save was tried. */
  protected message(path: string): string | null {
    this.touches();
    const message = this.messages()[path];
    if (!message) return null;
    const control = this.form.get(path);
    return this.submitted() || control?.touched ? message : null;
  }

  /** Puts a field in its error state (red, message read out) while it has a message to show. */
  protected matcher(path: string): ErrorStateMatcher {
    let matcher = this.matchers.get(path);
    if (!matcher) {
      matcher = { isErrorState: () => this.message(path) !== null };
      this.matchers.set(path, matcher);
    }
    return matcher;
  }

  protected list(key: ListKey): FormArray<FormControl<string>> {
    return this.form.controls[key];
  }

  protected addLine(key: ListKey): void {
    const list = this.list(key);
    list.push(this.fb.control(''));
    // Focus the new row so a lead can type straight away.
    setTimeout(() =>
      this.host.nativeElement
        .querySelector<HTMLInputElement>(`[data-line="${key}.${list.length - 1}"]`)
        ?.focus(),
    );
  }

  /** The remove button's name for a screen reader: "Remove coaching point 2". */
  protected removeWords(item: string, index: number): string {
    return $localize`:Button removing a numbered line, e.g. Remove coaching point 2:Remove ${item.toLowerCase()}:item: ${index + 1}:number:`;
  }

  protected removeLine(key: ListKey, index: number): void {
    this.list(key).removeAt(index);
  }

  /** A new kind draws with its own set-ups: the default one is chosen. */
  protected kindChanged(kind: StationKind): void {
    this.form.controls.layout.setValue(kindLayouts(kind)[0]?.id ?? '');
  }

  protected length(path: 'title' | 'summary' | 'description'): number {
    return [...this.value()[path]].length;
  }

  protected submit(): void {
    if (this.readOnly()) return;
    this.submitted.set(true);
    this.form.markAllAsTouched();
    if (this.messageCount() > 0) {
      // After this change detection the fields in error are marked: take the lead to the first.
      setTimeout(() =>
        this.host.nativeElement
          .querySelector<HTMLElement>('input[aria-invalid="true"], textarea[aria-invalid="true"]')
          ?.focus(),
      );
      return;
    }
    this.save.emit(this.draft());
  }

  private load(activity: ActivityDefinition | null, readOnly: boolean): void {
    const kind = activity?.kind ?? 'ball-mastery';
    const value = formValueOf(activity, { kind, layout: kindLayouts(kind)[0]?.id ?? '' });
    for (const key of ['coachingPoints', 'easier', 'harder'] as const) {
      const list = this.list(key);
      list.clear({ emitEvent: false });
      for (const line of value[key]) list.push(this.fb.control(line), { emitEvent: false });
    }
    this.form.reset(value);
    this.submitted.set(false);
    if (readOnly) this.form.disable({ emitEvent: false });
    else this.form.enable({ emitEvent: false });
    this.value.set(this.form.getRawValue() as ActivityFormValue);
  }
}
