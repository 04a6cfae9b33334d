/**
 * Property tests run with one fixed seed, so a run in CI is the same run every time (a property
 * that fails does so on every run, never now and then). `FC_SEED=random npm run test:engine`
 * explores fresh inputs; `FC_SEED=<n>` replays a seed a failure printed.
 */
import fc from 'fast-check';

const chosen = process.env['FC_SEED'];
if (chosen !== 'random') fc.configureGlobal({ seed: chosen ? Number(chosen) : 20261202 });
