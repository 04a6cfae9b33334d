import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { AppConfig } from '../config';
import { HttpError } from '../http/problem';

/**
 * Limits password and token guessing per IP on the public auth routes (429 problem).
 * Counters live in this instance's memory: behind a load balancer each instance counts its own,
 * which still bounds guessing to instances × limit.
 */
export function authRateLimit(config: AppConfig): RequestHandler {
  return publicRateLimit(config, 'Too many sign-in attempts from here. Wait a few minutes.');
}

/**
 * The same per-IP limit for any public route that needs no sign-in (calendar feeds, helper links),
 * with its own counter and message.
 */
export function publicRateLimit(config: AppConfig, message: string): RequestHandler {
  return rateLimit({
    windowMs: config.authRateLimit.windowMs,
    limit: config.authRateLimit.max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new HttpError(429, 'Too many requests', message)),
  });
}
