import { defineConfig } from 'vitest/config';

// Node-side suites. Client component tests (src/**/*.spec.ts) run through `ng test`. Code shared
// with the client may mark words with `$localize`: its global is set up here as in the app (words
// stay in English on this side).
export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'engine',
          environment: 'node',
          // Property tests and the tooling checks (which parse the whole tree or start a process)
          // take seconds on a loaded machine; a limit is a hang guard, not a speed target.
          testTimeout: 30_000,
          setupFiles: ['@angular/localize/init', 'tests/support/fast-check-seed.ts'],
          include: [
            'engine/**/*.spec.ts',
            'shared/**/*.spec.ts',
            'rules/**/*.spec.ts',
            'tests/reference/**/*.spec.ts',
            'tests/tooling/**/*.spec.ts',
          ],
        },
      },
      {
        test: {
          name: 'api',
          environment: 'node',
          setupFiles: ['@angular/localize/init', 'tests/support/fast-check-seed.ts'],
          include: ['server/**/*.spec.ts', 'tests/api/**/*.spec.ts'],
          globalSetup: ['tests/support/api-global-setup.ts'],
          // Property tests send hundreds of requests; a loaded CI machine needs the headroom.
          testTimeout: 60_000,
          hookTimeout: 60_000,
          fileParallelism: false,
        },
      },
      {
        test: {
          // Faults on purpose: a database restarted, an instance killed behind nginx, an answer
          // lost on the wire. Each spec starts the clusters, instances and proxies it breaks.
          name: 'faults',
          environment: 'node',
          setupFiles: ['@angular/localize/init'],
          include: ['tests/faults/**/*.spec.ts'],
          testTimeout: 180_000,
          hookTimeout: 180_000,
          fileParallelism: false,
        },
      },
      {
        test: {
          name: 'e2e',
          environment: 'node',
          include: ['tests/e2e/**/*.spec.ts'],
          globalSetup: ['tests/support/e2e-global-setup.ts'],
          testTimeout: 60_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
