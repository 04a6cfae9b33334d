import { signal } from '@angular/core';
import type { Observable } from 'rxjs';
import { problemMessage } from '../http/problem-message';

/**
 * A setting saved as soon as it is picked (a select on a settings card): the value the server
 * holds, whether a save is under way, "Saved" after one, and a refusal in words. The requests are
 * one-shot HTTP calls, so nothing is left subscribed.
 */
export class InstantSave<T> {
  readonly value = signal<T | null>(null);
  readonly saving = signal(false);
  readonly saved = signal(false);
  readonly error = signal<string | null>(null);

  /** `problem` words a refusal; the default says what the server said. */
  constructor(private readonly problem: (error: unknown) => string = problemMessage) {}

  /** Reads the value the server holds now. */
  load(request: Observable<T>): void {
    request.subscribe({
      next: (value) => this.value.set(value),
      error: (error: unknown) => this.error.set(this.problem(error)),
    });
  }

  /** Saves, unless a save is under way; `done` runs once the server has taken it. */
  save(request: () => Observable<T>, done?: (value: T) => void): void {
    if (this.saving()) return;
    this.saving.set(true);
    this.saved.set(false);
    this.error.set(null);
    request().subscribe({
      next: (value) => {
        this.value.set(value);
        this.saving.set(false);
        this.saved.set(true);
        done?.(value);
      },
      error: (error: unknown) => {
        this.saving.set(false);
        this.error.set(this.problem(error));
      },
    });
  }
}
