import { bootstrapApplication } from '@angular/platform-browser';
import { App } from './app/app';
import { appConfig } from './app/app.config';
import { routes } from './app/app.routes';
import { storedUserId } from './app/core/auth/auth-store';
import { loadIconPaths } from './app/core/icons/provide-icons';
import { loadScreenEarly } from './app/core/routing/early-screen';
import { removeDrawnCopy, showDrawnCopy } from './app/core/startup/drawn-copy';
import { carryOverTyping, typedBeforeStart } from './app/core/startup/first-paint';

// A signed-in coach opening a plan (or any screen) by its address: its code is fetched while the
// app starts, not after. Signed out, the guards send them to sign-in, so nothing is fetched.
const userId = storedUserId();
if (userId) {
  loadScreenEarly(location.pathname, routes);
  // Every signed-in screen draws icons: their chunk comes with the screen's code, not after it.
  void loadIconPaths().catch(() => undefined);
}

// The page as this device last drew it at this address, on screen until the app has drawn it again.
const copyShown = userId !== null && showDrawnCopy(document, localStorage, location.pathname, userId);

// Start the app in a task of its own, after the one that evaluated the scripts: two shorter
// tasks instead of one long one, so a tap during start-up on a slow phone is answered sooner.
setTimeout(start);

/** The longest the copy of a page stays up while the app starts (a request hanging on a weak link). */
const DRAWN_COPY_LONGEST_MS = 5000;

function start(): void {
  // Read just before the app replaces the page drawn in advance (server/build/prerender.ts).
  const typed = typedBeforeStart(document);
  const started = bootstrapApplication(App, appConfig);
  if (copyShown) {
    // Once the page's data has arrived and been drawn; at the latest after a few seconds.
    const removed = () => removeDrawnCopy(document);
    setTimeout(removed, DRAWN_COPY_LONGEST_MS);
    void started.then((app) => app.whenStable()).then(removed, removed);
  }
  started
    .then(async (app) => {
      if (!typed) return;
      await app.whenStable();
      carryOverTyping(document, typed);
    })
    .catch((error: unknown) => console.error(error));
}
