/**
 * Precompiles the engine's JSON Schemas to standalone validator modules, so the browser never
 * needs eval (the app's Content-Security-Policy forbids it). Run after changing a schema:
 *   npx tsx rules/scripts/generate-validators.ts
 * A spec (tests/tooling/generated-validators.spec.ts) fails when the output is stale.
 */
import { writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { validatorSources } from './validator-sources';

for (const { file, source } of validatorSources()) {
  writeFileSync(fileURLToPath(new URL(`../../engine/schema/generated/${file}`, import.meta.url)), source);
  console.log(`wrote engine/schema/generated/${file}`);
}
