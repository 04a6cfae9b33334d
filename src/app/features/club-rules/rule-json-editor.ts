import {
  afterNextRender,
  ChangeDetectionStrategy,
  Component,
  computed,
  DestroyRef,
  effect,
  ElementRef,
  inject,
  input,
  output,
  signal,
  untracked,
  viewChild,
} from '@angular/core';
import { setDiagnostics, type Diagnostic } from '@codemirror/lint';
import { Annotation, Compartment, EditorState } from '@codemirror/state';
import { EditorView } from '@codemirror/view';
import { MatButtonModule } from '@angular/material/button';
import { ICONS } from '../../core/icons/shipped-icon';
import {
  locatePointer,
  locatePointers,
  syntaxErrorLocation,
  type TextLocation,
} from './services/json-locations';
import { ruleJsonEditorSetup } from './rule-json-editor-setup';
import type { RuleProblem } from './services/rule-validation';

/** Marks a text replaced from outside (the tables), which is not emitted back. */
const fromOutside = Annotation.define<boolean>();

/** A problem with the place it sits in the text. */
interface PinnedProblem {
  key: string;
  line: number | null;
  pointer: string;
  message: string;
  offset: number | null;
}

/**
 * The advanced text view: the whole rule set as text in a code editor, every problem pinned to its
 * line twice: as a lint diagnostic in the text and in the list above it.
 */
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

  private readonly host = viewChild.required<ElementRef<HTMLElement>>('editor');
  private readonly view = signal<EditorView | null>(null);
  private readonly settings = new Compartment();
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
        if (JSON.stringify(current) !== JSON.stringify(body)) this.replaceText(JSON.stringify(body, null, 2));
      });
    });
    afterNextRender({ write: () => this.mount() });
    inject(DestroyRef).onDestroy(() => this.view()?.destroy());
    effect(() => {
      const view = this.view();
      if (!view) return;
      const readOnly = this.readOnly();
      const invalid = !!this.syntaxError() || this.pinned().length > 0;
      view.dispatch({
        effects: this.settings.reconfigure([
          EditorState.readOnly.of(readOnly),
          EditorView.contentAttributes.of({
            'aria-invalid': String(invalid),
            'aria-readonly': String(readOnly),
          }),
        ]),
      });
    });
    effect(() => {
      const view = this.view();
      if (view) view.dispatch(setDiagnostics(view.state, this.diagnostics(view.state.doc.length)));
    });
  }

  /** The problems as the editor's diagnostics: the syntax error at its character, a rule problem from its place to the line's end. */
  private diagnostics(length: number): Diagnostic[] {
    const error = this.syntaxError();
    if (error) {
      const from = Math.min(error.at?.offset ?? 0, length);
      return [
        {
          from,
          to: Math.min(from + 1, length),
          severity: 'error',
          message: $localize`The text cannot be read (a comma, quote or bracket out of place?) — nothing is taken from it until it can.`,
        },
      ];
    }
    const text = this.text();
    return this.pinned().map((problem) => {
      const from = Math.min(problem.offset ?? 0, length);
      const lineEnd = text.indexOf('\n', from);
      return { from, to: lineEnd === -1 ? length : lineEnd, severity: 'error', message: problem.message };
    });
  }

  private mount(): void {
    const view = new EditorView({
      parent: this.host().nativeElement,
      state: EditorState.create({
        doc: this.text(),
        extensions: [
          ruleJsonEditorSetup(),
          this.settings.of([]),
          EditorView.contentAttributes.of({
            id: 'rule-json',
            'aria-labelledby': 'rule-json-label',
            'aria-multiline': 'true',
            // Focusable as it is (contenteditable); said outright so checkers see the scroller's content can be reached by keyboard.
            tabindex: '0',
            spellcheck: 'false',
            autocapitalize: 'off',
          }),
          EditorView.updateListener.of((update) => {
            if (!update.docChanged || update.transactions.some((t) => t.annotation(fromOutside))) return;
            this.edit(update.state.doc.toString());
          }),
        ],
      }),
    });
    this.view.set(view);
  }

  /** Puts a text from outside in the editor (or keeps it for the editor to start with). */
  private replaceText(text: string): void {
    this.text.set(text);
    const view = this.view();
    if (view && view.state.doc.toString() !== text)
      view.dispatch({
        changes: { from: 0, to: view.state.doc.length, insert: text },
        annotations: fromOutside.of(true),
      });
  }

  private edit(text: string): void {
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

  /** Puts the caret on the problem's line, selects that line and brings it into view. */
  protected goTo(offset: number | null): void {
    const view = this.view();
    if (offset === null || !view) return;
    const line = view.state.doc.lineAt(Math.min(offset, view.state.doc.length));
    view.dispatch({
      selection: { anchor: line.from, head: line.to },
      effects: EditorView.scrollIntoView(line.from, { y: 'center' }),
    });
    view.focus();
  }
}
