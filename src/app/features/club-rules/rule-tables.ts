import {
  ChangeDetectionStrategy,
  Component,
  computed,
  forwardRef,
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
import { RULE_DOCUMENT, RuleNumber, type RuleDocument } from './rule-number';
import { getAt, toPointer } from './services/json-pointer';

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
  /** Emits each edit as a pointer and value. */
  readonly edited = output<RuleEdit>();

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

  protected kindLabel(kind: string): string {
    return KIND_LABELS[kind] ?? kind;
  }

  /** "Ball mastery or Tag game": the kinds that can fill a part, most preferred first. */
  protected kindsLabel(kinds: string[]): string {
    return kinds.map((k) => this.kindLabel(k)).join(' or ');
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

  protected formatsText(level: string): string {
    return formatsToText(this.value(this.ptr('keepBall', level, 'formats')));
  }

  protected setFormats(level: string, event: Event): void {
    const text = (event.target as HTMLInputElement).value;
    const formats = textToFormats(text);
    this.formatErrors.update((all) => ({ ...all, [level]: formats ? '' : 'Write formats like 4v1, 3v1' }));
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
