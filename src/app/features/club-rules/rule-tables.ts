import {
  afterNextRender,
  ChangeDetectionStrategy,
  Component,
  computed,
  ElementRef,
  forwardRef,
  inject,
  Injector,
  input,
  output,
  signal,
} from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatExpansionModule } from '@angular/material/expansion';
import {
  ACTIVITY_KIND_LABELS,
  AGE_BANDS,
  AGE_GROUPS,
  LEVELS,
  PLAN_KINDS,
  STATION_KINDS,
} from '../../../../shared/types';
import { ageBandWords, ageGroupWords, LEVEL_WORDS } from '../../../../shared/types/rule-words';
import { RULE_DOCUMENT, RuleNumber, type RuleDocument } from './rule-number';
import { getAt, toPointer } from '../../../../shared/json-pointer';
import { cellOf, placeOf, problemsByCell, type RulePanel } from './services/rule-cells';
import type { RuleProblem } from './services/rule-validation';
import { distanceUnitName, measureSymbol, type Measure } from '../../../../shared/units';
import { UnitChoice } from '../../core/units/unit-choice';

/** An edit from the tables: the value to put at a pointer of the rule-set document. */
export interface RuleEdit {
  pointer: string;
  value: unknown;
}

/** Words for the activity kinds, as the tables show them (the same words as the plans). */
export const KIND_LABELS: Record<string, string> = ACTIVITY_KIND_LABELS;

/** "4v1, 3v1" ⇄ [{attackers:4, defenders:1}, …]. */
export function formatsToText(formats: unknown): string {
  return Array.isArray(formats)
    ? formats.map((f: { attackers: number; defenders: number }) => `${f.attackers}v${f.defenders}`).join(', ')
    : '';
}

export function textToFormats(text: string): { attackers: number; defenders: number }[] | null {
  const parts = text.split(/[,;\s]+/).filter(Boolean);
  const formats = parts.map((part) => /^(\d+)\s*v\s*(\d+)$/i.exec(part));
  if (parts.length === 0 || formats.some((m) => !m)) return null;
  return formats.map((m) => ({ attackers: Number(m![1]), defenders: Number(m![2]) }));
}

/** One number of the supervision, breaks and space fold: where it is, its words, what it measures. */
interface LimitField {
  path: [string, string];
  label: string;
  measure: Measure | null;
}

const LIMIT_FIELDS: LimitField[] = [
  {
    path: ['supervision', 'minAdults'],
    label: $localize`Fewest adults at a children’s session`,
    measure: null,
  },
  {
    path: ['supervision', 'stationsPerAdult'],
    label: $localize`Stations one adult can oversee`,
    measure: null,
  },
  {
    path: ['timing', 'drinksEveryMinutes'],
    label: $localize`Drinks break at least every (min)`,
    measure: null,
  },
  {
    path: ['timing', 'heatDrinksEveryMinutes'],
    label: $localize`:After Drinks break at least every (min):In the heat, at least every (min)`,
    measure: null,
  },
  { path: ['timing', 'drinksMinutes'], label: $localize`Drinks break length (min)`, measure: null },
  {
    path: ['keepBallLimits', 'minM2PerPlayer'],
    label: $localize`:Followed by its unit, e.g. (m²):Keep-ball room a player`,
    measure: 'area',
  },
  {
    path: ['keepBallLimits', 'minSideM'],
    label: $localize`:Followed by its unit, e.g. (m):Keep-ball shortest side`,
    measure: 'distance',
  },
  {
    path: ['keepBallLimits', 'twoDefendersFromAge'],
    label: $localize`Two defenders in keep-ball from age`,
    measure: null,
  },
];

/** The touch target's numbers, with their labels. */
const TOUCH_FIELDS: { key: string; label: string }[] = [
  { key: 'minPerPlayer', label: $localize`Fewest touches per player` },
  { key: 'maxPerPlayer', label: $localize`Most touches per player` },
  { key: 'fromMinutes', label: $localize`For warm-ups of at least (minutes)` },
];

/** The rule set's main tables as forms, so a lead tunes numbers without touching JSON. */
@Component({
  selector: 'cw-rule-tables',
  imports: [MatExpansionModule, MatButtonToggleModule, RuleNumber],
  providers: [{ provide: RULE_DOCUMENT, useExisting: forwardRef(() => RuleTables) }],
  templateUrl: './rule-tables.html',
  styleUrl: './rule-tables.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RuleTables implements RuleDocument {
  /** The rule-set document being edited. */
  readonly body = input.required<unknown>();
  /** Shows the tables without inputs that change anything. */
  readonly readOnly = input(false);
  /** Problems the rules check (or the server) found, each shown at its cell. */
  readonly problems = input<readonly RuleProblem[]>([]);
  /** Emits each edit as a pointer and value. */
  readonly edited = output<RuleEdit>();

  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  private readonly injector = inject(Injector);
  private readonly cellProblems = computed(() => problemsByCell(this.problems()));
  /** The folds that are open (the first table starts open). */
  protected readonly open = signal<ReadonlySet<RulePanel>>(new Set(['keepBall']));
  protected readonly levelWords: Record<string, string> = LEVEL_WORDS;
  protected readonly bandWords = ageBandWords;
  protected readonly ageWords = ageGroupWords;
  /** The reader's units: the tables store metres and °C and show and take these. */
  private readonly units = inject(UnitChoice);
  protected readonly limitFields = LIMIT_FIELDS;
  protected readonly touchFields = TOUCH_FIELDS;
  /** "metres" or "yards", for the area sizes' heading. */
  protected readonly distanceName = computed(() => distanceUnitName(this.units.distance()));

  protected readonly levels = LEVELS;
  protected readonly bands = AGE_BANDS;
  protected readonly planKinds = PLAN_KINDS;
  protected readonly level = signal<string>('beginner');
  protected readonly band = signal<string>('U6-U8');
  protected readonly planKind = signal<string>('match-warm-up');
  protected readonly formatErrors = signal<Record<string, string>>({});

  /** Kinds the document has tables for (falls back to the known list). */
  protected readonly kinds = computed(() => {
    const sizes = getAt(this.body(), '/parameters/groupSizes');
    return sizes && typeof sizes === 'object' ? Object.keys(sizes) : [...STATION_KINDS];
  });
  protected readonly ageGroups = computed(() => {
    const groups = getAt(this.body(), '/parameters/ageGroups');
    return groups && typeof groups === 'object' ? Object.keys(groups) : [...AGE_GROUPS];
  });
  /** The parts of a session for the chosen kind of plan and age band, in order. */
  protected readonly phaseRows = computed(() => {
    const rows = getAt(this.body(), `/parameters/sessionShapes/${this.planKind()}/${this.band()}`);
    return Array.isArray(rows)
      ? (rows as { kinds: string[]; name: string; share: number; maxMinutes?: number }[])
      : [];
  });
  protected readonly formatBands = AGE_BANDS;
  protected readonly phaseShareTotal = computed(() =>
    this.phaseRows().reduce((sum, row) => sum + (row.share || 0), 0),
  );

  /** The problems at a cell, in sentences. */
  problemsAt(pointer: string): string[] {
    return this.cellProblems().get(pointer) ?? [];
  }

  /** Whether any cell in a fold has a problem (the fold's title says so). */
  protected panelHasProblems(panel: RulePanel): boolean {
    return [...this.cellProblems().keys()].some((cell) => placeOf(cell)?.panel === panel);
  }

  protected setOpen(panel: RulePanel, open: boolean): void {
    this.open.update((all) => {
      const next = new Set(all);
      if (open) next.add(panel);
      else next.delete(panel);
      return next;
    });
  }

  /**
   * Shows the cell of a problem: opens its fold, picks its level, age band or kind of session,
   * then puts the cursor in it. False when no table shows that place.
   */
  reveal(pointer: string): boolean {
    const cell = cellOf(pointer);
    const place = cell ? placeOf(cell) : null;
    if (!cell || !place) return false;
    this.setOpen(place.panel, true);
    if (place.level) this.level.set(place.level);
    if (place.band) this.band.set(place.band);
    if (place.planKind) this.planKind.set(place.planKind);
    afterNextRender(
      () => {
        const field = this.host.nativeElement.querySelector<HTMLElement>(
          `[data-pointer="${cell.replace(/["\\]/g, '\\$&')}"]`,
        );
        field?.scrollIntoView?.({ block: 'center' });
        field?.focus();
      },
      { injector: this.injector },
    );
    return true;
  }

  /** "m", "yd²", "°F": the sign after a measured field's heading, in the reader's units. */
  protected symbol(measure: Measure): string {
    return measureSymbol(measure, this.units.units());
  }

  protected kindLabel(kind: string): string {
    return KIND_LABELS[kind] ?? kind;
  }

  /** "Ball mastery or Tag game": the kinds that can fill a part, most preferred first. */
  protected kindsLabel(kinds: string[]): string {
    const labels = kinds.map((k) => this.kindLabel(k));
    return labels.length
      ? labels.reduce(
          (list, kind) =>
            $localize`:Kinds of activity that can fill a part of a session, e.g. Ball mastery or Tag game:${list}:kinds: or ${kind}:kind:`,
        )
      : '';
  }

  /** The formats cell's name for a screen reader: "Keep-ball formats for Beginner". */
  protected formatsWords(level: string): string {
    return $localize`:The level, e.g. Beginner:Keep-ball formats for ${this.levelWords[level]}:level:`;
  }

  /** "Most attackers per defender for Beginner", for a screen reader. */
  protected mostAttackersWords(level: string): string {
    return $localize`:The level, e.g. Beginner:Most attackers per defender for ${this.levelWords[level]}:level:`;
  }

  /** "Warm-up share of the minutes", for a screen reader; the part's name comes from the rules. */
  protected shareWords(part: string): string {
    return $localize`:A part of a session, e.g. Warm-up:${part}:part: share of the minutes`;
  }

  /** "Warm-up longest minutes", for a screen reader. */
  protected longestWords(part: string): string {
    return $localize`:A part of a session, e.g. Warm-up:${part}:part: longest minutes`;
  }

  /** "Under 9 to 10 games have goalkeepers", for a screen reader. */
  protected goalkeepersWords(band: string): string {
    return $localize`:An age band, e.g. Under 9 to 10:${this.bandWords(band)}:ageBand: games have goalkeepers`;
  }

  /** "Children per adult up to age 8", for a screen reader. */
  protected ratioWords(upToAge: number): string {
    return $localize`Children per adult up to age ${upToAge}:age:`;
  }

  /** "Under 9 may do Keep-ball", for a screen reader. */
  protected allowedWords(age: string, kind: string): string {
    return $localize`:An age group, then a kind of activity:${this.ageWords(age)}:ageGroup: may do ${this.kindLabel(kind)}:activity:`;
  }

  /** A group-size cell's name for a screen reader: "Keep-ball, Beginner, fewest players in a group". */
  protected groupSizeWords(kind: string, field: string): string {
    const activity = this.kindLabel(kind);
    const level = this.levelWords[this.level()];
    if (field === 'min') return $localize`${activity}:activity:, ${level}:level:, fewest players in a group`;
    if (field === 'max') return $localize`${activity}:activity:, ${level}:level:, most players in a group`;
    return $localize`${activity}:activity:, ${level}:level:, best players in a group`;
  }

  /** A players-a-side cell's name for a screen reader: "Under 9 to 10, most players a side". */
  protected perSideWords(band: string, field: string): string {
    const ages = this.bandWords(band);
    return field === 'maxPerSide'
      ? $localize`${ages}:ageBand:, most players a side`
      : $localize`${ages}:ageBand:, fewest players a side`;
  }

  /** A touch-rate cell's name for a screen reader: "Keep-ball, touches a minute". */
  protected touchRateWords(kind: string, field: string): string {
    const activity = this.kindLabel(kind);
    return field === 'activeShare'
      ? $localize`${activity}:activity:, time in play (%)`
      : $localize`${activity}:activity:, touches a minute`;
  }

  protected ratioRows(): { upToAge: number; childrenPerAdult: number }[] {
    const rows = this.value(this.ptr('supervision', 'ratios'));
    return Array.isArray(rows) ? rows : [];
  }

  protected ptr(...tokens: (string | number)[]): string {
    return toPointer(['parameters', ...tokens]);
  }

  protected value(pointer: string): unknown {
    return getAt(this.body(), pointer);
  }

  /** An edit from a number field (see RuleNumber). */
  edit(pointer: string, value: unknown): void {
    this.edited.emit({ pointer, value });
  }

  protected setBoolean(pointer: string, event: Event): void {
    this.edited.emit({ pointer, value: (event.target as HTMLInputElement).checked });
  }

  /** The formats cell's own message (unreadable text) and the rules check's, in one line. */
  protected formatsProblem(level: string): string {
    const pointer = this.ptr('keepBall', level, 'formats');
    return [this.formatErrors()[level], ...this.problemsAt(pointer)].filter(Boolean).join(' ');
  }

  protected formatsText(level: string): string {
    return formatsToText(this.value(this.ptr('keepBall', level, 'formats')));
  }

  protected setFormats(level: string, event: Event): void {
    const text = (event.target as HTMLInputElement).value;
    const formats = textToFormats(text);
    this.formatErrors.update((all) => ({
      ...all,
      [level]: formats
        ? ''
        : $localize`Keep-ball, ${LEVEL_WORDS[level as keyof typeof LEVEL_WORDS] ?? level}:level:: write formats like 4v1, 3v1.`,
    }));
    if (formats) this.edited.emit({ pointer: this.ptr('keepBall', level, 'formats'), value: formats });
  }

  protected allows(age: string, kind: string): boolean {
    const kinds = this.value(this.ptr('ageGroups', age, 'allowedKinds'));
    return Array.isArray(kinds) && kinds.includes(kind);
  }

  protected toggleAllowed(age: string, kind: string, event: Event): void {
    const checked = (event.target as HTMLInputElement).checked;
    const pointer = this.ptr('ageGroups', age, 'allowedKinds');
    const current = (this.value(pointer) as string[] | undefined) ?? [];
    const next = checked ? [...new Set([...current, kind])] : current.filter((k) => k !== kind);
    this.edited.emit({ pointer, value: this.kinds().filter((k) => next.includes(k)) });
  }
}
