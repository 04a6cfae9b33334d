/** Where and as whom Conewise sends mail. */
export interface MailSettings {
  host: string;
  port: number;
  /** Implicit TLS (port 465 style). The local fake speaks plain SMTP. */
  secure: boolean;
  from: string;
  user?: string;
  password?: string;
}

/** Mail settings from SMTP_HOST, SMTP_PORT, SMTP_SECURE, SMTP_USER, SMTP_PASSWORD and MAIL_FROM. */
export function mailSettingsFromEnv(overrides: Partial<MailSettings> = {}): MailSettings {
  const port = Number(process.env['SMTP_PORT']);
  return {
    host: process.env['SMTP_HOST'] ?? '127.0.0.1',
    port: Number.isInteger(port) && port > 0 ? port : 2525,
    secure: process.env['SMTP_SECURE'] === 'true',
    from: process.env['MAIL_FROM'] ?? 'Conewise <no-reply@conewise.invalid>',
    user: process.env['SMTP_USER'] || undefined,
    password: process.env['SMTP_PASSWORD'] || undefined,
    ...overrides,
  };
}

/** How this instance's outbox sender paces itself; unset fields keep the sender's defaults. */
export interface OutboxTiming {
  /** OUTBOX_POLL_MS: how often to look for due messages (default 1 s). */
  pollMs?: number;
  /**
   * OUTBOX_LEASE_MS: how long a claimed message stays with its sender (default 2 minutes). When an
   * instance dies mid-send, another sends its claimed messages once the lease runs out. Keep it
   * well above how long a send can take (the sender gives up on a mail server silent for 15 s): a
   * sender still busy when its lease ends can deliver a message another has taken over.
   */
  leaseMs?: number;
}

/** OUTBOX_POLL_MS and OUTBOX_LEASE_MS, whole milliseconds; a value that is not one stops the start. */
export function outboxTimingFromEnv(env: NodeJS.ProcessEnv = process.env): OutboxTiming {
  const timing: OutboxTiming = {};
  for (const [name, field] of [
    ['OUTBOX_POLL_MS', 'pollMs'],
    ['OUTBOX_LEASE_MS', 'leaseMs'],
  ] as const) {
    const raw = env[name]?.trim();
    if (!raw) continue;
    if (!/^\d+$/.test(raw) || Number(raw) < 1)
      throw new Error(
        `${name} is "${raw}"; it must be a whole number of milliseconds (for example 1000), or unset.`,
      );
    timing[field] = Number(raw);
  }
  return timing;
}
