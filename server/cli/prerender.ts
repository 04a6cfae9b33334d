/**
 * Draws the sign-in page of each built language in advance (server/build/prerender.ts). Run by the
 * client build after `ng build`. Chromium is installed when missing and the build runs as root;
 * otherwise the build says so and the page is drawn by the app, as for every other page.
 */
import { localeBuilds } from '../build/locale-builds';
import { chromiumInstalled } from '../build/chromium';
import { prerenderPages } from '../build/prerender';
import { CLIENT_DIST } from '../config';
import { ensureSystemPackages, isRoot } from '../db/system-packages';

async function main(): Promise<void> {
  if (!chromiumInstalled() && isRoot()) ensureSystemPackages(['chromium']);
  if (!chromiumInstalled()) {
    console.log(
      '[conewise] no Chromium: the sign-in page is not drawn in advance (sudo apt-get install chromium)',
    );
    return;
  }
  const written = await prerenderPages(localeBuilds(CLIENT_DIST));
  console.log(`[conewise] drawn in advance: ${written.join(', ')}`);
}

main().catch((error: unknown) => {
  console.error(
    '[conewise] drawing pages in advance failed:',
    error instanceof Error ? error.message : error,
  );
  process.exit(1);
});
