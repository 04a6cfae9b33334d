import { computed, Directive, inject, InjectionToken, input, type Signal } from '@angular/core';
import { getAt } from './services/json-pointer';

/** The document a number field edits: what it reads, whether it may change it, where edits go. */
export interface RuleDocument {
  readonly body: Signal<unknown>;
  readonly readOnly: Signal<boolean>;
  edit(pointer: string, value: unknown): void;
}

export const RULE_DOCUMENT = new InjectionToken<RuleDocument>('RULE_DOCUMENT');

/**
 * A number input bound to one place of the rule-set document: shows the number there, is read-only
 * with the document, carries the pointer for tests and the JSON view, and sends an edit when a
 * number is entered (an empty or unreadable field changes nothing).
 */
@Directive({
  selector: 'input[cwRuleNumber]',
  host: {
    '[value]': 'value()',
    '[readOnly]': 'document.readOnly()',
    '[attr.data-pointer]': 'cwRuleNumber()',
    '(change)': 'changed($event)',
  },
})
export class RuleNumber {
  /** The JSON pointer of the number. */
  readonly cwRuleNumber = input.required<string>();
  protected readonly document = inject(RULE_DOCUMENT);
  protected readonly value = computed(() => {
    const v = getAt(this.document.body(), this.cwRuleNumber());
    return typeof v === 'number' ? v : null;
  });

  protected changed(event: Event): void {
    const field = event.target as HTMLInputElement;
    if (field.value.trim() === '' || Number.isNaN(field.valueAsNumber)) return;
    this.document.edit(this.cwRuleNumber(), field.valueAsNumber);
  }
}
