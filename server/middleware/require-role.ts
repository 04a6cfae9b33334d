import type { RequestHandler } from 'express';
import type { Role } from '../../shared/types/api';
import { ROLE_IN_A_SENTENCE } from '../../shared/types/role-words';
import { authOf } from '../http/auth-context';
import { forbidden } from '../http/problem';

/** 403 unless the signed-in caller has one of the roles. Use after requireAuth. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    const auth = authOf(req);
    if (!roles.includes(auth.role)) return next(forbidden(`Only ${whoMay(roles)} can do this.`));
    next();
  };
}

/** "the head of coaching or a coach": who may, in the glossary's words. */
function whoMay(roles: Role[]): string {
  return roles
    .map((role) => (role === 'lead' ? 'the head of coaching' : ROLE_IN_A_SENTENCE[role]))
    .join(' or ');
}
