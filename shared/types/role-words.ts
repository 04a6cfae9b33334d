import '../i18n/localize';
import type { Role } from './api';

/**
 * A member's role in words, wherever people read one: screens, e-mails and server messages (never
 * the role code). The glossary in DEVELOPERS.md names these three.
 */
export const ROLE_LABELS: Record<Role, string> = {
  lead: $localize`Head of coaching`,
  coach: $localize`Coach`,
  assistant: $localize`Assistant`,
};

/** The same words inside a sentence: "… to join as a coach". */
export const ROLE_IN_A_SENTENCE: Record<Role, string> = {
  lead: $localize`:role inside a sentence, e.g. join as …:head of coaching`,
  coach: $localize`:role inside a sentence, e.g. join as …:a coach`,
  assistant: $localize`:role inside a sentence, e.g. join as …:an assistant`,
};
