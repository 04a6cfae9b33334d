import { bootstrapApplication } from '@angular/platform-browser';
import { App } from './app/app';
import { appConfig } from './app/app.config';

// Start the app in a task of its own, after the one that evaluated the scripts: two shorter
// tasks instead of one long one, so a tap during start-up on a slow phone is answered sooner.
setTimeout(() => {
  bootstrapApplication(App, appConfig).catch((error: unknown) => console.error(error));
});
