import { createHmac } from 'node:crypto';
import { parse } from 'csv-parse/sync';
import type { CsvPreview, CsvRowError } from '../../shared/types/api';
import { badRequest } from '../http/problem';

/** Most players a single import may add. */
export const MAX_IMPORT_ROWS = 60;

const NAME_HEADERS = ['displayname', 'display name', 'name', 'player', 'first name', 'firstname'];
const KEEPER_HEADERS = ['goalkeeper', 'gk', 'keeper', 'goalie'];
const YES = ['yes', 'y', 'true', '1', 'gk', 'x'];
const NO = ['no', 'n', 'false', '0', ''];

/** Reads the upload as UTF-8 text, or answers 400 saying which encoding to use. */
export function decodeUtf8(buffer: Buffer): string {
  const fileError = (message: string) => badRequest(message, [{ field: 'file', message }]);
  if (buffer.length === 0) throw fileError('The file is empty.');
  if ((buffer[0] === 0xff && buffer[1] === 0xfe) || (buffer[0] === 0xfe && buffer[1] === 0xff)) {
    throw fileError('The file is UTF-16 text. Save it as “CSV UTF-8” and upload it again.');
  }
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    throw fileError(
      'The file is not UTF-8 text (perhaps Latin-1 or a spreadsheet file). Save it as “CSV UTF-8”.',
    );
  }
  if (text.includes('\u0000')) throw fileError('The file is not a text file. Upload a CSV file.');
  return text.replace(/^\uFEFF/, '');
}

/**
 * Keeps what a squad list needs: a first name and the initial of the family name
 * ("Maya Okafor" → "Maya O."). Children's full names are not stored.
 */
export function toDisplayName(raw: string): string {
  const words = raw.trim().split(/\s+/).filter(Boolean);
  if (words.length <= 1) return words[0] ?? '';
  const last = words[words.length - 1]!;
  const initial = last.replace(/\.$/, '').charAt(0).toUpperCase();
  return `${words[0]} ${initial}.`;
}

function detectDelimiter(text: string): string {
  const firstLine = text.split(/\r?\n/, 1)[0] ?? '';
  const counts = [',', ';', '\t'].map((d) => [d, firstLine.split(d).length - 1] as const);
  return counts.sort((a, b) => b[1] - a[1])[0]![1] > 0 ? counts[0]![0] : ',';
}

/** Signs the checked rows, so a commit can prove it sends what the preview checked. */
export function importSignature(secret: string, teamId: string, rows: CsvPreview['rows']): string {
  const canonical = JSON.stringify(rows.map((r) => [r.row, r.displayName, r.goalkeeper]));
  return createHmac('sha256', secret).update(`${teamId}\n${canonical}`).digest('base64url');
}

/** Parses a roster CSV into rows to add and per-row errors. Stateless: nothing is stored yet. */
export function previewRoster(
  text: string,
  existingNames: string[],
  sign: (rows: CsvPreview['rows']) => string,
): CsvPreview {
  let records: string[][];
  try {
    records = parse(text, {
      delimiter: detectDelimiter(text),
      relax_column_count: true,
      skip_empty_lines: true,
      trim: true,
      bom: true,
    }) as string[][];
  } catch (error) {
    const message = `The CSV could not be read: ${(error as Error).message}`;
    throw badRequest(message, [{ field: 'file', message }]);
  }
  if (!records.length) throw badRequest('The file has no rows.', [{ field: 'file', message: 'has no rows' }]);

  const header = records[0]!.map((cell) => cell.toLowerCase());
  let nameColumn = header.findIndex((cell) => NAME_HEADERS.includes(cell));
  let keeperColumn = header.findIndex((cell) => KEEPER_HEADERS.includes(cell));
  let firstDataRow = 1;
  if (nameColumn < 0) {
    // No header: the first column holds names, an optional second the goalkeeper flag.
    nameColumn = 0;
    keeperColumn = records[0]!.length > 1 ? 1 : -1;
    firstDataRow = 0;
  }

  const rows: CsvPreview['rows'] = [];
  const errors: CsvRowError[] = [];
  const seen = new Set(existingNames.map((n) => n.toLowerCase()));
  for (let index = firstDataRow; index < records.length; index++) {
    const record = records[index]!;
    const row = index + 1; // 1-based line number as a spreadsheet shows it
    const rawName = record[nameColumn] ?? '';
    const rawKeeper = (keeperColumn >= 0 ? (record[keeperColumn] ?? '') : '').toLowerCase();
    const rowErrors: CsvRowError[] = [];
    if (!rawName) rowErrors.push({ row, field: 'displayName', message: 'is empty' });
    else if (/[@0-9<>]/.test(rawName)) {
      rowErrors.push({
        row,
        field: 'displayName',
        message: 'must be a name only: no digits, e-mail addresses or markup',
      });
    }
    const displayName = toDisplayName(rawName);
    if (displayName.length > 40)
      rowErrors.push({ row, field: 'displayName', message: 'is longer than 40 characters' });
    if (!YES.includes(rawKeeper) && !NO.includes(rawKeeper)) {
      rowErrors.push({ row, field: 'goalkeeper', message: `“${rawKeeper}” is not yes or no` });
    }
    if (displayName && seen.has(displayName.toLowerCase())) {
      rowErrors.push({
        row,
        field: 'displayName',
        message: `${displayName} is already on the team or in the file`,
      });
    }
    if (rows.length >= MAX_IMPORT_ROWS && rowErrors.length === 0) {
      rowErrors.push({ row, field: 'row', message: `at most ${MAX_IMPORT_ROWS} players per import` });
    }
    if (rowErrors.length) {
      errors.push(...rowErrors);
      continue;
    }
    seen.add(displayName.toLowerCase());
    rows.push({ row, displayName, goalkeeper: YES.includes(rawKeeper) });
  }
  return { importId: sign(rows), rows, errors };
}
