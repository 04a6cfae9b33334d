import { Injectable, signal } from '@angular/core';
import type { CardPaper } from '../../../core/api/plans-api';
import { PAPER_SETTING_KEY } from '../../../core/auth/device-data';

/** How each paper is named on screen. */
export const PAPER_LABELS: Readonly<Record<CardPaper, string>> = {
  a4: 'A4',
  letter: $localize`:Paper size used in North America:US Letter`,
};

/** A setting of the device, kept when someone signs out (see core/auth/device-data.ts). */
const STORAGE_KEY = PAPER_SETTING_KEY;

/** Regions where US Letter is the usual office paper. */
const LETTER_REGIONS = new Set(['US', 'CA', 'MX', 'PH']);

/**
 * A convenience default only, not a rule: Letter when the browser's first locale names a region
 * that mostly uses Letter (en-US, fr-CA, es-MX, en-PH) or is Filipino, A4 everywhere else.
 * The coach's own choice always wins.
 */
export function paperForLocale(locale: string | undefined): CardPaper {
  if (!locale) return 'a4';
  const [language, ...rest] = locale.split(/[-_]/);
  if (language?.toLowerCase() === 'fil') return 'letter';
  return rest.some((part) => LETTER_REGIONS.has(part.toUpperCase())) ? 'letter' : 'a4';
}

/** The paper the coach prints the card on, remembered on this device. */
@Injectable({ providedIn: 'root' })
export class PaperPreference {
  private readonly chosen = signal<CardPaper>(this.restore());

  /** The paper for the next card. */
  readonly paper = this.chosen.asReadonly();

  /** Uses `paper` from now on, also after a reload. */
  choose(paper: CardPaper): void {
    this.chosen.set(paper);
    try {
      globalThis.localStorage?.setItem(STORAGE_KEY, paper);
    } catch {
      // Storage can be full or switched off; the choice then lasts until the page is closed.
    }
  }

  private restore(): CardPaper {
    let stored: string | null | undefined;
    try {
      stored = globalThis.localStorage?.getItem(STORAGE_KEY);
    } catch {
      stored = null;
    }
    if (stored === 'a4' || stored === 'letter') return stored;
    return paperForLocale(globalThis.navigator?.languages?.[0] ?? globalThis.navigator?.language);
  }
}
