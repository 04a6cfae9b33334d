/**
 * The last-lead rule under concurrency: two leads who demote or remove each other at the same
 * moment must leave the club with one lead, never none.
 *
 * Left to chance, the loser of such a race may also be turned away earlier, by the sign-in check
 * (its account or role is already gone), which would make the outcome vary from run to run. So
 * each round holds the club's row locked from the test, sends both requests, waits until both are
 * queued behind that lock (past the sign-in check, inside the service's transaction), and only
 * then lets them go: the two requests then meet exactly where the rule is checked.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ApiResponse } from '../support/api-client';
import { addMember, registerClub, startTestApp, type SignedIn, type TestApp } from '../support/api-test-app';

const ROUNDS = 4;

describe('at least one lead, even when two leads act at once', () => {
  let app: TestApp;
  beforeAll(async () => {
    app = await startTestApp();
  });
  afterAll(() => app.close());

  /** A fresh club with two leads, both signed in. */
  async function twoLeads(name: string): Promise<[SignedIn, SignedIn]> {
    const first = await registerClub(app, name);
    const second = await addMember(app, first.user.clubId, 'lead', 'Lou Lead');
    return [first, second];
  }

  async function leadsOf(clubId: string): Promise<string[]> {
    const rows = (await app.dataSource.query(
      `SELECT "userId" FROM membership WHERE "clubId" = $1 AND role = 'lead'`,
      [clubId],
    )) as { userId: string }[];
    return rows.map((row) => row.userId);
  }

  /**
   * Sends the requests while the test holds the club's row, waits until every one of them is
   * waiting (directly or behind another) on the test's lock, then releases it and returns the
   * answers. Fails if the requests never wait on the club's row, i.e. if the check is unlocked.
   */
  async function releasedTogether(
    clubId: string,
    send: () => Promise<ApiResponse>[],
  ): Promise<ApiResponse[]> {
    const holder = app.dataSource.createQueryRunner();
    await holder.connect();
    let pending: Promise<ApiResponse>[] = [];
    try {
      await holder.startTransaction();
      await holder.query('SELECT id FROM club WHERE id = $1 FOR UPDATE', [clubId]);
      const [{ pid }] = (await holder.query('SELECT pg_backend_pid() AS pid')) as { pid: number }[];
      pending = send();
      await expect
        .poll(
          async () => {
            const [{ waiting }] = (await app.dataSource.query(
              `WITH RECURSIVE behind(pid) AS (
                 SELECT pid FROM pg_stat_activity WHERE $1::int = ANY(pg_blocking_pids(pid))
                 UNION
                 SELECT a.pid FROM pg_stat_activity a JOIN behind b ON b.pid = ANY(pg_blocking_pids(a.pid))
               )
               SELECT count(*)::int AS waiting FROM behind`,
              [pid],
            )) as { waiting: number }[];
            return waiting;
          },
          { timeout: 15_000, interval: 50 },
        )
        .toBe(pending.length);
      await holder.commitTransaction();
      return await Promise.all(pending);
    } finally {
      if (holder.isTransactionActive) await holder.rollbackTransaction();
      await holder.release();
      await Promise.allSettled(pending);
    }
  }

  it(`two leads removing each other at once: one is removed, the other is told a lead is needed (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const [first, second] = await twoLeads(`Removal Race ${round}`);
      const clubId = first.user.clubId;
      const answers = await releasedTogether(clubId, () => [
        app.api.delete(`/api/members/${second.user.id}`, { token: first.token }),
        app.api.delete(`/api/members/${first.user.id}`, { token: second.token }),
      ]);
      expect(answers.map((a) => a.status).sort()).toEqual([204, 409]);
      const refused = answers.find((a) => a.status === 409)!;
      expect(refused.body.detail).toContain(`Removal Race ${round} needs at least one head of coaching`);
      const leads = await leadsOf(clubId);
      expect(leads).toHaveLength(1);
      // The lead left is the one whose removal of the other went through.
      const winner = answers[0]!.status === 204 ? first : second;
      expect(leads).toEqual([winner.user.id]);
    }
  });

  it(`two leads demoting each other at once: one becomes a coach, the other stays lead (${ROUNDS} rounds)`, async () => {
    for (let round = 0; round < ROUNDS; round++) {
      const [first, second] = await twoLeads(`Demotion Race ${round}`);
      const clubId = first.user.clubId;
      const answers = await releasedTogether(clubId, () => [
        app.api.patch(`/api/members/${second.user.id}`, { role: 'coach' }, { token: first.token }),
        app.api.patch(`/api/members/${first.user.id}`, { role: 'coach' }, { token: second.token }),
      ]);
      expect(answers.map((a) => a.status).sort()).toEqual([200, 409]);
      const refused = answers.find((a) => a.status === 409)!;
      expect(refused.body.detail).toContain(`Demotion Race ${round} needs at least one head of coaching`);
      const leads = await leadsOf(clubId);
      expect(leads).toHaveLength(1);
      const winner = answers[0]!.status === 200 ? first : second;
      expect(leads).toEqual([winner.user.id]);
    }
  });

  it('a lead demoting themselves while removing the other lead keeps one lead', async () => {
    const [first, second] = await twoLeads('Self Demotion Race');
    const answers = await releasedTogether(first.user.clubId, () => [
      app.api.patch(`/api/members/${first.user.id}`, { role: 'assistant' }, { token: first.token }),
      app.api.delete(`/api/members/${second.user.id}`, { token: first.token }),
    ]);
    expect(answers.map((a) => a.status).filter((s) => s === 409)).toHaveLength(1);
    expect(await leadsOf(first.user.clubId)).toHaveLength(1);
  });
});
