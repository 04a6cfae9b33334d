import type { RequestHandler } from 'express';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import type { AppConfig } from '../config';
import type { MailQueue } from '../services/mail-queue';

/** What every router factory receives. Routers keep no state of their own between requests. */
export interface ApiDeps {
  dataSource: DataSource;
  config: AppConfig;
  logger: Logger;
  /** passport-jwt bearer check; sets req.auth. */
  requireAuth: RequestHandler;
  /** Queue for outgoing e-mail (the outbox). */
  mail: MailQueue;
}
