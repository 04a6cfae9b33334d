/**
 * Debian's Chromium as the build and the tests drive it (playwright-core): headless, and with what
 * a browser run as root on a machine with no display or network needs.
 */
import { existsSync } from 'node:fs';

export const CHROMIUM_PATH = '/usr/bin/chromium';

export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
];

/** Whether Chromium is installed (`npm test` and `.ci/run` install it; `npm start` may run without). */
export function chromiumInstalled(): boolean {
  return existsSync(CHROMIUM_PATH);
}
