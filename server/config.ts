import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The project root (one level above server/). */
export const PROJECT_ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');
/** Git-ignored folder for local state: the private cluster, the generated JWT secret, caught mail. */
export const DATA_DIR = process.env['CONEWISE_DATA_DIR'] ?? join(PROJECT_ROOT, '.data');
/** Where `ng build` writes the browser bundle. */
export const CLIENT_DIST =
  process.env['CONEWISE_CLIENT_DIST'] ?? join(PROJECT_ROOT, 'dist', 'conewise', 'browser');

export interface AppConfig {
  /** Reported by GET /api/health. */
  version: string;
  /** HS256 signing secret for session tokens. */
  jwtSecret: string;
  /** Token lifetime in seconds. */
  jwtExpiresInSeconds: number;
  /** Requests per window and IP on /api/auth/* before a 429. */
  authRateLimit: { windowMs: number; max: number };
  /** Base URL put into invitation links, e.g. http://127.0.0.1:4300. */
  publicUrl: string;
  /** Folder of the built Angular app; null serves no client. */
  staticDir: string | null;
  /** Invitation tokens expire after this many hours. */
  invitationTtlHours: number;
  /**
   * E-mails one club may have Conewise send in any 24 hours (INVITATIONS_PER_DAY,
   * SHARE_MAILS_PER_DAY): invitations, and plan cards (one per recipient). Enough for a busy
   * club's week; a stolen or careless account cannot turn the server into a mass mailer.
   */
  dailyMailLimits: { invitations: number; shares: number };
  /** pino level; 'silent' in tests. */
  logLevel: string;
  /**
   * Express 'trust proxy': which proxies' X-Forwarded-For to believe when telling clients apart
   * (the sign-in rate limit counts per client). 'loopback' by default; behind a load balancer on
   * another machine, its address or subnet (TRUST_PROXY=10.0.0.0/8) or a hop count (TRUST_PROXY=1).
   */
  trustProxy: string | number;
  /**
   * Strict-Transport-Security max-age in seconds (HSTS_MAX_AGE), for a deployment served over
   * HTTPS only; null (unset) sends no such header, as a club laptop serves plain HTTP.
   */
  hstsMaxAgeSeconds: number | null;
  /** Locale of dates in e-mails (CLUB_LOCALE), e.g. en-GB: "Tuesday 8 December". */
  locale: string;
}

function packageVersion(): string {
  try {
    const pkg = JSON.parse(readFileSync(join(PROJECT_ROOT, 'package.json'), 'utf8')) as { version?: string };
    return pkg.version ?? '0.0.0';
  } catch {
    return '0.0.0';
  }
}

/** The shortest JWT_SECRET accepted (256 bits of base64 text is 43 characters; 32 is the floor). */
export const MIN_JWT_SECRET_LENGTH = 32;

/** The address the server listens on: HOST, else this machine only (127.0.0.1). */
export function bindHostFromEnv(): string {
  return process.env['HOST']?.trim() || '127.0.0.1';
}

/** Whether a listen address is reachable from this machine only (127.0.0.0/8, ::1, localhost). */
export function isLoopbackHost(host: string): boolean {
  const name = host
    .trim()
    .toLowerCase()
    .replace(/^\[(.*)\]$/, '$1');
  return name === 'localhost' || name === '::1' || /^(::ffff:)?127(\.\d{1,3}){3}$/.test(name);
}

/**
 * The JWT secret: JWT_SECRET from the environment, else, for a server that listens on this
 * machine only, one generated on first use and kept in the data folder, so restarts and several
 * instances on one machine accept each other's tokens. A server reachable from other machines
 * must be given its secret: one made up on a server's own disk is easily lost or left behind in
 * copies of the data folder, and instances on several machines would each make their own.
 */
export function loadJwtSecret(dataDir = DATA_DIR, host = bindHostFromEnv()): string {
  const fromEnv = process.env['JWT_SECRET'];
  if (fromEnv !== undefined && fromEnv !== '') {
    // A short secret can be guessed offline from any one token: refuse to start rather than warn.
    if (fromEnv.length < MIN_JWT_SECRET_LENGTH)
      throw new Error(
        `JWT_SECRET is ${fromEnv.length} characters long; it needs at least ${MIN_JWT_SECRET_LENGTH} (for example: openssl rand -base64 48).`,
      );
    return fromEnv;
  }
  if (!isLoopbackHost(host)) {
    throw new Error(
      `JWT_SECRET is not set, and HOST=${host} lets other machines reach this server. ` +
        `Set JWT_SECRET to at least ${MIN_JWT_SECRET_LENGTH} random characters, the same on every instance ` +
        `(for example: JWT_SECRET=$(openssl rand -base64 48)), or set HOST=127.0.0.1 to serve this machine only.`,
    );
  }
  const file = join(dataDir, 'jwt-secret');
  if (existsSync(file)) {
    const kept = readFileSync(file, 'utf8').trim();
    if (kept.length >= 32) return kept;
  }
  mkdirSync(dirname(file), { recursive: true });
  const secret = randomBytes(48).toString('base64url');
  writeFileSync(file, secret + '\n', { mode: 0o600 });
  return secret;
}

function intFromEnv(name: string, fallback: number): number {
  const raw = process.env[name];
  const value = raw === undefined ? NaN : Number(raw);
  return Number.isInteger(value) && value > 0 ? value : fallback;
}

/** Configuration from the environment with the defaults `npm start` uses. */
export function loadConfig(overrides: Partial<AppConfig> = {}): AppConfig {
  const port = intFromEnv('PORT', 4300);
  return {
    version: packageVersion(),
    jwtSecret: overrides.jwtSecret ?? loadJwtSecret(),
    jwtExpiresInSeconds: intFromEnv('JWT_EXPIRES_IN_SECONDS', 12 * 3600),
    authRateLimit: {
      windowMs: intFromEnv('AUTH_RATE_WINDOW_MS', 15 * 60_000),
      max: intFromEnv('AUTH_RATE_MAX', 100),
    },
    publicUrl: process.env['PUBLIC_URL'] ?? `http://127.0.0.1:${port}`,
    staticDir: existsSync(CLIENT_DIST) ? CLIENT_DIST : null,
    invitationTtlHours: intFromEnv('INVITATION_TTL_HOURS', 72),
    dailyMailLimits: {
      invitations: intFromEnv('INVITATIONS_PER_DAY', 50),
      shares: intFromEnv('SHARE_MAILS_PER_DAY', 300),
    },
    logLevel: process.env['LOG_LEVEL'] ?? 'info',
    trustProxy: trustProxyFromEnv(process.env['TRUST_PROXY']),
    hstsMaxAgeSeconds: hstsMaxAgeFromEnv(process.env['HSTS_MAX_AGE']),
    locale: process.env['CLUB_LOCALE'] || 'en-GB',
    ...overrides,
  };
}

/** HSTS_MAX_AGE: whole seconds (0 tells browsers to forget an earlier one), or null when unset. */
export function hstsMaxAgeFromEnv(raw: string | undefined): number | null {
  const value = raw?.trim();
  if (!value) return null;
  if (!/^\d+$/.test(value)) {
    throw new Error(
      `HSTS_MAX_AGE is "${value}"; it must be a whole number of seconds (for example 31536000 for a year), or unset to send no HSTS header.`,
    );
  }
  return Number(value);
}

/** TRUST_PROXY as Express takes it: a hop count, or addresses and subnet names separated by commas. */
export function trustProxyFromEnv(raw: string | undefined): string | number {
  const value = raw?.trim();
  if (!value) return 'loopback';
  return /^\d+$/.test(value) ? Number(value) : value;
}
