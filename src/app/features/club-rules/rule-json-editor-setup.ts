/**
 * The CodeMirror pieces of the advanced text view: JSON with line numbers, undo, bracket matching,
 * problems as lint diagnostics (underlined, marked in the gutter, read on hover or with
 * Ctrl-Shift-M / F8) and a theme drawn from the app's Material colours. Tab is left to the page,
 * so keyboard users can leave the editor.
 */
import { defaultKeymap, history, historyKeymap } from '@codemirror/commands';
import { json } from '@codemirror/lang-json';
import { bracketMatching, HighlightStyle, syntaxHighlighting } from '@codemirror/language';
import { lintGutter, lintKeymap } from '@codemirror/lint';
import type { Extension } from '@codemirror/state';
import {
  EditorView,
  highlightActiveLine,
  highlightActiveLineGutter,
  keymap,
  lineNumbers,
} from '@codemirror/view';
import { tags } from '@lezer/highlight';

const MONO = "ui-monospace, 'DejaVu Sans Mono', monospace";

const theme = EditorView.theme({
  '&': {
    minHeight: '60vh',
    maxHeight: '75vh',
    border: '1px solid var(--mat-sys-outline)',
    borderRadius: '8px',
    background: 'var(--mat-sys-surface-container-lowest)',
    color: 'var(--mat-sys-on-surface)',
    fontSize: '13px',
  },
  '&.cm-focused': { outline: '2px solid var(--mat-sys-primary)', outlineOffset: '-1px' },
  '.cm-scroller': { fontFamily: MONO, lineHeight: '20px', borderRadius: '8px' },
  '.cm-content': { caretColor: 'var(--mat-sys-primary)', padding: '8px 0' },
  '.cm-cursor, .cm-dropCursor': { borderLeftColor: 'var(--mat-sys-primary)' },
  '&.cm-focused > .cm-scroller > .cm-selectionLayer .cm-selectionBackground, .cm-selectionBackground, ::selection':
    { background: 'var(--mat-sys-primary-container)' },
  '.cm-activeLine': { background: 'color-mix(in srgb, var(--mat-sys-primary) 6%, transparent)' },
  '.cm-gutters': {
    background: 'var(--mat-sys-surface-container)',
    color: 'var(--mat-sys-on-surface-variant)',
    borderRight: '1px solid var(--mat-sys-outline-variant)',
    borderRadius: '8px 0 0 8px',
  },
  '.cm-activeLineGutter': { background: 'var(--mat-sys-surface-container-high)' },
  '&.cm-focused .cm-matchingBracket': { background: 'var(--mat-sys-secondary-container)' },
  '.cm-lintRange-error': {
    backgroundImage: 'none',
    textDecoration: 'underline wavy var(--mat-sys-error)',
    textUnderlineOffset: '3px',
  },
  '.cm-tooltip': {
    border: '1px solid var(--mat-sys-outline-variant)',
    background: 'var(--mat-sys-surface-container)',
    color: 'var(--mat-sys-on-surface)',
    fontFamily: "'Roboto Condensed', system-ui, sans-serif",
    fontSize: '14px',
    maxWidth: 'min(480px, 90vw)',
  },
  '.cm-diagnostic-error': {
    borderLeft: '4px solid var(--mat-sys-error)',
    background: 'var(--mat-sys-error-container)',
    color: 'var(--mat-sys-on-error-container)',
  },
  '.cm-panel.cm-panel-lint': {
    background: 'var(--mat-sys-surface-container)',
    color: 'var(--mat-sys-on-surface)',
    fontFamily: "'Roboto Condensed', system-ui, sans-serif",
  },
});

const colours = HighlightStyle.define([
  { tag: tags.propertyName, color: 'var(--mat-sys-primary)' },
  { tag: tags.string, color: 'var(--mat-sys-tertiary)' },
  { tag: [tags.number, tags.bool, tags.null], color: 'var(--mat-sys-secondary)', fontWeight: '600' },
  { tag: [tags.brace, tags.squareBracket, tags.separator], color: 'var(--mat-sys-on-surface-variant)' },
]);

/** Everything the text view's editor has apart from its text, read-only state and problems. */
export function ruleJsonEditorSetup(): Extension[] {
  return [
    lineNumbers(),
    highlightActiveLineGutter(),
    highlightActiveLine(),
    history(),
    bracketMatching(),
    json(),
    syntaxHighlighting(colours),
    lintGutter(),
    keymap.of([...defaultKeymap, ...historyKeymap, ...lintKeymap]),
    theme,
  ];
}
