import '../../shared/i18n/localize';
import { createHmac } from 'node:crypto';
import { CsvError, parse } from 'csv-parse/sync';
import type { CsvPreview, CsvPreviewRow, CsvRowError } from '../../shared/types/api';
import { badRequest } from '../http/problem';
import { cleanName, nameKey, pickName, shortName, TakenNames } from './player-names';

/** Most players a single import may add. */
export const MAX_IMPORT_ROWS = 60;

/** Longest stored name, counted in characters as the request schema counts them. */
const MAX_NAME_LENGTH = 40;

/**
 * Most lines under the heading a preview reads: a longer file is read no further, so a large
 * upload costs no more time than this many lines (one file adds at most MAX_IMPORT_ROWS anyway).
 */
export const MAX_PREVIEW_LINES = 200;

/** Most problems a preview lists one by one; the rest are summed up in one line. */
export const MAX_PREVIEW_ERRORS = 50;

/** Longest name cell worth shortening: anything longer is refused at once. */
const MAX_NAME_CELL = 200;

/** Most characters of a cell quoted back in a message. */
const MAX_QUOTED = 40;

/** A cell as quoted back to the coach: long ones shortened, so an answer stays small. */
function quoted(cell: string): string {
  const chars = [...cell.slice(0, MAX_QUOTED * 2)];
  return chars.length > MAX_QUOTED ? `${chars.slice(0, MAX_QUOTED).join('')}…` : cell;
}

// Column headings are compared in lower case with anything but letters removed. A file is read
// the same whatever the reader's language: English and Spanish headings and answers both count.
const NAME_HEADERS = [
  'name',
  'displayname',
  'player',
  'playername',
  'fullname',
  'child',
  'nombre',
  'jugador',
];
const FIRST_HEADERS = ['firstname', 'givenname', 'forename'];
const FAMILY_HEADERS = ['lastname', 'familyname', 'surname', 'apellido'];
const KEEPER_HEADERS = [
  'goalkeeper',
  'gk',
  'keeper',
  'goalie',
  'playsingoal',
  'portero',
  'portera',
  'arquero',
];
/** "Nombre" beside "Apellidos" is the first name (Spanish lists keep the family names apart). */
const GIVEN_NAME_ALONE = 'nombre';
const YES = ['yes', 'y', 'true', '1', 'gk', 'x', 'sí', 'si', 's'];
const NO = ['no', 'n', 'false', '0', ''];
const DELIMITERS = [',', ';', '\t'];

const fileError = (message: string) => badRequest(message, [{ field: 'file', message }]);

/** A name too long to keep, on line `line`. */
const tooLong = (line: number) =>
  $localize`Line ${line}:line:: the name is longer than ${MAX_NAME_LENGTH}:maxLetters: letters even when shortened.`;

/** Reads the upload as UTF-8 text (a byte-order mark is dropped), or answers 400 saying which encoding to use. */
export function decodeUtf8(buffer: Buffer): string {
  if (buffer.length === 0) throw fileError($localize`The file is empty.`);
  if ((buffer[0] === 0xff && buffer[1] === 0xfe) || (buffer[0] === 0xfe && buffer[1] === 0xff)) {
    throw fileError($localize`The file is UTF-16 text. Save it as “CSV UTF-8” and upload it again.`);
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    throw fileError(
      $localize`The file is not UTF-8 text (perhaps Latin-1 or a spreadsheet file). Save it as “CSV UTF-8”.`,
    );
  }
  if (text.includes('\u0000')) throw fileError($localize`The file is not a text file. Upload a CSV file.`);
  return text.replace(/^\uFEFF/, '');
}

function headingKey(cell: string): string {
  return cell.toLowerCase().replace(/[^\p{L}]/gu, '');
}

/** A heading matches a list when it starts with one of its words ("Goalkeeper (yes/no)" is a goalkeeper column). */
const matches = (list: string[], cell: string) => list.some((word) => headingKey(cell).startsWith(word));

const isHeading = (cell: string) =>
  [NAME_HEADERS, FIRST_HEADERS, FAMILY_HEADERS, KEEPER_HEADERS].some((list) => matches(list, cell));

/** Splits one line on a delimiter, ignoring delimiters inside double quotes. */
function splitLine(line: string, delimiter: string): string[] {
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (const c of line) {
    if (c === '"') quoted = !quoted;
    else if (c === delimiter && !quoted) {
      cells.push(cell);
      cell = '';
    } else cell += c;
  }
  return [...cells, cell];
}

/**
 * The delimiter of the header line: the one that splits it into known column headings, else the
 * one it holds most often (a comma when it holds none).
 */
function detectDelimiter(header: string): string {
  const score = (d: string) => {
    const cells = splitLine(header, d);
    return [cells.filter(isHeading).length, cells.length - 1] as const;
  };
  const ranked = DELIMITERS.map((d) => ({ d, s: score(d) })).sort(
    (a, b) => b.s[0] - a.s[0] || b.s[1] - a.s[1],
  );
  return ranked[0]!.s[1] > 0 ? ranked[0]!.d : ',';
}

/** Signs the checked lines, so a commit can prove it sends the lines the preview read. */
export function importSignature(
  secret: string,
  teamId: string,
  rows: Pick<CsvPreviewRow, 'row' | 'goalkeeper'>[],
): string {
  const canonical = JSON.stringify(rows.map((r) => [r.row, r.goalkeeper]));
  return createHmac('sha256', secret).update(`${teamId}\n${canonical}`).digest('base64url');
}

/** A csv-parse error in a coach's words: `line` where the parser stopped, `start` where the record began. */
function parseProblem(code: string, line: number, start: number): never {
  let message: string;
  if (code === 'CSV_QUOTE_NOT_CLOSED') {
    message = $localize`Line ${start}:line: opens a quotation mark (") that is never closed. Remove it or add the closing one.`;
  } else if (code === 'CSV_INVALID_CLOSING_QUOTE' || code === 'CSV_NON_TRIMABLE_CHAR_AFTER_CLOSING_QUOTE') {
    message = $localize`Line ${line}:line: has text straight after a closing quotation mark ("). Remove the quotation marks around that name.`;
  } else {
    message = $localize`Line ${line}:line: could not be read. Save the list again as “CSV UTF-8” from your spreadsheet.`;
  }
  throw fileError(message);
}

interface FileLine {
  line: number;
  cells: string[];
}

/**
 * The text of line `n` (from 1) of `body`, or undefined past its end. Asked for lines in rising
 * order, it walks the body once, and only as far as it is asked.
 */
function lineWalker(body: string): (n: number) => string | undefined {
  let line = 1;
  let start = 0;
  return (n) => {
    while (line < n) {
      const end = body.indexOf('\n', start);
      if (end === -1) return undefined;
      start = end + 1;
      line++;
    }
    const end = body.indexOf('\n', start);
    return body.slice(start, end === -1 ? undefined : end);
  };
}

/**
 * The file's records with the line each starts on (the file's own numbering: the first line is 1),
 * at most `maxRecords` of them: the parser stops there and reads no further.
 */
function readLines(text: string, maxRecords: number): { lines: FileLine[]; delimiter: string } {
  // Line ends made alike, without splitting the whole file into lines: only the part the
  // parser reads is ever walked line by line.
  const normalised = text.replace(/\r\n?/g, '\n');
  const firstEnd = normalised.indexOf('\n');
  const firstLine = firstEnd === -1 ? normalised : normalised.slice(0, firstEnd);
  // Some spreadsheets write "sep=;" above the header to name the delimiter.
  const sep = /^sep=(.)$/i.exec(firstLine.trim());
  const offset = sep ? 1 : 0;
  const body = !sep ? normalised : firstEnd === -1 ? '' : normalised.slice(firstEnd + 1);
  const headerLines = lineWalker(body);
  let headerLine = '';
  for (let n = 1; ; n++) {
    const line = headerLines(n);
    if (line === undefined) break;
    if (line.trim() !== '') {
      headerLine = line;
      break;
    }
  }
  const delimiter = sep?.[1] ?? detectDelimiter(headerLine);

  // Where the next record starts: after the previous one's last line, past blank lines.
  const bodyLines = lineWalker(body);
  let previousEnd = 0;
  const nextStart = () => {
    let line = previousEnd + 1;
    for (let text = bodyLines(line); text !== undefined && text.trim() === ''; text = bodyLines(line)) line++;
    return line;
  };
  const lines: FileLine[] = [];
  try {
    parse(body, {
      delimiter,
      relax_column_count: true,
      relax_quotes: true,
      skip_empty_lines: true,
      trim: true,
      to: maxRecords,
      on_record: (record: string[], context: { lines: number }) => {
        lines.push({ line: nextStart() + offset, cells: record });
        previousEnd = context.lines;
        return record;
      },
    });
  } catch (error) {
    const csvError = error instanceof CsvError ? error : null;
    const errorLine = (csvError as { lines?: number } | null)?.lines;
    parseProblem(
      csvError?.code ?? '',
      errorLine ? errorLine + offset : nextStart() + offset,
      nextStart() + offset,
    );
  }
  return { lines, delimiter };
}

interface Columns {
  name: number;
  first: number;
  family: number;
  keeper: number;
}

function findColumns(header: string[]): Columns {
  const find = (list: string[]) => header.findIndex((cell) => matches(list, cell));
  const columns = {
    name: find(NAME_HEADERS),
    first: find(FIRST_HEADERS),
    family: find(FAMILY_HEADERS),
    keeper: find(KEEPER_HEADERS),
  };
  if (columns.name >= 0 && columns.family >= 0 && headingKey(header[columns.name]!) === GIVEN_NAME_ALONE)
    return { ...columns, name: -1, first: columns.name };
  return columns;
}

function fullName(cells: string[], columns: Columns): string {
  const cell = (i: number) => (i >= 0 ? (cells[i] ?? '') : '');
  if (columns.name >= 0) {
    // Club lists often write "Family, First": turned round, so the first name comes first.
    const name = cleanName(cell(columns.name));
    const reversed = /^([^,]+),\s*([^,]+)$/.exec(name);
    return reversed ? cleanName(`${reversed[2]} ${reversed[1]}`) : name;
  }
  return cleanName(`${cell(columns.first)} ${cell(columns.family)}`);
}

/**
 * Reads a roster file into the players it would add and the lines it cannot use, each said in a
 * sentence with the file's line number. Stateless: nothing is stored yet.
 */
export function previewRoster(
  text: string,
  existingNames: string[],
  sign: (rows: CsvPreviewRow[]) => string,
): CsvPreview {
  // The heading, MAX_PREVIEW_LINES lines, and one more that tells whether the file goes on.
  const { lines } = readLines(text, MAX_PREVIEW_LINES + 2);
  if (!lines.length) throw fileError($localize`The file has no lines with names.`);
  const [header, ...read] = lines;
  const records = read.slice(0, MAX_PREVIEW_LINES);
  const stoppedAt = read[MAX_PREVIEW_LINES]?.line;
  const columns = findColumns(header!.cells);
  if (columns.name < 0 && columns.first < 0) {
    const firstLine = header!.cells.join(', ').slice(0, 80);
    throw fileError(
      $localize`The first line must name the columns: “Name”, and “Goalkeeper” if you have one. This file's first line says “${firstLine}:firstLine:”.`,
    );
  }

  const rows: CsvPreviewRow[] = [];
  const errors: CsvRowError[] = [];
  const onTeam = new TakenNames(existingNames);
  const taken = new TakenNames(existingNames);
  const firstLineOf = new Map<string, number>();
  const fullNameLines = new Map<string, number>();
  const leftOut: number[] = [];
  // Problems past MAX_PREVIEW_ERRORS: counted, and the first one's line kept for the summary.
  let unlisted = 0;
  let firstUnlisted = 0;
  for (const { line, cells } of records) {
    if (cells.every((c) => c === '')) continue; // a spreadsheet's empty row
    const problem = (field: string, message: string) => {
      if (errors.length < MAX_PREVIEW_ERRORS) errors.push({ row: line, field, message });
      else if (unlisted++ === 0) firstUnlisted = line;
    };
    const nameCells = [columns.name, columns.first, columns.family].filter((i) => i >= 0);
    if (nameCells.some((i) => (cells[i] ?? '').length > MAX_NAME_CELL)) {
      // Far too long to be a name however it is shortened: refused before any work on it.
      problem('name', tooLong(line));
      continue;
    }
    const raw = fullName(cells, columns);
    const rawKeeper = (columns.keeper >= 0 ? (cells[columns.keeper] ?? '') : '').toLowerCase();
    if (!raw) {
      problem('name', $localize`Line ${line}:line: has no name.`);
      continue;
    }
    if (/[@0-9<>]/.test(raw)) {
      const said = quoted(raw);
      problem(
        'name',
        $localize`Line ${line}:line:: “${said}:name:” is not just a name. Leave out numbers, e-mail addresses and < >.`,
      );
      continue;
    }
    if (!YES.includes(rawKeeper) && !NO.includes(rawKeeper)) {
      const said = quoted(rawKeeper);
      problem(
        'goalkeeper',
        $localize`Line ${line}:line:: Goalkeeper says “${said}:answer:”. Write yes or no, or leave it empty.`,
      );
      continue;
    }
    // The same full name twice in one file: letters of the family name cannot tell them apart.
    const twin = fullNameLines.get(nameKey(raw));
    const picked = twin ? { name: shortName(raw), clash: true as const } : pickName(raw, taken);
    if (!twin) fullNameLines.set(nameKey(raw), line);
    if ([...picked.name].length > MAX_NAME_LENGTH) {
      problem('name', tooLong(line));
      continue;
    }
    if (rows.length >= MAX_IMPORT_ROWS) {
      leftOut.push(line);
      continue;
    }
    const row: CsvPreviewRow = { row: line, displayName: picked.name, goalkeeper: YES.includes(rawKeeper) };
    // Where a name is already: on the team, else on an earlier line of this file.
    const earlierLine = (name: string) => (onTeam.has(name) ? null : firstLineOf.get(nameKey(name)));
    if (picked.clash) {
      row.clash = true;
      const name = picked.name;
      const earlier = earlierLine(name);
      row.note = twin
        ? $localize`Line ${twin}:line: has the same name. Type a name the team can tell apart, or leave the line out.`
        : earlier === null
          ? $localize`${name}:name: is already on the team. Type a name the team can tell apart, or leave the line out.`
          : $localize`${name}:name: is already in this file (line ${earlier}:line:). Type a name the team can tell apart, or leave the line out.`;
    } else {
      if (picked.lengthenedFrom) {
        const from = picked.lengthenedFrom;
        const name = picked.name;
        const earlier = earlierLine(from);
        row.note =
          earlier === null
            ? $localize`${from}:shortName: is already on the team, so this player is “${name}:longerName:”. Leave the line out if it is the same child.`
            : $localize`${from}:shortName: is already in this file (line ${earlier}:line:), so this player is “${name}:longerName:”. Leave the line out if it is the same child.`;
      }
      taken.add(picked.name);
      firstLineOf.set(nameKey(picked.name), line);
    }
    rows.push(row);
  }
  if (leftOut.length) {
    const first = leftOut[0]!;
    const last = leftOut.at(-1)!;
    errors.push({
      row: first,
      field: 'file',
      message:
        leftOut.length === 1
          ? $localize`Line ${first}:line: was left out: one file adds at most ${MAX_IMPORT_ROWS}:maxPlayers: players.`
          : $localize`Lines ${first}:firstLine: to ${last}:lastLine: were left out: one file adds at most ${MAX_IMPORT_ROWS}:maxPlayers: players.`,
    });
  }
  if (unlisted) {
    errors.push({
      row: firstUnlisted,
      field: 'file',
      message:
        unlisted === 1
          ? $localize`Line ${firstUnlisted}:line: cannot be used either. Fix the lines above and choose the file again to see why.`
          : $localize`${unlisted}:count: more lines, from line ${firstUnlisted}:line: on, cannot be used either. Fix the lines above and choose the file again to see why.`,
    });
  }
  if (stoppedAt !== undefined) {
    errors.push({
      row: stoppedAt,
      field: 'file',
      message: $localize`Reading stopped at line ${stoppedAt}:line:: a preview reads at most ${MAX_PREVIEW_LINES}:maxLines: lines under the heading. Put the rest in another file.`,
    });
  }
  return { importId: sign(rows), rows, errors };
}
