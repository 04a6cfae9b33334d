import type { Role } from './api';

/**
 * A member's role in words, wherever people read one: screens, e-mails and server messages (never
 * the role code). The glossary in DEVELOPERS.md names these three.
 */
export const ROLE_LABELS: Record<Role, string> = {
  lead: 'Head of coaching',
  coach: 'Coach',
  assistant: 'Assistant',
};

/** The same words inside a sentence: "… to join as a coach". */
export const ROLE_IN_A_SENTENCE: Record<Role, string> = {
  lead: 'head of coaching',
  coach: 'a coach',
  assistant: 'an assistant',
};
