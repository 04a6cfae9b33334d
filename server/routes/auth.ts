import { Router } from 'express';
import { authOf } from '../http/auth-context';
import { refuseCommonPassword } from '../middleware/new-password';
import { authRateLimit } from '../middleware/rate-limit';
import { validate } from '../middleware/validate';
import { AccountService } from '../services/account-service';
import { AuthService, userDto } from '../services/auth-service';
import { EmailVerificationService, resendWords } from '../services/email-verification-service';
import { PasswordResetService, RESET_REQUESTED } from '../services/password-reset-service';
import type { ApiDeps } from './api-deps';
import { scopeOf } from './scoped';

/**
 * POST /auth/register, POST /auth/login, GET /auth/me, PATCH /auth/me (the caller's own name and locale);
 * POST /auth/sign-out (this session), POST /auth/sign-out-everywhere (every session of the
 * caller), POST /auth/password (a new password, ending every session); POST /auth/password-reset
 * (202 whether or not the address has an account) and POST /auth/password-reset/confirm (a new
 * password with the e-mailed link); POST /auth/email-confirmation (the link mailed to a new
 * account's address) and POST /auth/email-confirmation/resend (another link, signed in).
 */
export function authRouter(deps: ApiDeps): Router {
  const router = Router();
  const verification = new EmailVerificationService(deps.dataSource, deps.config, deps.mail);
  const service = new AuthService(deps.dataSource, deps.config, verification);
  const limiter = authRateLimit(deps.config, deps.dataSource, 'sign-in');
  const resets = new PasswordResetService(deps.dataSource, deps.config, deps.mail);
  const account = (req: Parameters<typeof scopeOf>[0]) => new AccountService(scopeOf(req, deps.dataSource));

  router.post(
    '/auth/register',
    limiter,
    validate({ body: 'auth-register' }),
    refuseCommonPassword('password'),
    async (req, res) => {
      res.status(201).json(await service.register(req.body));
    },
  );
  router.post('/auth/login', limiter, validate({ body: 'auth-login' }), async (req, res) => {
    res.json(await service.login(req.body));
  });
  router.get('/auth/me', deps.requireAuth, (req, res) => {
    res.json(userDto(authOf(req)));
  });
  router.patch('/auth/me', deps.requireAuth, validate({ body: 'auth-me-update' }), async (req, res) => {
    res.json(await account(req).update(req.body));
  });
  router.post('/auth/sign-out', deps.requireAuth, async (req, res) => {
    await account(req).signOut();
    res.status(204).end();
  });
  router.post('/auth/sign-out-everywhere', deps.requireAuth, async (req, res) => {
    await account(req).signOutEverywhere();
    res.status(204).end();
  });
  router.post(
    '/auth/password',
    deps.requireAuth,
    limiter,
    validate({ body: 'auth-password-change' }),
    refuseCommonPassword('newPassword'),
    async (req, res) => {
      await account(req).changePassword(req.body);
      res.status(204).end();
    },
  );
  router.post(
    '/auth/email-confirmation',
    limiter,
    validate({ body: 'auth-email-confirmation' }),
    async (req, res) => {
      await verification.confirm(req.body);
      res.status(204).end();
    },
  );
  router.post('/auth/email-confirmation/resend', deps.requireAuth, async (req, res) => {
    const auth = authOf(req);
    const outcome = await verification.resend(auth);
    res.status(outcome === 'sent' ? 202 : 200).json({ outcome, message: resendWords(outcome, auth.email) });
  });
  router.post(
    '/auth/password-reset',
    limiter,
    validate({ body: 'auth-password-reset' }),
    async (req, res) => {
      await resets.request(req.body);
      res.status(202).json(RESET_REQUESTED);
    },
  );
  router.post(
    '/auth/password-reset/confirm',
    limiter,
    validate({ body: 'auth-password-reset-confirm' }),
    refuseCommonPassword('password'),
    async (req, res) => {
      await resets.confirm(req.body);
      res.status(204).end();
    },
  );
  return router;
}
