/**
 * `npm test`: every suite in one go — lint, types, engine, client components, API on a throwaway
 * PostgreSQL, faults (restarts, kills, lost answers), end-to-end in headless Chromium. Runs them all, then prints one summary and exits
 * non-zero when anything failed.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ensureSystemPackages } from '../server/db/system-packages';

interface Step {
  name: string;
  command: string[];
  /** Where the step's JSON report lands, for counting tests. */
  report?: string;
}

interface Outcome {
  name: string;
  ok: boolean;
  passed: number;
  failed: number;
  skipped: number;
  seconds: number;
}

const root = new URL('..', import.meta.url).pathname;
const results = join(root, 'test-results');
mkdirSync(results, { recursive: true });

const vitestStep = (project: string): Step => ({
  name: project,
  report: join(results, `${project}.json`),
  command: [
    'npx',
    'vitest',
    'run',
    '--project',
    project,
    '--reporter=default',
    '--reporter=json',
    `--outputFile.json=${join(results, `${project}.json`)}`,
  ],
});

const steps: Step[] = [
  { name: 'lint', command: ['npx', 'eslint', '.'] },
  { name: 'format', command: ['npx', 'prettier', '--check', '.'] },
  {
    name: 'types (server, engine, shared, tests)',
    command: ['npx', 'tsc', '-p', 'tsconfig.server.json', '--noEmit'],
  },
  vitestStep('engine'),
  { name: 'client', report: join(results, 'client.json'), command: ['npx', 'ng', 'test', '--watch=false'] },
  { name: 'build client', command: ['npm', 'run', '-s', 'build'] },
  vitestStep('api'),
  vitestStep('faults'),
  vitestStep('e2e'),
];

function countFromReport(path: string | undefined): Pick<Outcome, 'passed' | 'failed' | 'skipped'> | null {
  if (!path || !existsSync(path)) return null;
  try {
    const report = JSON.parse(readFileSync(path, 'utf8')) as {
      numPassedTests: number;
      numFailedTests: number;
      numPendingTests: number;
      numTodoTests?: number;
    };
    return {
      passed: report.numPassedTests,
      failed: report.numFailedTests,
      skipped: report.numPendingTests + (report.numTodoTests ?? 0),
    };
  } catch {
    return null;
  }
}

function run(step: Step): Outcome {
  console.log(`\n━━ ${step.name} ━━ ${step.command.join(' ')}`);
  if (step.report) rmSync(step.report, { force: true });
  const started = performance.now();
  const child = spawnSync(step.command[0], step.command.slice(1), {
    cwd: root,
    stdio: 'inherit',
    env: process.env,
  });
  const seconds = (performance.now() - started) / 1000;
  const ok = child.status === 0;
  const counts = countFromReport(step.report);
  if (counts) return { name: step.name, ok: ok && counts.failed === 0, ...counts, seconds };
  // A check without a test count (lint, types, build) counts as one check.
  return { name: step.name, ok, passed: ok ? 1 : 0, failed: ok ? 0 : 1, skipped: 0, seconds };
}

try {
  ensureSystemPackages(['postgresql', 'chromium', 'pdftotext', 'nginx']);
} catch (error) {
  console.error((error as Error).message);
  process.exit(1);
}

const outcomes = steps.map(run);
const width = Math.max(...outcomes.map((o) => o.name.length));
console.log('\n━━ summary ━━');
for (const o of outcomes) {
  const counts = `${o.passed} passed, ${o.failed} failed${o.skipped ? `, ${o.skipped} skipped` : ''}`;
  console.log(`${o.ok ? 'ok  ' : 'FAIL'} ${o.name.padEnd(width)}  ${counts}  (${o.seconds.toFixed(1)} s)`);
}
const total = outcomes.reduce(
  (sum, o) => ({
    passed: sum.passed + o.passed,
    failed: sum.failed + o.failed,
    skipped: sum.skipped + o.skipped,
  }),
  { passed: 0, failed: 0, skipped: 0 },
);
const allOk = outcomes.every((o) => o.ok);
console.log(
  `\n${total.passed} passed, ${total.failed} failed${total.skipped ? `, ${total.skipped} skipped` : ''}`,
);
process.exit(allOk ? 0 : 1);
