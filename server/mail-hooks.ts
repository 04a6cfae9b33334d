import type { DataSource } from 'typeorm';
import { OutboxWorker } from './mail/outbox-worker';
import type { MailSettings, OutboxTiming } from './mail/mail-settings';

export interface Stoppable {
  stop(): Promise<void>;
}

/** Starts the loop that delivers queued outbox rows over SMTP (safe with several instances). */
export function startMailSender(
  options: {
    dataSource: DataSource;
    mail: MailSettings;
  } & OutboxTiming,
): Stoppable {
  const worker = new OutboxWorker({
    dataSource: options.dataSource,
    mail: options.mail,
    pollMs: options.pollMs,
    leaseMs: options.leaseMs,
  });
  worker.start();
  return { stop: () => worker.stop() };
}
