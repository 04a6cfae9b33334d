import '../../shared/i18n/localize';
import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { DataSource } from 'typeorm';
import type { AppConfig } from '../config';
import { PostgresRateLimitStore } from '../db/postgres-rate-limit-store';
import { HttpError } from '../http/problem';

/**
 * Limits password and token guessing per IP on the public auth routes (429 problem with
 * Retry-After). Counters live in PostgreSQL, so behind a load balancer every instance adds to
 * the same count and the limit holds for the whole deployment. `name` keeps each limiter's count
 * apart (e.g. "sign-in", "invitation").
 */
export function authRateLimit(config: AppConfig, dataSource: DataSource, name: string): RequestHandler {
  return publicRateLimit(
    config,
    dataSource,
    name,
    () => $localize`Too many sign-in attempts from here. Wait a few minutes.`,
  );
}

/**
 * The same per-IP limit for any public route that needs no sign-in (calendar feeds, helper links),
 * with its own counter (`name`) and message (a function, so it is said in each reader's language).
 */
export function publicRateLimit(
  config: AppConfig,
  dataSource: DataSource,
  name: string,
  message: () => string,
): RequestHandler {
  return rateLimit({
    windowMs: config.authRateLimit.windowMs,
    limit: config.authRateLimit.max,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    store: new PostgresRateLimitStore(dataSource, name),
    handler: (_req, _res, next) =>
      next(
        new HttpError(
          429,
          $localize`:title of an error answer:Too many requests`,
          message(),
          undefined,
          '/problems/too-many-requests',
        ),
      ),
  });
}
