import type { RequestHandler } from 'express';
import { newPasswordRefusal } from '../services/password-policy';

/**
 * After `validate`: refuses a request whose body field `field` is a password that may not be
 * chosen (server/services/password-policy.ts), with a 400 naming that field.
 */
export function refuseCommonPassword(field: string): RequestHandler {
  return (req, _res, next) => {
    const password = (req.body as Record<string, unknown> | undefined)?.[field];
    next((typeof password === 'string' && newPasswordRefusal(password, field)) || undefined);
  };
}
