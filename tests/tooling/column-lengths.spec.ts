/**
 * Every text a request may carry fits the varchar(n) column it is written to: a longer one would
 * pass the JSON Schema and then fail in PostgreSQL as a 500 instead of a 400 naming the field.
 * Column lengths are read from the TypeORM entities' own metadata; which schema property writes
 * which column is written out below (names differ too often to match them automatically), and
 * every string property of shared/schemas/api must be either listed as a writer or listed as kept
 * somewhere unbounded (a text or json column, a hash) or not kept at all.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { getMetadataArgsStorage } from 'typeorm';
import { describe, expect, it } from 'vitest';
import { ENTITIES } from '../../server/entities';

const API_DIR = fileURLToPath(new URL('../../shared/schemas/api', import.meta.url));

type Node = Record<string, unknown>;

/**
 * A common.schema.json definition → the "table.column"s written from it: every property that uses
 * the definition is checked against all of them (those it does not write only make the check
 * stricter).
 */
const DEFINITION_WRITES: Record<string, string[]> = {
  personName: ['app_user.name', 'rule_set_change.authorName'],
  email: ['app_user.email', 'invitation.email', 'sign_in_throttle.email'],
  teamName: ['team.name'],
  displayName: ['player.displayName'],
  role: ['membership.role', 'invitation.role'],
  ageGroup: ['team.ageGroup'],
  level: ['team.level'],
};

/** Any other schema property (`<schema>.<path>`, `[]` for array items) → the columns it is written to. */
const WRITES: Record<string, string[]> = {
  'auth-register.clubName': ['club.name'],
  'auth-register.timeZone': ['club.timeZone'],
  'auth-me-update.locale': ['app_user.locale'],
  'team-pinned-activities.activityIds[]': ['team.pinnedActivityIds'],
  'rule-set-create.name': ['rule_set.name'],
  'rule-set-update.name': ['rule_set.name'],
  'scheduled-session.startTime': ['scheduled_session.startTime'],
  'scheduled-session.kind': ['scheduled_session.kind'],
  'scheduled-session.place': ['scheduled_session.place'],
  'scheduled-session-update.startTime': ['scheduled_session.startTime'],
  'scheduled-session-update.kind': ['scheduled_session.kind'],
  'scheduled-session-update.place': ['scheduled_session.place'],
  'weekly-sessions.startTime': ['scheduled_session.startTime'],
  'weekly-sessions.kind': ['scheduled_session.kind'],
  'weekly-sessions.place': ['scheduled_session.place'],
  'plan-create.kickOff': ['session_plan.kickOff'],
  'plan-update.kickOff': ['session_plan.kickOff'],
  'plan-update.status': ['session_plan.status'],
  'feedback-create.stationId': ['feedback.stationId'],
  'feedback-create.verdict': ['feedback.verdict'],
  'feedback-create.clientId': ['feedback.clientId'],
  'plan-progression.stationId': ['feedback.stationId'],
  'plan-progression.verdict': ['feedback.verdict'],
  'plan-progression.clientId': ['feedback.clientId'],
};

/**
 * String properties kept nowhere bounded: compared and dropped, hashed, used to look something up,
 * or kept in a text or json column.
 */
const NOT_IN_A_BOUNDED_COLUMN = new Set([
  // Passwords are kept only as a bcrypt hash; tokens only as a SHA-256 hash or not at all.
  'auth-login.password',
  'auth-register.password',
  'auth-password-change.currentPassword',
  'auth-password-change.newPassword',
  'auth-password-reset-confirm.password',
  'auth-password-reset-confirm.token',
  'auth-email-confirmation.token',
  'invitation-accept.password',
  'invitation-accept.token',
  'invitation-lookup.token',
  'player-import-commit.importId',
  // Compared and dropped: the password that confirms deleting an account, the club's name typed to
  // confirm deleting it.
  'account-delete.password',
  'club-delete.clubName',
  // Looked up, not written.
  'auth-password-reset.email',
  'calendar-param.file',
  'rule-set-param.id',
  'rule-set-create.from',
  'rule-set-rollback.to',
  'plan-pdf-query.paper',
  'plan-share.paper',
  // Text columns (feedback.note) and the plan's json.
  'feedback-create.note',
  'plan-progression.note',
  'plan-replan.add[].name',
  'plan-replan.remove[]',
  'plan-replan.clientId',
  'plan-edit.type',
  // Sent by e-mail (outbox_message.recipients is jsonb, its body text), not kept in a varchar.
  'plan-share.recipients[]',
  'plan-share.message',
]);

/**
 * Patterns that bound a string's length on their own, with the longest text each admits; pinned
 * here by their exact text, so a changed pattern is looked at again.
 */
const PATTERN_BOUNDS: Record<string, number> = {
  '^([01][0-9]|2[0-3]):[0-5][0-9]$': 5,
};

const common = JSON.parse(readFileSync(join(API_DIR, 'common.schema.json'), 'utf8')) as {
  definitions: Record<string, Node>;
};

/** A property's schema, and the common.schema.json definition it uses, if any. */
interface Property {
  schema: Node;
  definition?: string;
}

/** What a `$ref` to common.schema.json points at; other files' refs are not followed. */
function resolve(node: Node): Property | null {
  const ref = node['$ref'];
  if (typeof ref !== 'string') return { schema: node };
  const local = /^(?:common\.schema\.json)?#\/definitions\/(\w+)$/.exec(ref);
  // plan-request, plan-edit and rule-set documents are kept whole in json columns.
  if (!local) return null;
  const inner = resolve(common.definitions[local[1]!]!);
  return inner && { schema: inner.schema, definition: inner.definition ?? local[1]! };
}

/** Every string-typed property of a schema, by path. */
function stringProperties(property: Property | null, path: string, out: Map<string, Property>): void {
  if (!property) return;
  const node = property.schema;
  const type = node['type'];
  if (type === 'string' || (Array.isArray(type) && type.includes('string'))) out.set(path, property);
  for (const [name, child] of Object.entries((node['properties'] ?? {}) as Record<string, Node>)) {
    stringProperties(resolve(child), path ? `${path}.${name}` : name, out);
  }
  if (node['items'] && typeof node['items'] === 'object')
    stringProperties(resolve(node['items'] as Node), `${path}[]`, out);
  for (const key of ['oneOf', 'anyOf', 'allOf'])
    for (const child of (node[key] ?? []) as Node[]) stringProperties(resolve(child), path, out);
}

/** The longest text a string schema admits, or undefined when it sets no bound. */
function longest(schema: Node): number | undefined {
  const bounds: number[] = [];
  if (typeof schema['maxLength'] === 'number') bounds.push(schema['maxLength']);
  if (Array.isArray(schema['enum'])) bounds.push(Math.max(...schema['enum'].map((v) => String(v).length)));
  if (typeof schema['pattern'] === 'string' && PATTERN_BOUNDS[schema['pattern']] !== undefined)
    bounds.push(PATTERN_BOUNDS[schema['pattern']]!);
  return bounds.length ? Math.min(...bounds) : undefined;
}

/** "table.column" → n, for every varchar(n) column of the entities. */
function columnLengths(): Map<string, number> {
  const storage = getMetadataArgsStorage();
  const lengths = new Map<string, number>();
  for (const entity of ENTITIES) {
    const table = storage.tables.find((t) => t.target === entity)?.name;
    if (!table) continue;
    for (const column of storage.columns.filter((c) => c.target === entity)) {
      const length = Number(column.options.length);
      if (length > 0) lengths.set(`${table}.${column.options.name ?? column.propertyName}`, length);
    }
  }
  return lengths;
}

const properties = new Map<string, Property>();
for (const file of readdirSync(API_DIR).filter(
  (f) => f.endsWith('.schema.json') && f !== 'common.schema.json',
)) {
  const schema = JSON.parse(readFileSync(join(API_DIR, file), 'utf8')) as Node;
  stringProperties({ schema }, file.replace('.schema.json', ''), properties);
}
const columns = columnLengths();

/** The columns a property is written to: its own entry, else its definition's. */
function targetsOf(path: string): string[] | undefined {
  const definition = properties.get(path)?.definition;
  return WRITES[path] ?? (definition ? DEFINITION_WRITES[definition] : undefined);
}

const checked = [...properties.keys()].filter((path) => targetsOf(path)).sort();

describe('request fields fit their columns', () => {
  it('the listed columns are varchar(n) columns of the entities', () => {
    expect(columns.get('app_user.name')).toBe(120);
    expect(columns.get('club.name')).toBe(120);
    for (const targets of [...Object.values(WRITES), ...Object.values(DEFINITION_WRITES)])
      for (const target of targets)
        expect(columns.has(target), `${target} is a varchar(n) column`).toBe(true);
  });

  it('every string a request carries is listed as written to a column, or as kept nowhere bounded', () => {
    const unlisted = [...properties.entries()].filter(
      ([path, { schema }]) =>
        !targetsOf(path) &&
        !NOT_IN_A_BOUNDED_COLUMN.has(path) &&
        // Ids made by the server and dates go to uuid and date columns, or are looked up.
        !['uuid', 'date'].includes(String(schema['format'])),
    );
    expect(unlisted.map(([path]) => path)).toEqual([]);
    for (const path of Object.keys(WRITES)) expect(properties.has(path), `${path} is in a schema`).toBe(true);
    for (const definition of Object.keys(DEFINITION_WRITES))
      expect(common.definitions[definition]).toBeDefined();
  });

  it('the user-typed names, e-mails, places and notes are among the checked fields', () => {
    expect(checked).toEqual(
      expect.arrayContaining([
        'auth-register.clubName',
        'auth-register.name',
        'auth-register.email',
        'invitation-accept.name',
        'invitation-create.email',
        'team-create.name',
        'team-update.name',
        'player-create.displayName',
        'player-import-commit.rows[].displayName',
        'rule-set-create.name',
        'scheduled-session.place',
      ]),
    );
  });

  it.each(checked)('%s is no longer than the columns it is written to', (path) => {
    const bound = longest(properties.get(path)!.schema);
    expect(bound, `${path} needs a maxLength`).toBeDefined();
    for (const target of targetsOf(path)!)
      expect(bound, `${path} → ${target}`).toBeLessThanOrEqual(columns.get(target)!);
  });
});
