/**
 * `npm run -s bench:engine`: median and p95 milliseconds per generated plan for 6, 16 and 40
 * players, warm cache, many runs. Prints a table, then the figures as JSON on the last line.
 */
import { generatePlan } from '../../engine';
import type { PlanRequest } from '../../shared/types';

const SIZES = [6, 16, 40] as const;
const WARM_UP = 50;
const RUNS = Number(process.env['BENCH_RUNS'] ?? 400);

function request(players: number, run: number): PlanRequest {
  return {
    ageGroup: 'U11',
    level: 'intermediate',
    players: Array.from({ length: players }, (_, i) => ({ id: `p${i + 1}`, goalkeeper: i === 0 })),
    coaches: 2,
    equipment: { balls: players, cones: 60, bibs: 20, goals: 4 },
    space: { width: 60, length: 45 },
    minutes: 20,
    kind: 'match-warm-up',
    seed: `bench-${run}`,
  };
}

function percentile(sorted: number[], p: number): number {
  const index = Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1);
  return sorted[Math.max(0, index)];
}

const results: Record<string, { medianMs: number; p95Ms: number }> = {};
for (const size of SIZES) {
  for (let i = 0; i < WARM_UP; i++) await generatePlan(request(size, i));
  const times: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const req = request(size, i);
    const start = performance.now();
    await generatePlan(req);
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  results[size] = {
    medianMs: Math.round(percentile(times, 50) * 1000) / 1000,
    p95Ms: Math.round(percentile(times, 95) * 1000) / 1000,
  };
}

console.log('players | median ms | p95 ms');
console.log('------- | --------- | ------');
for (const size of SIZES) {
  console.log(
    `${String(size).padStart(7)} | ${results[size].medianMs.toFixed(3).padStart(9)} | ${results[size].p95Ms.toFixed(3).padStart(6)}`,
  );
}
const ratio = results[40].medianMs / results[6].medianMs;
console.log(`ratio 40/6 median: ${ratio.toFixed(2)} (target ≤ 3); 16-player median target ≤ 1 ms`);
console.log(JSON.stringify(results));
