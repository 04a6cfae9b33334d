import { Directive, ElementRef, forwardRef, inject } from '@angular/core';
import {
  AbstractControl,
  ControlValueAccessor,
  NG_VALIDATORS,
  NG_VALUE_ACCESSOR,
  ValidationErrors,
  Validator,
} from '@angular/forms';

/** Digits with an optional sign and one decimal point or comma: "12", "-3", "27,5". */
const NUMBER_TEXT = /^[-+]?\d+(?:[.,]\d+)?$/;

/** The number a field's text stands for: null when empty, NaN when it is not a number. */
export function numberFromText(text: string): number | null {
  const trimmed = text.trim();
  if (!trimmed) return null;
  return NUMBER_TEXT.test(trimmed) ? Number(trimmed.replace(',', '.')) : Number.NaN;
}

/**
 * A number typed into a text field (`<input cwNumber inputmode="numeric">`): the text stays as
 * typed, and text that is not a number is an error under the field ("notNumber"), never dropped
 * in silence as a browser's number field does.
 */
@Directive({
  selector: 'input[cwNumber]',
  host: {
    '(input)': 'typed($any($event.target).value)',
    '(blur)': 'touched()',
    autocomplete: 'off',
  },
  providers: [
    { provide: NG_VALUE_ACCESSOR, useExisting: forwardRef(() => NumberField), multi: true },
    { provide: NG_VALIDATORS, useExisting: forwardRef(() => NumberField), multi: true },
  ],
})
export class NumberField implements ControlValueAccessor, Validator {
  private readonly input = inject<ElementRef<HTMLInputElement>>(ElementRef).nativeElement;
  private changed: (value: number | null) => void = () => undefined;
  private touch: () => void = () => undefined;

  writeValue(value: number | null | undefined): void {
    this.input.value = value === null || value === undefined || Number.isNaN(value) ? '' : String(value);
  }

  registerOnChange(fn: (value: number | null) => void): void {
    this.changed = fn;
  }

  registerOnTouched(fn: () => void): void {
    this.touch = fn;
  }

  setDisabledState(disabled: boolean): void {
    this.input.disabled = disabled;
  }

  validate(control: AbstractControl): ValidationErrors | null {
    return typeof control.value === 'number' && Number.isNaN(control.value) ? { notNumber: true } : null;
  }

  protected typed(text: string): void {
    this.changed(numberFromText(text));
  }

  protected touched(): void {
    this.touch();
  }
}
