/**
 * Finds words in the app's templates that no translation can reach: text outside an element
 * marked `i18n`, a readable attribute without its `i18n-…` mark, and words written as string
 * literals inside a binding (`{{ n === 1 ? 'bib' : 'bibs' }}`, `[attr.aria-label]="'Area of ' + x"`),
 * which stay English even inside a marked element. Angular's own template parser reads the
 * templates, so what it sees is what `ng extract-i18n` sees.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import {
  ASTWithSource,
  Binary,
  BindingType,
  Conditional,
  Interpolation,
  LiteralPrimitive,
  parseTemplate,
  TmplAstBoundAttribute,
  TmplAstBoundText,
  TmplAstElement,
  TmplAstIcu,
  TmplAstTemplate,
  TmplAstText,
  TmplAstTextAttribute,
  type AST,
} from '@angular/compiler';

export interface Unmarked {
  file: string;
  line: number;
  what: string;
  text: string;
}

/** Attributes a person reads or hears; others are read only when they hold a sentence. */
const READABLE = new Set([
  'placeholder',
  'title',
  'aria-label',
  'aria-description',
  'aria-roledescription',
  'aria-valuetext',
  'alt',
  'label',
  'mattooltip',
  'heading',
  'message',
  'hint',
]);
/** Attributes that hold code, never words, whatever they look like. */
const TECHNICAL = new Set([
  'class',
  'id',
  'type',
  'name',
  'role',
  'autocomplete',
  'inputmode',
  'svgicon',
  'routerlink',
  'formcontrolname',
  'data-testid',
  'for',
  'href',
  'src',
  'rel',
  'target',
  'style',
  'viewbox',
  'd',
  'fill',
  'stroke',
  'transform',
  'points',
  'pattern',
  'accept',
  'matcolumndef',
  'mat-sort-header',
  'fontset',
  'appearance',
  'color',
  'enterkeyhint',
  'xmlns',
  'preserveaspectratio',
]);

const WORDS = /[A-Za-z]{2,}/;

function isReadableAttribute(name: string, value: string): boolean {
  const key = name.toLowerCase().replace(/^attr\./, '');
  if (TECHNICAL.has(key) || key.startsWith('data-') || key.startsWith('aria-controls')) return false;
  if (!WORDS.test(value)) return false;
  return READABLE.has(key) || /\s/.test(value.trim());
}

/** String literals a binding shows as they are: the whole value, a branch of `?:`, a part of `+`. */
function shownLiterals(ast: AST, out: string[] = [], branch = false): string[] {
  if (ast instanceof ASTWithSource) return shownLiterals(ast.ast, out, branch);
  if (ast instanceof Interpolation) {
    for (const e of ast.expressions) shownLiterals(e, out);
  } else if (ast instanceof LiteralPrimitive) {
    // A branch may add a single letter to a word: `bib{{ n === 1 ? '' : 's' }}`.
    if (typeof ast.value === 'string' && (branch ? /[A-Za-z]/ : WORDS).test(ast.value)) out.push(ast.value);
  } else if (ast instanceof Conditional) {
    shownLiterals(ast.trueExp, out, true);
    shownLiterals(ast.falseExp, out, true);
  } else if (ast instanceof Binary && ast.operation === '+') {
    shownLiterals(ast.left, out, branch);
    shownLiterals(ast.right, out, branch);
  }
  return out;
}

interface Located {
  sourceSpan?: { start: { line: number } };
}

/** The unmarked words of one template; `firstLine` places an inline template in its file. */
export function unmarkedIn(template: string, file: string, firstLine = 0): Unmarked[] {
  const found: Unmarked[] = [];
  const parsed = parseTemplate(template, file, { preserveWhitespaces: false });
  for (const e of parsed.errors ?? []) {
    found.push({ file, line: firstLine + 1, what: 'template does not parse', text: String(e) });
  }
  const add = (node: Located, what: string, text: string) =>
    found.push({
      file,
      line: firstLine + (node.sourceSpan?.start.line ?? 0) + 1,
      what,
      text: text.trim().replace(/\s+/g, ' ').slice(0, 80),
    });

  const visit = (node: unknown, marked: boolean): void => {
    if (!node || typeof node !== 'object') return;
    if (Array.isArray(node)) {
      for (const n of node) visit(n, marked);
      return;
    }
    if (node instanceof TmplAstText) {
      if (!marked && WORDS.test(node.value)) add(node, 'text not marked i18n', node.value);
      return;
    }
    if (node instanceof TmplAstBoundText) {
      const source = (node.value as ASTWithSource).source ?? '';
      const outside = source.replace(/\{\{[\s\S]*?\}\}/g, ' ');
      if (!marked && WORDS.test(outside)) add(node, 'text not marked i18n', source);
      for (const literal of shownLiterals(node.value)) add(node, 'words inside a binding', literal);
      return;
    }
    if (node instanceof TmplAstIcu) {
      if (!marked) add(node as Located, 'plural/select not marked i18n', '{…}');
      return;
    }
    if (node instanceof TmplAstElement || node instanceof TmplAstTemplate) {
      const inside = marked || !!node.i18n;
      const attributes: TmplAstTextAttribute[] = [
        ...node.attributes,
        ...(node instanceof TmplAstTemplate
          ? node.templateAttrs.filter((a) => a instanceof TmplAstTextAttribute)
          : []),
      ] as TmplAstTextAttribute[];
      for (const a of attributes) {
        if (!a.i18n && isReadableAttribute(a.name, a.value))
          add(a, `attribute "${a.name}" not marked i18n-${a.name}`, a.value);
      }
      for (const input of node.inputs as TmplAstBoundAttribute[]) {
        const key = input.name.toLowerCase();
        // `aria-label="Area of {{ x }}"` (marked or not) binds a DOM property of that name, which
        // writes no attribute: screen readers get nothing. `[attr.aria-label]` writes it.
        if (
          input.type === BindingType.Property &&
          key.startsWith('aria-') &&
          node instanceof TmplAstElement &&
          !node.name.includes('-')
        )
          add(
            input,
            `[${input.name}] writes no attribute: use [attr.${input.name}]`,
            (input.value as ASTWithSource).source ?? '',
          );
        if (!READABLE.has(key.replace(/^attr\./, ''))) continue;
        for (const literal of shownLiterals(input.value)) add(input, `words inside [${input.name}]`, literal);
      }
      visit(node.children, inside);
      return;
    }
    // Control flow blocks (@if, @for, @switch, @defer…) and their branches.
    for (const key of [
      'children',
      'branches',
      'cases',
      'groups',
      'empty',
      'placeholder',
      'loading',
      'error',
    ]) {
      visit((node as Record<string, unknown>)[key], marked);
    }
  };
  visit(parsed.nodes, false);
  return found;
}

function filesUnder(dir: string, out: string[] = []): string[] {
  for (const entry of readdirSync(dir)) {
    const path = join(dir, entry);
    if (statSync(path).isDirectory()) filesUnder(path, out);
    else if (/\.(html|ts)$/.test(entry) && !entry.endsWith('.spec.ts')) out.push(path);
  }
  return out;
}

/** Every unmarked word in the app's templates, files and inline `template:` strings alike. */
export function unmarkedInApp(root: string): Unmarked[] {
  const found: Unmarked[] = [];
  for (const path of filesUnder(join(root, 'src', 'app'))) {
    const file = relative(root, path);
    const source = readFileSync(path, 'utf8');
    if (path.endsWith('.html')) {
      found.push(...unmarkedIn(source, file));
      continue;
    }
    for (const match of source.matchAll(/\btemplate:\s*`((?:[^`\\]|\\.)*)`/g)) {
      const firstLine = source.slice(0, match.index! + match[0].indexOf('`')).split('\n').length - 1;
      found.push(...unmarkedIn(match[1], file, firstLine));
    }
  }
  return found;
}
