import { ChangeDetectionStrategy, Component, LOCALE_ID, inject } from '@angular/core';
import { LANGUAGE_COOKIE, LANGUAGES, languageOf } from '../../../../shared/i18n/languages';

/**
 * The app's language, chosen by a person: kept in a cookie for a year (the server sends that
 * language's build at every address), then the page is loaded again in it. The offline copy
 * held by the service worker is of the old language, so the worker is let go first and comes
 * back with the new one.
 */
@Component({
  selector: 'cw-language-choice',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <nav class="cw-languages" i18n-aria-label aria-label="Language">
      @for (language of languages; track language.code) {
        @if (language.code === current) {
          <span class="cw-current" aria-current="true" [attr.lang]="language.code">{{ language.name }}</span>
        } @else {
          <button
            type="button"
            class="cw-other"
            [attr.lang]="language.code"
            [attr.data-testid]="'language-' + language.code"
            (click)="choose(language.code)"
          >
            {{ language.name }}
          </button>
        }
      }
    </nav>
  `,
  styles: `
    .cw-languages {
      display: flex;
      gap: 12px;
      align-items: center;
      flex-wrap: wrap;
    }
    .cw-current {
      font-weight: 500;
    }
    .cw-other {
      background: none;
      border: 0;
      padding: 8px 4px;
      min-height: 44px;
      color: var(--mat-sys-primary);
      text-decoration: underline;
      font: inherit;
      cursor: pointer;
    }
  `,
})
export class LanguageChoice {
  protected readonly languages = LANGUAGES;
  /** The language of the build on screen ("en-GB" → "en"). */
  protected readonly current = languageOf(inject(LOCALE_ID));

  /** Keeps the choice and opens the page again in that language. */
  protected async choose(code: string): Promise<void> {
    document.cookie = `${LANGUAGE_COOKIE}=${code}; path=/; max-age=31536000; SameSite=Lax`;
    const workers = (await globalThis.navigator?.serviceWorker?.getRegistrations?.()) ?? [];
    await Promise.all(workers.map((w) => w.unregister()));
    location.reload();
  }
}
