/**
 * Helpers for API tests: the real app on the throwaway database, served on a free port, and
 * shortcuts to register a club and sign in as its lead, a coach and an assistant.
 */
import { randomBytes, randomUUID } from 'node:crypto';
import { pino } from 'pino';
import type { DataSource } from 'typeorm';
import { inject } from 'vitest';
import type { AuthResponse, Role } from '../../shared/types/api';
import { loadConfig, type AppConfig } from '../../server/config';
import { createDataSource } from '../../server/data-source';
import { Membership } from '../../server/entities/membership';
import { OutboxMessage } from '../../server/entities/outbox-message';
import { User } from '../../server/entities/user';
import { startHttpServer, type RunningHttpServer } from '../../server/http-server';
import { closeCardPool } from '../../server/pdf/card-pool';
import { hashPassword } from '../../server/services/auth-service';
import { ApiClient } from './api-client';

export const TEST_PASSWORD = 'correct-horse-42';

export interface TestApp {
  api: ApiClient;
  dataSource: DataSource;
  config: AppConfig;
  http: RunningHttpServer;
  close(): Promise<void>;
}

export function testConfig(overrides: Partial<AppConfig> = {}): AppConfig {
  return loadConfig({
    jwtSecret: randomBytes(32).toString('hex'),
    logLevel: 'silent',
    staticDir: null,
    authRateLimit: { windowMs: 60_000, max: 10_000 },
    publicUrl: 'http://conewise.test',
    ...overrides,
  });
}

/**
 * The app on the test database (inject('databaseUrl'), or another database of the same cluster),
 * listening on a free loopback port.
 */
export async function startTestApp(
  overrides: Partial<AppConfig> = {},
  databaseUrl: string = inject('databaseUrl'),
): Promise<TestApp> {
  const dataSource = createDataSource({ url: databaseUrl, poolSize: 5 });
  await dataSource.initialize();
  // The per-client limits count in the database, shared by every app on it: a test that sets its
  // own limit starts from a fresh count, as a newly started deployment would.
  if (overrides.authRateLimit) await dataSource.query('DELETE FROM rate_limit_hit');
  const config = testConfig(overrides);
  const http = await startHttpServer({ dataSource, config, port: 0, logger: pino({ level: 'silent' }) });
  return {
    api: new ApiClient(http.url),
    dataSource,
    config,
    http,
    async close() {
      await http.close();
      await closeCardPool();
      if (dataSource.isInitialized) await dataSource.destroy();
    },
  };
}

/**
 * Two instances of the app on the test database with one JWT secret (and the same overrides), as
 * behind a load balancer; close() stops both.
 */
export async function startTwoInstances(overrides: Partial<AppConfig> = {}): Promise<{
  app: TestApp;
  second: TestApp;
  close(): Promise<void>;
}> {
  const app = await startTestApp(overrides);
  const second = await startTestApp({ ...overrides, jwtSecret: app.config.jwtSecret });
  return {
    app,
    second,
    async close() {
      await second.close();
      await app.close();
    },
  };
}

export function uniqueEmail(label = 'user'): string {
  return `${label}-${randomUUID().slice(0, 8)}@example.org`;
}

export interface SignedIn extends AuthResponse {
  password: string;
}

/** The newest e-mail of `kind` queued for `email`, from the outbox table. */
export async function newestMail(app: TestApp, email: string, kind: string): Promise<OutboxMessage> {
  const rows = await app.dataSource
    .getRepository(OutboxMessage)
    .find({ where: { kind }, order: { createdAt: 'DESC' } });
  const found = rows.find((row) => row.recipients.includes(email));
  if (!found) throw new Error(`no ${kind} mail for ${email} in the outbox`);
  return found;
}

/** The single-use token of the newest e-mailed link to `path` ("/confirm-email") for `email`. */
export async function linkTokenFor(app: TestApp, email: string, kind: string, path: string): Promise<string> {
  const message = await newestMail(app, email, kind);
  const match = new RegExp(`${path}#([\\w-]+)`).exec(message.textBody);
  if (!match?.[1]) throw new Error(`no ${path}# link in the ${kind} mail for ${email}`);
  return match[1];
}

/**
 * Registers a fresh club; returns its lead, signed in. The lead confirms their address through
 * the mailed link (as a real lead does before inviting or sharing) unless `confirmed` is false.
 */
export async function registerClub(
  app: TestApp,
  clubName = 'Riverside Test FC',
  { confirmed = true, email = uniqueEmail('lead') }: { confirmed?: boolean; email?: string } = {},
): Promise<SignedIn> {
  const response = await app.api.post('/api/auth/register', {
    clubName,
    name: 'Lena Lead',
    email,
    password: TEST_PASSWORD,
  });
  if (response.status !== 201) throw new Error(`register failed: ${response.status} ${response.text}`);
  const signedIn = { ...(response.body as AuthResponse), password: TEST_PASSWORD };
  if (!confirmed) return signedIn;
  const token = await linkTokenFor(app, email, 'email-verification', '/confirm-email');
  const confirm = await app.api.post('/api/auth/email-confirmation', { token });
  if (confirm.status !== 204) throw new Error(`confirming failed: ${confirm.status} ${confirm.text}`);
  return { ...signedIn, user: { ...signedIn.user, emailVerified: true } };
}

/** Adds a member with a role straight in the database, then signs them in through the API. */
export async function addMember(
  app: TestApp,
  clubId: string,
  role: Role,
  name = `Test ${role}`,
): Promise<SignedIn> {
  const email = uniqueEmail(role);
  const user = await app.dataSource
    .getRepository(User)
    .save({ email, name, passwordHash: await hashPassword(TEST_PASSWORD), emailVerifiedAt: new Date() });
  await app.dataSource.getRepository(Membership).save({ clubId, userId: user.id, role });
  const login = await app.api.post('/api/auth/login', { email, password: TEST_PASSWORD });
  if (login.status !== 200) throw new Error(`login failed: ${login.status} ${login.text}`);
  return { ...(login.body as AuthResponse), password: TEST_PASSWORD };
}

export interface ClubCast {
  lead: SignedIn;
  coach: SignedIn;
  assistant: SignedIn;
}

/** A club with a lead, a coach and an assistant, all signed in. */
export async function clubWithStaff(app: TestApp, clubName?: string): Promise<ClubCast> {
  const lead = await registerClub(app, clubName);
  const coach = await addMember(app, lead.user.clubId, 'coach', 'Cora Coach');
  const assistant = await addMember(app, lead.user.clubId, 'assistant', 'Asa Assistant');
  return { lead, coach, assistant };
}

/** A team owned by the club, created by the given member (a coach becomes attached). */
export async function createTeam(
  app: Pick<TestApp, 'api'>,
  token: string,
  body: Record<string, unknown> = {},
): Promise<{ id: string; [key: string]: unknown }> {
  const response = await app.api.post(
    '/api/teams',
    { name: 'U9 Comets', ageGroup: 'U9', level: 'beginner', usualSpace: { width: 30, length: 40 }, ...body },
    { token },
  );
  if (response.status !== 201) throw new Error(`create team failed: ${response.status} ${response.text}`);
  return response.body;
}
