export {
  OutboxWorker,
  outboxWorkerSettings,
  retryDelayMs,
  type OutboxWorkerOptions,
  type OutboxWorkerSettings,
  type DrainResult,
} from './outbox-worker';
export {
  mailSettingsFromEnv,
  outboxTimingFromEnv,
  type MailSettings,
  type OutboxTiming,
} from './mail-settings';
export { startFakeSmtp, type CaughtMail, type FakeSmtp, type FakeSmtpOptions } from './fake-smtp';
