import nodemailer, { type Transporter } from 'nodemailer';
import type { DataSource } from 'typeorm';
import type { OutboxMessage } from '../entities/outbox-message';
import { CLEARED_BODY } from '../services/mail-queue';
import type { MailSettings } from './mail-settings';

export interface OutboxWorkerOptions {
  dataSource: DataSource;
  mail: MailSettings;
  /** How often to look for due messages. */
  pollMs?: number;
  batchSize?: number;
  /** After this many failed attempts a message is marked failed and left for a person to look at. */
  maxAttempts?: number;
  /** First retry delay; each further retry doubles it, up to maxDelayMs. */
  baseDelayMs?: number;
  maxDelayMs?: number;
  /** A claimed message is due again after this long if its sender died mid-send. */
  leaseMs?: number;
  onError?: (error: unknown, message?: OutboxMessage) => void;
}

export interface DrainResult {
  sent: number;
  retried: number;
  failed: number;
}

/** The options with every unset one (absent or undefined) at its default. */
export type OutboxWorkerSettings = Required<Omit<OutboxWorkerOptions, 'onError'>> &
  Pick<OutboxWorkerOptions, 'onError'>;

const DEFAULTS = {
  pollMs: 1_000,
  batchSize: 10,
  maxAttempts: 8,
  baseDelayMs: 2_000,
  maxDelayMs: 10 * 60_000,
  leaseMs: 2 * 60_000,
};

/**
 * Fills in the defaults. An option passed as undefined (as a caller forwarding an unset setting
 * does) takes its default too: spread over the defaults it would replace them, and a poll
 * interval of undefined makes setTimeout look again after 1 ms, for ever.
 */
export function outboxWorkerSettings(options: OutboxWorkerOptions): OutboxWorkerSettings {
  const given = Object.fromEntries(Object.entries(options).filter(([, value]) => value !== undefined));
  return { ...DEFAULTS, ...given } as OutboxWorkerSettings;
}

/** Delay before attempt `attempts + 1`: base · 2^(attempts − 1), capped. */
export function retryDelayMs(attempts: number, baseDelayMs: number, maxDelayMs: number): number {
  return Math.min(maxDelayMs, baseDelayMs * 2 ** Math.max(0, attempts - 1));
}

/**
 * Sends what the outbox holds. Several workers (in one process or many) can run against one
 * database: each claims due rows with FOR UPDATE SKIP LOCKED and a lease, so a message goes to
 * one sender at a time and is marked sent once. Each claim counts an attempt, and a sender writes
 * how its send went only while the attempt it claimed is the latest: one whose lease ran out
 * mid-send (the message taken over by another) changes nothing when it finally hears back.
 */
export class OutboxWorker {
  private readonly transport: Transporter;
  private timer: NodeJS.Timeout | null = null;
  private running: Promise<unknown> | null = null;
  private stopped = false;
  private readonly options: OutboxWorkerSettings;

  constructor(options: OutboxWorkerOptions) {
    this.options = outboxWorkerSettings(options);
    const { mail } = options;
    this.transport = nodemailer.createTransport({
      host: mail.host,
      port: mail.port,
      secure: mail.secure,
      auth: mail.user ? { user: mail.user, pass: mail.password ?? '' } : undefined,
      connectionTimeout: 5_000,
      greetingTimeout: 5_000,
      socketTimeout: 15_000,
    });
  }

  /** Polls until stop(). */
  start(): void {
    this.stopped = false;
    const tick = () => {
      if (this.stopped) return;
      this.running = this.drainOnce()
        .catch((error) => this.options.onError?.(error))
        .finally(() => {
          this.running = null;
          if (!this.stopped) this.timer = setTimeout(tick, this.options.pollMs);
        });
    };
    tick();
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearTimeout(this.timer);
    await this.running;
    this.transport.close();
  }

  /** Claims and sends every due message once; returns what happened. */
  async drainOnce(): Promise<DrainResult> {
    const result: DrainResult = { sent: 0, retried: 0, failed: 0 };
    for (;;) {
      const batch = await this.claim();
      if (!batch.length) return result;
      for (const message of batch) await this.deliver(message, result);
      if (batch.length < this.options.batchSize) return result;
    }
  }

  private async claim(): Promise<OutboxMessage[]> {
    const rows: OutboxMessage[] = await this.options.dataSource.query(
      `UPDATE outbox_message
          SET attempts = attempts + 1,
              "nextAttemptAt" = now() + ($2::int * interval '1 millisecond')
        WHERE id IN (
          SELECT id FROM outbox_message
           WHERE status = 'pending' AND "nextAttemptAt" <= now()
           ORDER BY "createdAt"
           LIMIT $1
           FOR UPDATE SKIP LOCKED)
        RETURNING *`,
      [this.options.batchSize, this.options.leaseMs],
    );
    // UPDATE … RETURNING through TypeORM's query() yields [rows, count] on PostgreSQL.
    return (Array.isArray(rows[0]) ? rows[0] : rows) as OutboxMessage[];
  }

  private async deliver(message: OutboxMessage, result: DrainResult): Promise<void> {
    const db = this.options.dataSource;
    try {
      await this.transport.sendMail({
        from: this.options.mail.from,
        to: message.recipients,
        // nodemailer encodes the name itself, so no header can be injected through it.
        replyTo: message.replyTo ?? undefined,
        subject: message.subject,
        text: message.textBody,
        html: message.htmlBody ?? undefined,
        attachments: message.attachments.map((a) => ({
          filename: a.filename,
          contentType: a.contentType,
          content: Buffer.from(a.contentBase64, 'base64'),
        })),
      });
      // Delivered: body and attachments are not kept (links, children's names on the card).
      await db.query(
        `UPDATE outbox_message
            SET status = 'sent', "sentAt" = now(), "lastError" = NULL,
                "textBody" = $2, "htmlBody" = NULL, attachments = '[]'::jsonb
          WHERE id = $1 AND attempts = $3`,
        [message.id, CLEARED_BODY, message.attempts],
      );
      result.sent++;
    } catch (error) {
      this.options.onError?.(error, message);
      const giveUp = message.attempts >= this.options.maxAttempts;
      const delay = retryDelayMs(message.attempts, this.options.baseDelayMs, this.options.maxDelayMs);
      await db.query(
        `UPDATE outbox_message
            SET status = $2, "lastError" = $3, "nextAttemptAt" = now() + ($4::int * interval '1 millisecond')
          WHERE id = $1 AND attempts = $5`,
        [
          message.id,
          giveUp ? 'failed' : 'pending',
          String((error as Error)?.message ?? error).slice(0, 500),
          delay,
          message.attempts,
        ],
      );
      if (giveUp) result.failed++;
      else result.retried++;
    }
  }
}
