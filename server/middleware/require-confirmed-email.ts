import type { RequestHandler } from 'express';
import { authOf } from '../http/auth-context';
import { emailNotConfirmed } from '../services/email-verification-service';

/**
 * 403 until the signed-in caller has confirmed their e-mail address. On routes that make
 * Conewise send mail to other people (invitations, plan cards). Use after requireAuth.
 */
export const requireConfirmedEmail: RequestHandler = (req, _res, next) => {
  const auth = authOf(req);
  next(auth.emailVerified ? undefined : emailNotConfirmed(auth.email));
};
