/** The JWT secret: a short JWT_SECRET stops the start instead of a warning; none makes one kept on disk. */
import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { loadJwtSecret, MIN_JWT_SECRET_LENGTH } from '../../server/config';

describe('loadJwtSecret', () => {
  const saved = process.env['JWT_SECRET'];
  const dirs: string[] = [];
  const dataDir = () => {
    const dir = mkdtempSync(join(tmpdir(), 'conewise-secret-'));
    dirs.push(dir);
    return dir;
  };
  afterEach(() => {
    if (saved === undefined) delete process.env['JWT_SECRET'];
    else process.env['JWT_SECRET'] = saved;
    for (const dir of dirs.splice(0)) rmSync(dir, { recursive: true, force: true });
  });

  it('refuses a JWT_SECRET shorter than the floor, saying how long it must be', () => {
    process.env['JWT_SECRET'] = 'short-secret-16ch';
    expect(() => loadJwtSecret(dataDir())).toThrow(`needs at least ${MIN_JWT_SECRET_LENGTH}`);
  });

  it('uses a long enough JWT_SECRET as given', () => {
    process.env['JWT_SECRET'] = 'x'.repeat(MIN_JWT_SECRET_LENGTH);
    expect(loadJwtSecret(dataDir())).toBe('x'.repeat(MIN_JWT_SECRET_LENGTH));
  });

  it('without one, makes a random secret readable by its owner only and keeps it across starts', () => {
    delete process.env['JWT_SECRET'];
    const dir = dataDir();
    const first = loadJwtSecret(dir);
    expect(first.length).toBeGreaterThanOrEqual(64);
    expect(loadJwtSecret(dir)).toBe(first);
    expect(readFileSync(join(dir, 'jwt-secret'), 'utf8').trim()).toBe(first);
    expect(statSync(join(dir, 'jwt-secret')).mode & 0o777).toBe(0o600);
  });
});
