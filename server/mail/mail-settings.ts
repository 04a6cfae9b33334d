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
