/**
 * The JSON Schemas cannot import MIN_PASSWORD_LENGTH (shared/types/password-rules.ts), so this
 * checks that they say the same: every property of shared/schemas that takes a password is either
 * a new password, which uses common.schema.json's `password` definition with that minimum, or one
 * of the listed fields that take an existing password (signing in, the current password), which
 * stay permissive so passwords chosen under an older minimum still work.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { MIN_PASSWORD_LENGTH } from '../../shared/types/password-rules';

const SCHEMA_ROOT = fileURLToPath(new URL('../../shared/schemas', import.meta.url));
const NEW_PASSWORD_REF = 'common.schema.json#/definitions/password';
/** Fields that take a password someone already has, by schema file and property path. */
const EXISTING_PASSWORD_FIELDS = [
  'api/auth-login.schema.json#password',
  'api/auth-password-change.schema.json#currentPassword',
  'api/account-delete.schema.json#password',
];

type Node = Record<string, unknown>;

function schemaFiles(dir: string, prefix = ''): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) =>
    entry.isDirectory()
      ? schemaFiles(join(dir, entry.name), `${prefix}${entry.name}/`)
      : entry.name.endsWith('.schema.json')
        ? [`${prefix}${entry.name}`]
        : [],
  );
}

/** Every property in a schema whose name says it takes a password, with its path. */
function passwordProperties(node: unknown, path: string[] = []): { path: string; schema: Node }[] {
  if (!node || typeof node !== 'object') return [];
  const found: { path: string; schema: Node }[] = [];
  for (const [key, value] of Object.entries(node as Node)) {
    if (key === 'properties' && value && typeof value === 'object') {
      for (const [name, schema] of Object.entries(value as Node)) {
        if (/password/i.test(name)) found.push({ path: [...path, name].join('/'), schema: schema as Node });
        found.push(...passwordProperties(schema, [...path, name]));
      }
    } else if (key !== 'definitions') {
      found.push(...passwordProperties(value, path));
    }
  }
  return found;
}

const schemas = Object.fromEntries(
  schemaFiles(SCHEMA_ROOT).map((file) => [
    file,
    JSON.parse(readFileSync(join(SCHEMA_ROOT, file), 'utf8')) as Node,
  ]),
);
const definition = (schemas['api/common.schema.json']!['definitions'] as Record<string, Node>)['password']!;

describe('password rules in the JSON Schemas', () => {
  it(`a new password needs at least ${MIN_PASSWORD_LENGTH} characters (OWASP ASVS 4.0 2.1.1), said in words`, () => {
    expect(MIN_PASSWORD_LENGTH).toBeGreaterThanOrEqual(12);
    expect(definition['minLength']).toBe(MIN_PASSWORD_LENGTH);
    expect((definition['messages'] as Record<string, string>)['minLength']).toBe(
      `needs at least ${MIN_PASSWORD_LENGTH} characters`,
    );
    expect(definition['description']).toContain(`at least ${MIN_PASSWORD_LENGTH} characters`);
  });

  it('every password field is a new password using that definition, or a listed existing-password field', () => {
    const existing: string[] = [];
    let newPasswords = 0;
    for (const [file, schema] of Object.entries(schemas)) {
      for (const { path, schema: property } of passwordProperties(schema)) {
        const where = `${file}#${path}`;
        if (EXISTING_PASSWORD_FIELDS.includes(where)) {
          existing.push(where);
          // Permissive: any password that was ever accepted still signs in.
          expect(property['minLength'], where).toBeLessThanOrEqual(1);
          continue;
        }
        expect(property, `${where} takes a new password`).toEqual({ $ref: NEW_PASSWORD_REF });
        newPasswords++;
      }
    }
    expect(existing.sort()).toEqual([...EXISTING_PASSWORD_FIELDS].sort());
    // Creating a club, accepting an invitation, changing a password, choosing one by e-mail.
    expect(newPasswords).toBe(4);
  });

  it('no other schema defines a password with its own minimum', () => {
    for (const [file, schema] of Object.entries(schemas)) {
      const definitions = (schema['definitions'] ?? {}) as Record<string, Node>;
      for (const [name, value] of Object.entries(definitions)) {
        if (!/password/i.test(name)) continue;
        expect(`${file}#/definitions/${name}`).toBe('api/common.schema.json#/definitions/password');
        expect(value['minLength']).toBe(MIN_PASSWORD_LENGTH);
      }
    }
  });
});
