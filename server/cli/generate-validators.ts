/**
 * Precompiles the JSON Schemas the engine and the client's forms check to standalone validator modules, so the browser never
 * needs eval (the app's Content-Security-Policy forbids it). Run after changing a schema:
 *   npm run generate:validators
 * A spec (tests/tooling/generated-validators.spec.ts) fails when the output is stale.
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { validatorSources } from './validator-sources';

for (const { path, source } of validatorSources()) {
  const target = fileURLToPath(new URL(`../../${path}`, import.meta.url));
  mkdirSync(dirname(target), { recursive: true });
  writeFileSync(target, source);
  console.log(`wrote ${path}`);
}
