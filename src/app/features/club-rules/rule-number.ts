import {
  computed,
  Directive,
  effect,
  ElementRef,
  inject,
  InjectionToken,
  input,
  Renderer2,
  type Signal,
} from '@angular/core';
import { getAt } from '../../../../shared/json-pointer';
import { measureIn, metricFrom, ruleSetMeasureAt, type Measure } from '../../../../shared/units';
import { UnitChoice } from '../../core/units/unit-choice';

/** The document a number field edits: what it reads, whether it may change it, where edits go. */
export interface RuleDocument {
  readonly body: Signal<unknown>;
  readonly readOnly: Signal<boolean>;
  edit(pointer: string, value: unknown): void;
  /** The problems the rules check found at a cell, in sentences (none: an empty list). */
  problemsAt(pointer: string): string[];
}

export const RULE_DOCUMENT = new InjectionToken<RuleDocument>('RULE_DOCUMENT');

let nextId = 0;

const PROBLEM_STYLE: Record<string, string> = {
  display: 'block',
  color: 'var(--mat-sys-error)',
  'font-size': '0.85rem',
  'white-space': 'normal',
  'max-width': '260px',
};

/**
 * A number input bound to one place of the rule-set document: shows the number there, is read-only
 * with the document, carries the pointer for tests and for finding the cell, sends an edit when a
 * number is entered (an empty or unreadable field changes nothing), and while the rules check
 * finds a problem there is marked invalid with the problem written under it (in the reader's
 * units). A number that measures something (`cwRuleMeasure`) is stored metric and shown and typed
 * in the reader's units, converted here at the edge.
 */
@Directive({
  selector: 'input[cwRuleNumber]',
  host: {
    '[value]': 'value()',
    '[readOnly]': 'document.readOnly()',
    '[attr.data-pointer]': 'cwRuleNumber()',
    '[attr.aria-invalid]': 'problems().length > 0',
    '[attr.aria-describedby]': 'problems().length ? messageId : null',
    '(change)': 'changed($event)',
  },
})
export class RuleNumber {
  /** The JSON pointer of the number. */
  readonly cwRuleNumber = input.required<string>();
  /** What the stored metric number measures (metres, square metres, °C); null for counts and minutes. */
  readonly cwRuleMeasure = input<Measure | null>(null);
  /** A share stored as 0–1 and shown and typed as a percentage (0.8 ↔ 80). */
  readonly cwRulePercent = input(false);
  /** What the number measures: as given, else as the rule set's place says (shared/units). */
  private readonly measure = computed(() => this.cwRuleMeasure() ?? ruleSetMeasureAt(this.cwRuleNumber()));
  protected readonly document = inject(RULE_DOCUMENT);
  private readonly units = inject(UnitChoice);
  protected readonly messageId = `cw-cell-problem-${++nextId}`;
  protected readonly value = computed(() => {
    const v = getAt(this.document.body(), this.cwRuleNumber());
    if (typeof v !== 'number') return null;
    if (this.cwRulePercent()) return Math.round(v * 1000) / 10;
    const measure = this.measure();
    return measure ? measureIn(measure, this.units.units(), v) : v;
  });
  protected readonly problems = computed(() =>
    this.document.problemsAt(this.cwRuleNumber()).map((problem) => this.units.text(problem)),
  );

  constructor() {
    const field = inject<ElementRef<HTMLInputElement>>(ElementRef).nativeElement;
    const renderer = inject(Renderer2);
    let shown: HTMLElement | null = null;
    effect(() => {
      const text = this.problems().join(' ');
      if (!text) {
        shown?.remove();
        shown = null;
        return;
      }
      if (!shown) {
        shown = renderer.createElement('span') as HTMLElement;
        // Made here, outside the table's template: styled in place, as the tables' own errors are.
        for (const [name, value] of Object.entries(PROBLEM_STYLE)) renderer.setStyle(shown, name, value);
        renderer.setAttribute(shown, 'id', this.messageId);
        renderer.setAttribute(shown, 'data-testid', 'cell-problem');
        field.insertAdjacentElement('afterend', shown);
      }
      shown.textContent = text;
    });
  }

  protected changed(event: Event): void {
    const field = event.target as HTMLInputElement;
    if (field.value.trim() === '' || Number.isNaN(field.valueAsNumber)) return;
    const measure = this.measure();
    const typed = field.valueAsNumber;
    if (this.cwRulePercent()) {
      this.document.edit(this.cwRuleNumber(), Math.round(typed * 10) / 1000);
      return;
    }
    this.document.edit(this.cwRuleNumber(), measure ? metricFrom(measure, this.units.units(), typed) : typed);
  }
}
