import type { RequestHandler } from 'express';
import type { Role } from '../../shared/types/api';
import { authOf } from '../http/auth-context';
import { forbidden } from '../http/problem';

/** 403 unless the signed-in caller has one of the roles. Use after requireAuth. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    const auth = authOf(req);
    if (!roles.includes(auth.role)) return next(forbidden(`This needs the role ${roles.join(' or ')}.`));
    next();
  };
}
