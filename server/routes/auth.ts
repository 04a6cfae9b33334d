import { Router } from 'express';
import { authOf } from '../http/auth-context';
import { authRateLimit } from '../middleware/rate-limit';
import { validate } from '../middleware/validate';
import { AuthService, userDto } from '../services/auth-service';
import type { ApiDeps } from './api-deps';

/** POST /auth/register, POST /auth/login, GET /auth/me. */
export function authRouter(deps: ApiDeps): Router {
  const router = Router();
  const service = new AuthService(deps.dataSource, deps.config);
  const limiter = authRateLimit(deps.config);

  router.post('/auth/register', limiter, validate({ body: 'auth-register' }), async (req, res) => {
    res.status(201).json(await service.register(req.body));
  });
  router.post('/auth/login', limiter, validate({ body: 'auth-login' }), async (req, res) => {
    res.json(await service.login(req.body));
  });
  router.get('/auth/me', deps.requireAuth, (req, res) => {
    res.json(userDto(authOf(req)));
  });
  return router;
}
