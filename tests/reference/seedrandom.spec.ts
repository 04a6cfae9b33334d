/**
 * Source: seedrandom's README (node_modules/seedrandom/README.md, version 3.0.5), which documents
 * `seedrandom('hello.')` producing 0.9282578795792454, then 0.3752569768646784. The check proves
 * the engine's generator is the published one.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { createRng } from '../../engine/random';

const readme = readFileSync(
  fileURLToPath(new URL('../../node_modules/seedrandom/README.md', import.meta.url)),
  'utf8',
);

describe("seedrandom's documented output (seedrandom README)", () => {
  it('the README documents the values this check relies on', () => {
    expect(readme).toContain("seedrandom('hello.')");
    expect(readme).toContain('0.9282578795792454');
    expect(readme).toContain('0.3752569768646784');
  });

  it("the engine's generator for 'hello.' gives the documented sequence", () => {
    const rng = createRng('hello.');
    expect(rng()).toBe(0.9282578795792454);
    expect(rng()).toBe(0.3752569768646784);
  });
});
