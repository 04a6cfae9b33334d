import type { Role } from '../../../../shared/types';

/** A member's role in words, wherever a screen names one (never the role code). */
export const ROLE_LABELS: Record<Role, string> = {
  lead: 'Head of coaching',
  coach: 'Coach',
  assistant: 'Assistant coach',
};

/** The same words inside a sentence: "… to join as a coach". */
export const ROLE_IN_A_SENTENCE: Record<Role, string> = {
  lead: 'head of coaching',
  coach: 'a coach',
  assistant: 'an assistant coach',
};
