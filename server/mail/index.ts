export { OutboxWorker, retryDelayMs, type OutboxWorkerOptions, type DrainResult } from './outbox-worker';
export { mailSettingsFromEnv, type MailSettings } from './mail-settings';
export { startFakeSmtp, type CaughtMail, type FakeSmtp, type FakeSmtpOptions } from './fake-smtp';
