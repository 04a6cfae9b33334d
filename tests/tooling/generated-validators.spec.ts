/** The committed standalone validators match the schemas (regenerate: npx tsx rules/scripts/generate-validators.ts). */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { validatorSources } from '../../rules/scripts/validator-sources';

describe('generated validators', () => {
  for (const { path, source } of validatorSources()) {
    it(`${path} is up to date with shared/schemas`, () => {
      const committed = readFileSync(fileURLToPath(new URL(`../../${path}`, import.meta.url)), 'utf8');
      expect(committed === source, `run npx tsx rules/scripts/generate-validators.ts`).toBe(true);
    });
  }
});
