import type { DataSource, QueryRunner } from 'typeorm';

/** A season, for retention: 365 days (a football season is shorter, a year is the plain rule). */
export const DAYS_PER_SEASON = 365;
/** Invitations are purged this many days after they expire (accepted or not). */
export const INVITATION_GRACE_DAYS = 30;
/** Outbox rows (bodies already cleared on sending) are purged this many days after they were sent. */
export const OUTBOX_KEEP_DAYS = 30;
/**
 * The PostgreSQL advisory lock key the purge holds for its transaction, so only one instance
 * purges at a time (any number may try). An arbitrary number of this job's own.
 */
export const RETENTION_LOCK_KEY = 1_764_646_000;

/** What one purge removed; `ran` is false when another instance held the lock. */
export interface PurgeResult {
  ran: boolean;
  invitations: number;
  /** Plans past the club's setting; their attendance, feedback and helper links go with them. */
  plans: number;
  /** Attendance recorded longer ago than the club's setting (on plans still kept). */
  attendance: number;
  /** Station feedback given longer ago than the club's setting (on plans still kept). */
  feedback: number;
  outbox: number;
}

const NOTHING: Omit<PurgeResult, 'ran'> = { invitations: 0, plans: 0, attendance: 0, feedback: 0, outbox: 0 };

/** The longest one statement of the purge may run. */
const PURGE_STATEMENT_TIMEOUT = '10min';

/** The club's oldest kept moment: `now` less its seasons (SQL, with $1 the purge's `now`). */
const CLUB_CUTOFF = `($1::timestamptz - make_interval(days => c."keepSeasons" * ${DAYS_PER_SEASON}))`;

/**
 * Retention's purge, a job of the system's: removes what is past each club's setting (how many
 * seasons plans, attendance and feedback are kept; ClubRetentionService) and the fixed limits for
 * invitations and sent e-mail.
 */
export class RetentionService {
  constructor(private readonly dataSource: DataSource) {}

  /**
   * Purges everything past its limit, as of `now`, in one transaction that holds the advisory
   * lock: a second caller at the same moment (this instance or another) gets `ran: false` and
   * does nothing.
   */
  async purge(now: Date = new Date()): Promise<PurgeResult> {
    const runner = this.dataSource.createQueryRunner();
    await runner.connect();
    try {
      await runner.startTransaction();
      // Nobody waits on the purge, and a first one after a club shortens its seasons may delete
      // much: the pool's short statement timeout is lifted for this transaction.
      await runner.query(`SET LOCAL statement_timeout = '${PURGE_STATEMENT_TIMEOUT}'`);
      const [{ locked }] = (await runner.query('SELECT pg_try_advisory_xact_lock($1::bigint) AS locked', [
        RETENTION_LOCK_KEY,
      ])) as { locked: boolean }[];
      if (!locked) {
        await runner.rollbackTransaction();
        return { ran: false, ...NOTHING };
      }
      const result: PurgeResult = {
        ran: true,
        invitations: await affected(
          runner,
          `DELETE FROM invitation WHERE "expiresAt" < $1::timestamptz - make_interval(days => ${INVITATION_GRACE_DAYS})`,
          now,
        ),
        // A plan's age is its session day, or the day it was made when it has none.
        plans: await affected(
          runner,
          `DELETE FROM session_plan p USING club c
            WHERE p."clubId" = c.id AND COALESCE(p."date", p."createdAt"::date) < ${CLUB_CUTOFF}::date`,
          now,
        ),
        attendance: await affected(
          runner,
          `DELETE FROM attendance a USING club c WHERE a."clubId" = c.id AND a."recordedAt" < ${CLUB_CUTOFF}`,
          now,
        ),
        feedback: await affected(
          runner,
          `DELETE FROM feedback f USING club c WHERE f."clubId" = c.id AND f."createdAt" < ${CLUB_CUTOFF}`,
          now,
        ),
        // Sent rows hold no body any more; a message that failed for good still does, so it goes
        // the same number of days after it was queued.
        outbox: await affected(
          runner,
          `DELETE FROM outbox_message
            WHERE (status = 'sent' AND "sentAt" < $1::timestamptz - make_interval(days => ${OUTBOX_KEEP_DAYS}))
               OR (status = 'failed' AND "createdAt" < $1::timestamptz - make_interval(days => ${OUTBOX_KEEP_DAYS}))`,
          now,
        ),
      };
      await runner.commitTransaction();
      return result;
    } catch (error) {
      if (runner.isTransactionActive) await runner.rollbackTransaction();
      throw error;
    } finally {
      await runner.release();
    }
  }
}

async function affected(runner: QueryRunner, sql: string, now: Date): Promise<number> {
  const result = (await runner.query(sql, [now.toISOString()], true)) as { affected?: number | null };
  return result.affected ?? 0;
}

export interface RetentionJobOptions {
  dataSource: DataSource;
  /** How often to purge; six hours unless told. */
  intervalMs?: number;
  /** The first purge this long after start (so starting stays quick); one minute unless told. */
  firstDelayMs?: number;
  onError?: (error: unknown) => void;
  onPurged?: (result: PurgeResult) => void;
}

/**
 * Runs the purge on a timer in every server instance; the advisory lock makes the instances take
 * turns, so running several is safe. stop() waits for a purge under way.
 */
export function startRetentionJob(options: RetentionJobOptions): { stop(): Promise<void> } {
  const service = new RetentionService(options.dataSource);
  const intervalMs = options.intervalMs ?? 6 * 60 * 60_000;
  let timer: NodeJS.Timeout | null = null;
  let running: Promise<unknown> | null = null;
  let stopped = false;
  const tick = () => {
    if (stopped) return;
    running = service
      .purge()
      .then((result) => options.onPurged?.(result))
      .catch((error) => options.onError?.(error))
      .finally(() => {
        running = null;
        if (!stopped) timer = setTimeout(tick, intervalMs);
      });
  };
  timer = setTimeout(tick, options.firstDelayMs ?? 60_000);
  return {
    async stop() {
      stopped = true;
      if (timer) clearTimeout(timer);
      await running;
    },
  };
}
