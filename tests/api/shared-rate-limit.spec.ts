/**
 * The per-client limit on the public auth routes is counted in PostgreSQL, so two instances
 * behind a load balancer share one count: the limit holds for the deployment, not per instance.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTwoInstances, uniqueEmail, type TestApp } from '../support/api-test-app';

const LIMIT = 4;
const WINDOW_MS = 60_000;

describe('per-client limit shared by every instance', () => {
  let app: TestApp;
  let second: TestApp;
  let instances: Awaited<ReturnType<typeof startTwoInstances>>;
  beforeAll(async () => {
    instances = await startTwoInstances({ authRateLimit: { windowMs: WINDOW_MS, max: LIMIT } });
    ({ app, second } = instances);
  });
  afterAll(() => instances.close());

  /** A wrong sign-in to an address with no account (a new address each time, so no per-address lock). */
  const attempt = (on: TestApp) =>
    on.api.post('/api/auth/login', { email: uniqueEmail('guess'), password: 'not-the-password' });

  async function signInRows(): Promise<{ key: string; hits: number; resetAt: Date }[]> {
    return app.dataSource.query(
      `SELECT key, hits, "resetAt" FROM rate_limit_hit WHERE key LIKE 'sign-in:%'`,
    ) as Promise<{ key: string; hits: number; resetAt: Date }[]>;
  }

  it(`reaches the limit of ${LIMIT} across both instances together and answers 429 with Retry-After on both`, async () => {
    // A row of a window that has passed, left by some earlier client: deleted in passing.
    await app.dataSource.query(
      `INSERT INTO rate_limit_hit (key, hits, "resetAt") VALUES ('calendar:192.0.2.1', 9, now() - interval '1 hour')`,
    );
    const statuses: number[] = [];
    for (let i = 0; i < LIMIT; i++) statuses.push((await attempt(i % 2 ? second : app)).status);
    // Each instance saw only half the limit: a count per instance would still let them through.
    expect(statuses).toEqual(Array(LIMIT).fill(401));

    for (const on of [app, second]) {
      const refused = await attempt(on);
      expect(refused.status).toBe(429);
      expect(refused.headers.get('content-type')).toContain('application/problem+json');
      expect(refused.body.detail).toBe('Too many sign-in attempts from here. Wait a few minutes.');
      const retryAfter = Number(refused.headers.get('retry-after'));
      expect(Number.isInteger(retryAfter)).toBe(true);
      expect(retryAfter).toBeGreaterThan(0);
      expect(retryAfter).toBeLessThanOrEqual(WINDOW_MS / 1000);
    }

    const rows = await signInRows();
    expect(rows).toHaveLength(1);
    expect(rows[0]!.hits).toBe(LIMIT + 2);
    const stale = (await app.dataSource.query(
      `SELECT 1 FROM rate_limit_hit WHERE key = 'calendar:192.0.2.1'`,
    )) as unknown[];
    expect(stale).toEqual([]);

    // Another limited group of routes keeps its own count.
    const lookup = await second.api.post('/api/invitations/lookup', { token: 'z'.repeat(43) });
    expect(lookup.status).toBe(400);
  });

  it('starts a new count once the window has passed', async () => {
    expect((await attempt(second)).status).toBe(429);
    await app.dataSource.query(
      `UPDATE rate_limit_hit SET "resetAt" = now() - interval '1 second' WHERE key LIKE 'sign-in:%'`,
    );
    expect((await attempt(app)).status).toBe(401);
    const [row] = await signInRows();
    expect(row!.hits).toBe(1);
    expect(new Date(row!.resetAt).getTime()).toBeGreaterThan(Date.now() + WINDOW_MS / 2);
  });
});
