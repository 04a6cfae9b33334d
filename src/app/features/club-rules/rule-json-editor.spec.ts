import { ChangeDetectionStrategy, Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { forEachDiagnostic, type Diagnostic } from '@codemirror/lint';
import { EditorView } from '@codemirror/view';
import defaultRules from '../../../../rules/default-rule-set.json';
import { validateRuleSet } from '../../../../engine/index';
import { RuleJsonEditor } from './rule-json-editor';
import type { RuleProblem } from './services/rule-validation';

/** The club rules page's part: the document, and the engine's check of whatever the text last read as. */
@Component({
  imports: [RuleJsonEditor],
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `<cw-rule-json-editor
    [body]="body()"
    [problems]="problems()"
    [readOnly]="readOnly()"
    (bodyChange)="take($event)"
  />`,
})
class Host {
  readonly body = signal<unknown>(structuredClone(defaultRules));
  readonly problems = signal<RuleProblem[]>([]);
  readonly readOnly = signal(false);
  readonly taken: unknown[] = [];
  take(body: unknown): void {
    this.taken.push(body);
    this.body.set(body);
    this.problems.set(validateRuleSet(body).errors);
  }
}

describe('RuleJsonEditor', () => {
  // jsdom lays nothing out and its ranges have no rectangles; the editor measures text with them.
  const hadRects = 'getClientRects' in Range.prototype;
  beforeAll(() => {
    if (!hadRects) {
      Range.prototype.getClientRects = () => [] as unknown as DOMRectList;
      Range.prototype.getBoundingClientRect = () => new DOMRect();
    }
  });
  afterAll(() => {
    if (!hadRects) {
      delete (Range.prototype as Partial<Range>).getClientRects;
      delete (Range.prototype as Partial<Range>).getBoundingClientRect;
    }
  });

  async function setUp() {
    const fixture = TestBed.createComponent(Host);
    await fixture.whenStable();
    const el = fixture.nativeElement as HTMLElement;
    const content = el.querySelector<HTMLElement>('.cm-content')!;
    const view = EditorView.findFromDOM(content)!;
    /** Selects everything with the keyboard and pastes a text over it, as a user would. */
    const pasteOver = async (text: string) => {
      content.focus();
      content.dispatchEvent(
        new KeyboardEvent('keydown', { key: 'a', ctrlKey: true, bubbles: true, cancelable: true }),
      );
      const paste = new Event('paste', { bubbles: true, cancelable: true });
      Object.defineProperty(paste, 'clipboardData', {
        value: { getData: (type: string) => (type === 'text/plain' ? text : '') },
      });
      content.dispatchEvent(paste);
      await fixture.whenStable();
    };
    /** The editor's diagnostics, each with the line it starts on. */
    const diagnostics = () => {
      const found: (Diagnostic & { line: number })[] = [];
      forEachDiagnostic(view.state, (d, from) =>
        found.push({ ...d, line: view.state.doc.lineAt(from).number }),
      );
      return found;
    };
    return { fixture, el, content, view, pasteOver, diagnostics };
  }

  it('shows the rules as text with a name for screen readers and no problems', async () => {
    const { el, content, view, diagnostics } = await setUp();
    expect(JSON.parse(view.state.doc.toString())).toEqual(defaultRules);
    const label = el.querySelector(`#${content.getAttribute('aria-labelledby')}`)!;
    expect(label.textContent).toContain(`The club's rules as text (${view.state.doc.lines} lines)`);
    expect(content.getAttribute('aria-invalid')).toBe('false');
    expect(content.getAttribute('aria-readonly')).toBe('false');
    expect(el.textContent).toContain('The rules are valid.');
    expect(diagnostics()).toEqual([]);
  });

  it('marks a refused rule at its line, in the words the list gives it, and goes there from the list', async () => {
    const { fixture, el, content, view, pasteOver, diagnostics } = await setUp();
    const changed = structuredClone(defaultRules);
    changed.parameters.keepBall.intermediate.formats = [{ attackers: 5, defenders: 1 }];
    const text = JSON.stringify(changed, null, 2);
    await pasteOver(text);

    expect(fixture.componentInstance.taken.at(-1)).toEqual(changed);
    const sentence = 'Keep-ball, Intermediate: 5v1 has more than 4 attackers per defender.';
    const lines = text.split('\n');
    const keepBall = lines.findIndex((l) => l.includes('"keepBall"'));
    const intermediate = lines.findIndex((l, i) => i > keepBall && l.includes('"intermediate"'));
    const formats = lines.findIndex((l, i) => i > intermediate && l.includes('"formats"'));
    // 1-based: the list item's opening brace is the line after "formats": [.
    const line = formats + 2;
    expect(diagnostics()).toEqual([expect.objectContaining({ severity: 'error', message: sentence, line })]);
    expect(content.getAttribute('aria-invalid')).toBe('true');
    const listed = el.querySelector<HTMLButtonElement>('[data-testid=json-problems] button')!;
    expect(listed.textContent).toContain(`Line ${line}`);
    expect(listed.textContent).toContain(sentence);
    listed.click();
    expect(view.state.doc.lineAt(view.state.selection.main.head).number).toBe(line);
    expect(view.hasFocus).toBe(true);
  });

  it('marks a syntax slip where it is and takes nothing from the text until it reads again', async () => {
    const { fixture, el, content, view, pasteOver, diagnostics } = await setUp();
    const good = view.state.doc.toString();
    const lines = good.split('\n');
    lines[2] = lines[2].replace(/,$/, '');
    await pasteOver(lines.join('\n'));

    expect(fixture.componentInstance.taken).toEqual([]);
    const [slip] = diagnostics();
    // The missing comma is noticed at the next line's key.
    expect(slip).toMatchObject({
      severity: 'error',
      line: 4,
      message:
        'The text cannot be read (a comma, quote or bracket out of place?) — nothing is taken from it until it can.',
    });
    expect(el.querySelector('[data-testid=json-syntax-error]')?.textContent).toContain('from line 4');
    expect(content.getAttribute('aria-invalid')).toBe('true');

    await pasteOver(good);
    expect(diagnostics()).toEqual([]);
    expect(fixture.componentInstance.taken).toEqual([defaultRules]);
  });

  it('follows a change made in the tables and is read-only when the rules are not being edited', async () => {
    const { fixture, content, view, pasteOver } = await setUp();
    const changed = structuredClone(defaultRules);
    changed.parameters.keepBall.intermediate.formats = [{ attackers: 3, defenders: 1 }];
    fixture.componentInstance.body.set(changed);
    fixture.componentInstance.readOnly.set(true);
    await fixture.whenStable();
    expect(JSON.parse(view.state.doc.toString())).toEqual(changed);
    expect(fixture.componentInstance.taken).toEqual([]);
    expect(content.getAttribute('aria-readonly')).toBe('true');
    await pasteOver('{}');
    expect(JSON.parse(view.state.doc.toString())).toEqual(changed);
  });
});
