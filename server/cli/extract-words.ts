/**
 * Extracts the words the server writes (`npm run i18n:extract` runs it after `ng extract-i18n`).
 *
 * The app's extraction (`ng extract-i18n` → src/locale/messages.xlf) holds every message in the
 * app's bundle, the engine's and shared/ words included. What only the server says (the printed
 * card, e-mails, API messages, engine words the app never shows) is found here: every
 * server/engine/shared TypeScript file is transpiled (typescript's transpileModule, which keeps
 * `$localize` tagged templates) and Angular's own extractor (`localize-extract`) reads them. Messages
 * the app's file already holds are left out; the rest go to server/locale/messages.xlf, and
 * server/locale/messages.<language>.xlf keeps each message's translation by id: new messages come
 * without one (a translator adds it), removed ones go.
 */
import { execFileSync } from 'node:child_process';
import {
  existsSync,
  mkdirSync,
  mkdtempSync,
  readdirSync,
  readFileSync,
  rmSync,
  writeFileSync,
} from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, relative } from 'node:path';
import ts from 'typescript';
import { LANGUAGES, SOURCE_LANGUAGE } from '../../shared/i18n/languages';

const root = join(import.meta.dirname, '../..');
const FOLDERS = ['server', 'engine', 'shared'];
const SOURCE_LOCALE = LANGUAGES.find((l) => l.code === SOURCE_LANGUAGE)!.locale;

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const path = join(dir, entry.name);
    if (entry.isDirectory()) return entry.name === 'generated' ? [] : sourceFiles(path);
    return /\.ts$/.test(entry.name) && !/\.(spec|d)\.ts$/.test(entry.name) ? [path] : [];
  });
}

/** The trans-units of an XLIFF 1.2 file written by Angular's tools, each as its id and inner XML. */
function unitsOf(xml: string): Map<string, string> {
  const units = new Map<string, string>();
  for (const [, id, body] of xml.matchAll(/<trans-unit id="([^"]+)"[^>]*>([\s\S]*?)<\/trans-unit>/g))
    units.set(id!, body!);
  return units;
}

const part = (body: string, element: 'source' | 'target') =>
  new RegExp(`<${element}[^>]*>[\\s\\S]*?</${element}>`).exec(body)?.[0];
const notes = (body: string) => [...body.matchAll(/<note [^>]*>[\s\S]*?<\/note>/g)].map((m) => m[0]);

function xliff(units: string[], targetLanguage?: string): string {
  const target = targetLanguage ? ` target-language="${targetLanguage}"` : '';
  return [
    '<?xml version="1.0" encoding="UTF-8" ?>',
    '<xliff version="1.2" xmlns="urn:oasis:names:tc:xliff:document:1.2">',
    `  <file source-language="${SOURCE_LOCALE}"${target} datatype="plaintext" original="server">`,
    '    <body>',
    ...units,
    '    </body>',
    '  </file>',
    '</xliff>',
    '',
  ].join('\n');
}

function unitXml(id: string, lines: (string | undefined)[]): string {
  return [
    `      <trans-unit id="${id}" datatype="html">`,
    ...lines.filter(Boolean).map((line) => `        ${line}`),
    '      </trans-unit>',
  ].join('\n');
}

const work = mkdtempSync(join(tmpdir(), 'cw-words-'));
try {
  for (const file of FOLDERS.flatMap((folder) => sourceFiles(join(root, folder)))) {
    const out = join(work, relative(root, file)).replace(/\.ts$/, '.js');
    mkdirSync(dirname(out), { recursive: true });
    const { outputText } = ts.transpileModule(readFileSync(file, 'utf8'), {
      compilerOptions: { target: ts.ScriptTarget.ES2022, module: ts.ModuleKind.ESNext },
      fileName: file,
    });
    writeFileSync(out, outputText);
  }
  execFileSync(
    join(root, 'node_modules/.bin/localize-extract'),
    [
      '-r',
      work,
      '-s',
      '**/*.js',
      '-f',
      'xlf',
      '-o',
      'messages.xlf',
      '-l',
      SOURCE_LOCALE,
      '--useSourceMaps',
      'false',
    ],
    { stdio: ['ignore', 'ignore', 'inherit'] },
  );
  const app = unitsOf(readFileSync(join(root, 'src/locale/messages.xlf'), 'utf8'));
  const extracted = [...unitsOf(readFileSync(join(work, 'messages.xlf'), 'utf8'))]
    .filter(([id]) => !app.has(id))
    .sort(([a], [b]) => a.localeCompare(b));
  const folder = join(root, 'server/locale');
  mkdirSync(folder, { recursive: true });
  writeFileSync(
    join(folder, 'messages.xlf'),
    xliff(extracted.map(([id, body]) => unitXml(id, [part(body, 'source'), ...notes(body)]))),
  );
  for (const { code } of LANGUAGES.filter((l) => l.code !== SOURCE_LANGUAGE)) {
    const file = join(folder, `messages.${code}.xlf`);
    const before = existsSync(file) ? unitsOf(readFileSync(file, 'utf8')) : new Map<string, string>();
    const units = extracted.map(([id, body]) => {
      const kept = before.get(id);
      return unitXml(id, [part(body, 'source'), kept && part(kept, 'target'), ...notes(body)]);
    });
    writeFileSync(file, xliff(units, code));
    const untranslated = extracted.filter(([id]) => !before.get(id)?.includes('<target')).length;
    console.log(
      `server/locale/messages.${code}.xlf: ${extracted.length} messages, ${untranslated} to translate`,
    );
  }
} finally {
  rmSync(work, { recursive: true, force: true });
}
