import {
  ApplicationRef,
  effect,
  inject,
  Injectable,
  makeEnvironmentProviders,
  provideEnvironmentInitializer,
} from '@angular/core';
import { AuthApi } from '../api/auth-api';
import { AuthStore } from '../auth/auth-store';
import { browserLocale } from './locale-format';

const SENT_KEY = 'conewise.locale-sent';

/**
 * Tells the server the browser's locale once per browser session of a signed-in person (after
 * sign-in, creating a club, joining, or reopening the app), so the cards and e-mails they send
 * write dates and times as their screen does. A failed send (offline) is tried again next time.
 * It waits until the screen has drawn what it opened with: on a phone's link a request at start-up
 * takes a connection and a slice of the main thread from the first paint (issue 12).
 */
@Injectable({ providedIn: 'root' })
export class LocaleSync {
  private readonly authApi = inject(AuthApi);
  private readonly auth = inject(AuthStore);
  private readonly appRef = inject(ApplicationRef);

  /** Watches who is signed in and sends their locale when this tab has not sent it yet. */
  start(): void {
    effect(() => {
      const user = this.auth.user();
      if (!user) return;
      const locale = browserLocale();
      const mark = `${user.id}|${locale}`;
      if (readSent() === mark) return;
      void this.appRef.whenStable().then(() => {
        // Signed out or another person meanwhile: theirs is sent by the effect's next run.
        if (this.auth.user()?.id !== user.id || readSent() === mark) return;
        this.authApi.changeLocale(locale).subscribe({
          next: () => writeSent(mark),
          error: () => undefined,
        });
      });
    });
  }
}

/** Starts LocaleSync with the app. */
export function provideLocaleSync() {
  return makeEnvironmentProviders([provideEnvironmentInitializer(() => inject(LocaleSync).start())]);
}

function readSent(): string | null {
  try {
    return globalThis.sessionStorage?.getItem(SENT_KEY) ?? null;
  } catch {
    return null;
  }
}

function writeSent(mark: string): void {
  try {
    globalThis.sessionStorage?.setItem(SENT_KEY, mark);
  } catch {
    // Storage refused (private mode): the next page load sends it again, which is harmless.
  }
}
