import {
  ChangeDetectionStrategy,
  Component,
  computed,
  effect,
  ElementRef,
  input,
  output,
  signal,
  untracked,
  viewChild,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { ICONS } from '../../core/icons/shipped-icon';
import {
  locatePointer,
  locatePointers,
  syntaxErrorLocation,
  type TextLocation,
} from './services/json-locations';
import type { RuleProblem } from './services/rule-validation';

/** A problem with the place it sits in the text. */
interface PinnedProblem {
  key: string;
  line: number | null;
  pointer: string;
  message: string;
  offset: number | null;
}

/** The advanced text view: the whole rule set as text, every problem pinned to its line. */
@Component({
  selector: 'cw-rule-json-editor',
  imports: [MatButtonModule, ...ICONS],
  templateUrl: './rule-json-editor.html',
  styleUrl: './rule-json-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RuleJsonEditor {
  /** The document shown; replaced in the text when it changes elsewhere (the tables). */
  readonly body = input.required<unknown>();
  /** Problems the engine's rule-set check found in the document. */
  readonly problems = input<RuleProblem[]>([]);
  readonly readOnly = input(false);
  /** Emits the parsed document whenever the text is valid JSON. */
  readonly bodyChange = output<unknown>();

  private readonly textArea = viewChild.required<ElementRef<HTMLTextAreaElement>>('editor');
  protected readonly text = signal('');
  protected readonly syntaxError = signal<{ message: string; at: TextLocation | null } | null>(null);

  protected readonly lineCount = computed(() => this.text().split('\n').length);
  private readonly locations = computed(() => {
    if (this.syntaxError()) return new Map<string, TextLocation>();
    try {
      return locatePointers(this.text());
    } catch {
      return new Map<string, TextLocation>();
    }
  });
  protected readonly pinned = computed<PinnedProblem[]>(() =>
    this.problems().map((problem, index) => {
      const at = locatePointer(this.locations(), problem.pointer);
      return {
        key: `${index}-${problem.pointer}`,
        line: at?.line ?? null,
        pointer: problem.pointer || '/',
        message: problem.message,
        offset: at?.offset ?? null,
      };
    }),
  );

  constructor() {
    effect(() => {
      const body = this.body();
      untracked(() => {
        if (this.syntaxError()) return;
        let current: unknown;
        try {
          current = JSON.parse(this.text());
        } catch {
          current = Symbol('none');
        }
        if (JSON.stringify(current) !== JSON.stringify(body)) this.text.set(JSON.stringify(body, null, 2));
      });
    });
  }

  protected edit(event: Event): void {
    const text = (event.target as HTMLTextAreaElement).value;
    this.text.set(text);
    try {
      const parsed: unknown = JSON.parse(text);
      this.syntaxError.set(null);
      this.bodyChange.emit(parsed);
    } catch (error) {
      this.syntaxError.set({
        message: error instanceof Error ? error.message : $localize`The text cannot be read.`,
        at: syntaxErrorLocation(text, error),
      });
    }
  }

  /** "Line 12": where a problem sits in the text. */
  protected lineWords(line: number): string {
    return $localize`:Where a problem is in the rules as text:Line ${line}:line:`;
  }

  /** Puts the caret on the problem's line and selects that line. */
  protected goTo(offset: number | null): void {
    if (offset === null) return;
    const area = this.textArea().nativeElement;
    const text = area.value;
    const start = text.lastIndexOf('\n', offset - 1) + 1;
    const endAt = text.indexOf('\n', offset);
    area.focus();
    area.setSelectionRange(start, endAt === -1 ? text.length : endAt);
    const lineHeight = parseFloat(getComputedStyle(area).lineHeight) || 20;
    const line = text.slice(0, start).split('\n').length - 1;
    area.scrollTop = Math.max(0, (line - 3) * lineHeight);
  }
}
