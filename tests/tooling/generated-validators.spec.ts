/** The committed standalone validators match the schemas (regenerate: npm run generate:validators). */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { validatorSources } from '../../server/cli/validator-sources';

describe('generated validators', () => {
  for (const { path, source } of validatorSources()) {
    it(`${path} is up to date with shared/schemas`, () => {
      const committed = readFileSync(fileURLToPath(new URL(`../../${path}`, import.meta.url)), 'utf8');
      expect(committed === source, `run npm run generate:validators`).toBe(true);
    });
  }
});
