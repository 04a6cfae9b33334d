import '../../shared/i18n/localize';
import type { RequestHandler } from 'express';
import type { Role } from '../../shared/types/api';
import { authOf } from '../http/auth-context';
import { forbidden } from '../http/problem';

/** 403 unless the signed-in caller has one of the roles. Use after requireAuth. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    const auth = authOf(req);
    if (!roles.includes(auth.role)) return next(forbidden(onlyThey(roles)));
    next();
  };
}

/**
 * "Only the head of coaching or a coach can do this.": who may, in the glossary's words, each
 * choice of roles a whole sentence (roles in the order head of coaching, coach, assistant).
 */
function onlyThey(roles: Role[]): string {
  const lead = roles.includes('lead');
  const coach = roles.includes('coach');
  const assistant = roles.includes('assistant');
  if (lead && coach && assistant)
    return $localize`Only the head of coaching or a coach or an assistant can do this.`;
  if (lead && coach) return $localize`Only the head of coaching or a coach can do this.`;
  if (lead && assistant) return $localize`Only the head of coaching or an assistant can do this.`;
  if (coach && assistant) return $localize`Only a coach or an assistant can do this.`;
  if (coach) return $localize`Only a coach can do this.`;
  if (assistant) return $localize`Only an assistant can do this.`;
  return $localize`Only the head of coaching can do this.`;
}
