import '../i18n/localize';
import type { Role } from './api';

/**
 * A member's role in words, wherever people read one: screens, e-mails and server messages (never
 * the role code). The glossary in DEVELOPERS.md names these three. Getters, so each read is in the
 * reader's language (the server translates per request).
 */
export const ROLE_LABELS: Record<Role, string> = {
  get lead() {
    return $localize`Head of coaching`;
  },
  get coach() {
    return $localize`Coach`;
  },
  get assistant() {
    return $localize`Assistant`;
  },
};

/** The same words inside a sentence: "… to join as a coach". */
export const ROLE_IN_A_SENTENCE: Record<Role, string> = {
  get lead() {
    return $localize`:role inside a sentence, e.g. join as …:head of coaching`;
  },
  get coach() {
    return $localize`:role inside a sentence, e.g. join as …:a coach`;
  },
  get assistant() {
    return $localize`:role inside a sentence, e.g. join as …:an assistant`;
  },
};
