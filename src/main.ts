import { bootstrapApplication } from '@angular/platform-browser';
import { App } from './app/app';
import { appConfig } from './app/app.config';
import { routes } from './app/app.routes';
import { hasStoredSession } from './app/core/auth/auth-store';
import { loadScreenEarly } from './app/core/routing/early-screen';
import { carryOverTyping, typedBeforeStart } from './app/core/startup/first-paint';

// A signed-in coach opening a plan (or any screen) by its address: its code is fetched while the
// app starts, not after. Signed out, the guards send them to sign-in, so nothing is fetched.
if (hasStoredSession()) loadScreenEarly(location.pathname, routes);

// Start the app in a task of its own, after the one that evaluated the scripts: two shorter
// tasks instead of one long one, so a tap during start-up on a slow phone is answered sooner.
setTimeout(() => {
  // Read just before the app replaces the page drawn in advance (server/build/prerender.ts).
  const typed = typedBeforeStart(document);
  bootstrapApplication(App, appConfig)
    .then(async (app) => {
      if (!typed) return;
      await app.whenStable();
      carryOverTyping(document, typed);
    })
    .catch((error: unknown) => console.error(error));
});
