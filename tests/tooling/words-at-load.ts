/**
 * Finds `$localize` words that run when a module loads rather than when they are read. On the
 * server a request's language is known only while the request runs (server/i18n/translations.ts),
 * so a word made at load — a `const LABELS = { lead: $localize`…` }` at a module's top level —
 * stays in the source language for every reader. In server/, engine/ and shared/ words are made
 * inside a function, a getter or an arrow function instead.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import ts from 'typescript';

export interface WordAtLoad {
  file: string;
  line: number;
  text: string;
}

/** Each `$localize` in `source` that no function, getter or arrow function wraps. */
export function wordsAtLoad(source: string, file = 'sample.ts'): WordAtLoad[] {
  const sf = ts.createSourceFile(file, source, ts.ScriptTarget.ES2022, true);
  const found: WordAtLoad[] = [];
  const visit = (node: ts.Node, wrapped: boolean): void => {
    if (ts.isTaggedTemplateExpression(node) && node.tag.getText(sf) === '$localize' && !wrapped) {
      found.push({
        file,
        line: sf.getLineAndCharacterOfPosition(node.getStart(sf)).line + 1,
        text: node.template.getText(sf).slice(0, 80),
      });
    }
    ts.forEachChild(node, (child) => visit(child, wrapped || ts.isFunctionLike(child)));
  };
  visit(sf, false);
  return found;
}

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return entry.name === 'node_modules' ? [] : sourceFiles(path);
    return /\.ts$/.test(entry.name) && !/\.(spec|d)\.ts$/.test(entry.name) ? [path] : [];
  });
}

/** Every word made at load in the server, the engine and shared/. */
export function wordsAtLoadInProject(root: string): WordAtLoad[] {
  return ['server', 'engine', 'shared']
    .flatMap((folder) => sourceFiles(join(root, folder)))
    .flatMap((file) => wordsAtLoad(readFileSync(file, 'utf8'), relative(root, file)));
}
