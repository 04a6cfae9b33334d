/** All randomness in the engine goes through seedrandom, so a seed reproduces a plan exactly. */
import seedrandom from 'seedrandom';

export type Rng = () => number;

export function createRng(seed: string): Rng {
  return seedrandom(seed);
}

// Seeds for requests without one: a generator seeded once from the platform's entropy, since
// autoseeding costs more than the rest of a small plan's randomness (it mixes 256 random bytes).
let seeds: Rng | null = null;

/** A fresh seed for a request that brought none; returned in the plan so it can be replayed. */
export function generateSeed(): string {
  seeds ??= seedrandom();
  return Math.floor(seeds() * 36 ** 8)
    .toString(36)
    .padStart(8, '0');
}

/** Fisher–Yates shuffle driven by the seeded generator; returns a new array. */
export function shuffle<T>(items: readonly T[], rng: Rng): T[] {
  const out = items.slice();
  for (let i = out.length - 1; i > 0; i--) {
    const j = Math.floor(rng() * (i + 1));
    // A plain swap: the destructuring form builds a throwaway array per step.
    const held = out[i];
    out[i] = out[j];
    out[j] = held;
  }
  return out;
}

export function pick<T>(items: readonly T[], rng: Rng): T {
  return items[Math.floor(rng() * items.length)];
}
