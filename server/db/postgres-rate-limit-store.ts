import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import type { DataSource } from 'typeorm';
import { preparedQuery } from './prepared-query';

interface HitRow {
  hits: number;
  resetAt: Date;
}

/**
 * An express-rate-limit store kept in PostgreSQL (table `rate_limit_hit`), so every instance of
 * the server adds to one count per client: behind a load balancer the limit holds for the whole
 * deployment, not once per instance. One atomic upsert per request counts the hit and starts a
 * new window when the last one has passed; rows of passed windows are deleted in passing, at most
 * once a window per instance. Times come from the database's clock, so instances agree.
 */
export class PostgresRateLimitStore implements Store {
  /** Counts are shared with every instance. */
  readonly localKeys = false;
  private windowMs = 60_000;
  private nextSweep = 0;

  /**
   * @param dataSource the app's database
   * @param prefix the limiter's name: each limiter counts apart (e.g. "sign-in", "calendar")
   */
  constructor(
    private readonly dataSource: DataSource,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  private key(key: string): string {
    return `${this.prefix}:${key}`.slice(0, 200);
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const rows = (await this.dataSource.query(
      `SELECT hits, "resetAt" FROM rate_limit_hit WHERE key = $1 AND "resetAt" > now()`,
      [this.key(key)],
    )) as HitRow[];
    const row = rows[0];
    return row ? { totalHits: row.hits, resetTime: row.resetAt } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const [row] = await preparedQuery<HitRow>(
      this.dataSource.manager,
      'rate-limit-increment',
      `INSERT INTO rate_limit_hit AS h (key, hits, "resetAt")
       VALUES ($1, 1, now() + make_interval(secs => $2::double precision / 1000))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN h."resetAt" <= now() THEN 1 ELSE h.hits + 1 END,
         "resetAt" = CASE WHEN h."resetAt" <= now() THEN EXCLUDED."resetAt" ELSE h."resetAt" END
       RETURNING hits, "resetAt"`,
      [this.key(key), this.windowMs],
    );
    await this.sweep();
    return { totalHits: row!.hits, resetTime: row!.resetAt };
  }

  async decrement(key: string): Promise<void> {
    await this.dataSource.query(
      `UPDATE rate_limit_hit SET hits = greatest(hits - 1, 0) WHERE key = $1 AND "resetAt" > now()`,
      [this.key(key)],
    );
  }

  async resetKey(key: string): Promise<void> {
    await this.dataSource.query(`DELETE FROM rate_limit_hit WHERE key = $1`, [this.key(key)]);
  }

  /** Deletes the rows of windows that have passed (every limiter's: they share the table). */
  private async sweep(): Promise<void> {
    if (Date.now() < this.nextSweep) return;
    this.nextSweep = Date.now() + this.windowMs;
    await this.dataSource.query(`DELETE FROM rate_limit_hit WHERE "resetAt" <= now()`);
  }
}
