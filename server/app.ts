import express, { type Express } from 'express';
import helmet from 'helmet';
import type { Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import type { AppConfig } from './config';
import { createLogger, errorForLog } from './http/app-logger';
import { localeBuilds } from './build/locale-builds';
import { clientAssets, clientShell, compressAnswers, noStore } from './middleware/client-files';
import { apiNotFound, errorHandler } from './middleware/error-handler';
import { createRequireAuth } from './middleware/require-auth';
import { speakTheirLanguage } from './middleware/request-language';
import { installTranslations } from './i18n/translations';
import { createApiRouter } from './routes';
import { outboxMailQueue, type MailQueue } from './services/mail-queue';

export interface AppDeps {
  dataSource: DataSource;
  config: AppConfig;
  logger?: Logger;
  /** Defaults to queueing rows in the outbox table. */
  mail?: MailQueue;
}

/** Secrets that can appear in an address (a calendar feed's, an old invitation link's, a token= query) are kept out of the request log. */
export function withoutSecrets(url: string): string {
  return (
    url
      .replace(/\/calendar\/[^/?#]+/, '/calendar/[secret]')
      // Invitation links from before the token moved into the fragment.
      .replace(/\/invitations\/(?![0-9a-f]{8}-[0-9a-f]{4}-)[A-Za-z0-9_%-]{20,}/, '/invitations/[secret]')
      .replace(/([?&]token=)[^&#]*/g, '$1[secret]')
  );
}

/** JSON bodies above this answer 413. */
export const JSON_BODY_LIMIT = '256kb';

/** The Express app: API under /api, the built client everywhere else. */
export function createApp(deps: AppDeps): Express {
  const logger = deps.logger ?? createLogger(deps.config.logLevel);
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', deps.config.trustProxy);
  app.use(compressAnswers());
  // The built client's scripts, styles, fonts and images: before helmet and the request log (their
  // own few headers, see clientAssets). Pages and worker scripts come last, with helmet's headers.
  // One build per language (server/build/locale-builds.ts), or none when the client is not built.
  const builds = localeBuilds(deps.config.staticDir);
  if (builds.length) app.use(clientAssets(builds));

  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        // Everything from this origin only: Conewise must work on a closed network.
        directives: {
          defaultSrc: ["'self'"],
          // JSON Schema validators reach the browser precompiled (server/cli/generate-validators.ts),
          // so scripts load from this origin only and nothing is evaluated.
          scriptSrc: ["'self'"],
          // Angular writes component styles into <style> tags.
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          workerSrc: ["'self'"],
          manifestSrc: ["'self'"],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          frameAncestors: ["'none'"],
        },
      },
      // Off by default: served over plain HTTP on a club laptop or closed network, HSTS would only
      // get in the way. A deployment behind TLS turns it on with HSTS_MAX_AGE.
      strictTransportSecurity:
        deps.config.hstsMaxAgeSeconds === null
          ? false
          : { maxAge: deps.config.hstsMaxAgeSeconds, includeSubDomains: true, preload: false },
    }),
  );
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => req.url === '/api/health' },
      // One short line per request: no headers, so tokens never reach the log. The serializers
      // read the raw request and response (no standard serializer copying every header first).
      wrapSerializers: false,
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({
          id: req.id,
          method: req.method,
          url: withoutSecrets(req.url),
        }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
        err: errorForLog,
      },
    }),
  );
  app.use('/api', noStore);
  app.use('/api', express.json({ limit: JSON_BODY_LIMIT, type: ['application/json', 'application/*+json'] }));
  installTranslations();
  app.use('/api', speakTheirLanguage);

  const requireAuth = createRequireAuth(deps.dataSource, deps.config);
  app.use(
    '/api',
    createApiRouter({
      dataSource: deps.dataSource,
      config: deps.config,
      logger,
      requireAuth,
      mail: deps.mail ?? outboxMailQueue,
    }),
  );
  app.use('/api', apiNotFound);

  if (builds.length) app.use(clientShell(builds));

  app.use(apiNotFound);
  app.use(errorHandler);
  return app;
}
