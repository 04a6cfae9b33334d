/**
 * Runs in a worker thread of the card pool (card-pool.ts): lays out and writes one printed card,
 * in the language of the request that asked for it, off the event loop that answers requests.
 */
import { installTranslations, inLanguage } from '../i18n/translations';
import type { LanguageCode } from '../../shared/i18n/languages';
import type { CardInput, Paper } from './plan-card';
import { renderPlanPdf } from './render-pdf';

/** What the pool hands a worker: the card's input, its paper and the request's language. */
export interface CardJob {
  input: CardInput;
  paper: Paper;
  language: LanguageCode;
}

installTranslations();

export default async function renderCardJob({ input, paper, language }: CardJob): Promise<Uint8Array> {
  return inLanguage(language, () => renderPlanPdf(input, paper));
}
