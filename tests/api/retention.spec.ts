/**
 * Retention on the real PostgreSQL: the club's setting (GET/PUT /api/club/retention: everyone
 * reads, the head of coaching changes, bad values refused naming the field) and the purge
 * (server/services/retention-service.ts): rows past their limit go, younger ones stay, each club's
 * own setting counts, and two purges at once take turns through the advisory lock.
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { ClubRetentionDto } from '../../shared/types/api';
import {
  DAYS_PER_SEASON,
  RETENTION_LOCK_KEY,
  RetentionService,
} from '../../server/services/retention-service';
import { createPlan, createSquad, type Squad } from './fixtures/plan-helpers';
import { clubWithStaff, startTestApp, type ClubCast, type TestApp } from '../support/api-test-app';

const DAY = 24 * 60 * 60_000;

describe('retention: the club setting and the purge', () => {
  let app: TestApp;
  let club: ClubCast;
  let other: ClubCast;
  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Keepwell Albion');
    other = await clubWithStaff(app, 'Shortmemory United');
  });
  afterAll(() => app.close());

  const retention = async (token: string): Promise<ClubRetentionDto> => {
    const response = await app.api.get<ClubRetentionDto>('/api/club/retention', { token });
    expect(response.status, response.text).toBe(200);
    return response.body;
  };

  it('a new club keeps three seasons; everyone in it can read that', async () => {
    expect(await retention(club.lead.token)).toEqual({ seasons: 3 });
    expect(await retention(club.assistant.token)).toEqual({ seasons: 3 });
  });

  it('only the head of coaching changes it, to a whole number from 1 to 10; another club is untouched', async () => {
    for (const who of [club.coach, club.assistant]) {
      const refused = await app.api.put('/api/club/retention', { seasons: 1 }, { token: who.token });
      expect(refused.status).toBe(403);
    }
    for (const bad of [0, 11, 2.5, 'two']) {
      const response = await app.api.put(
        '/api/club/retention',
        { seasons: bad },
        { token: other.lead.token },
      );
      expect(response.status, response.text).toBe(400);
      expect(response.body.errors).toEqual([
        { field: 'seasons', message: 'must be a whole number of seasons from 1 to 10' },
      ]);
    }
    const missing = await app.api.put('/api/club/retention', {}, { token: other.lead.token });
    expect(missing.status).toBe(400);
    expect(missing.body.errors).toEqual([{ field: 'seasons', message: 'is required' }]);
    // Nothing refused was saved.
    expect(await retention(other.lead.token)).toEqual({ seasons: 3 });

    const changed = await app.api.put<ClubRetentionDto>(
      '/api/club/retention',
      { seasons: 1 },
      { token: other.lead.token },
    );
    expect(changed.status, changed.text).toBe(200);
    expect(changed.body).toEqual({ seasons: 1 });
    expect(await retention(other.coach.token)).toEqual({ seasons: 1 });
    expect(await retention(club.lead.token)).toEqual({ seasons: 3 });
  });

  describe('the purge', () => {
    const now = new Date();
    const daysAgo = (days: number) => new Date(now.getTime() - days * DAY);
    const dayOf = (days: number) => daysAgo(days).toISOString().slice(0, 10);
    const ids: Record<string, string> = {};
    let squad: Squad;
    let otherSquad: Squad;

    const exists = async (table: string, id: string): Promise<boolean> => {
      const rows = await app.dataSource.query(`SELECT 1 FROM "${table}" WHERE id = $1`, [id]);
      return rows.length === 1;
    };
    const addAttendance = async (clubId: string, planId: string, playerId: string, ago: number) => {
      const [row] = await app.dataSource.query(
        `INSERT INTO attendance ("clubId", "planId", "playerId", "recordedAt") VALUES ($1, $2, $3, $4) RETURNING id`,
        [clubId, planId, playerId, daysAgo(ago)],
      );
      return row.id as string;
    };
    const addFeedback = async (clubId: string, teamId: string, planId: string, ago: number) => {
      const [row] = await app.dataSource.query(
        `INSERT INTO feedback ("clubId", "teamId", "planId", "stationId", verdict, note, "createdAt")
         VALUES ($1, $2, $3, 's1', 'right', 'Went well', $4) RETURNING id`,
        [clubId, teamId, planId, daysAgo(ago)],
      );
      return row.id as string;
    };
    const addInvitation = async (clubId: string, expiredDaysAgo: number) => {
      const [row] = await app.dataSource.query(
        `INSERT INTO invitation ("clubId", email, role, "tokenHash", "expiresAt")
         VALUES ($1, $2, 'coach', $3, $4) RETURNING id`,
        [clubId, `${randomUUID()}@example.test`, randomUUID().replace(/-/g, ''), daysAgo(expiredDaysAgo)],
      );
      return row.id as string;
    };
    const addOutbox = async (status: string, sentDaysAgo: number | null, queuedDaysAgo: number) => {
      const [row] = await app.dataSource.query(
        `INSERT INTO outbox_message ("clubId", kind, recipients, subject, "textBody", status, "sentAt", "createdAt")
         VALUES ($1, 'plan-share', '["a@example.test"]', 'A plan', 'body', $2, $3, $4) RETURNING id`,
        [
          club.lead.user.clubId,
          status,
          sentDaysAgo === null ? null : daysAgo(sentDaysAgo),
          daysAgo(queuedDaysAgo),
        ],
      );
      return row.id as string;
    };

    beforeAll(async () => {
      squad = await createSquad(app, club.coach.token, 4);
      otherSquad = await createSquad(app, other.coach.token, 4);
      const clubId = club.lead.user.clubId;
      const otherId = other.lead.user.clubId;
      const seasons3 = 3 * DAYS_PER_SEASON;
      // This club keeps three seasons (1,095 days).
      ids.oldPlan = (await createPlan(app, club.coach.token, squad, { date: dayOf(seasons3 + 5) })).id;
      ids.keptPlan = (await createPlan(app, club.coach.token, squad, { date: dayOf(seasons3 - 5) })).id;
      ids.attendanceOnOldPlan = await addAttendance(clubId, ids.oldPlan, squad.playerIds[0], seasons3 + 5);
      ids.feedbackOnOldPlan = await addFeedback(clubId, squad.teamId, ids.oldPlan, seasons3 + 5);
      ids.oldAttendance = await addAttendance(clubId, ids.keptPlan, squad.playerIds[0], seasons3 + 1);
      ids.keptAttendance = await addAttendance(clubId, ids.keptPlan, squad.playerIds[1], seasons3 - 1);
      ids.oldFeedback = await addFeedback(clubId, squad.teamId, ids.keptPlan, seasons3 + 1);
      ids.keptFeedback = await addFeedback(clubId, squad.teamId, ids.keptPlan, seasons3 - 1);
      // The other club keeps one season (set above): two seasons ago is too old there.
      ids.otherOldPlan = (
        await createPlan(app, other.coach.token, otherSquad, { date: dayOf(2 * DAYS_PER_SEASON) })
      ).id;
      ids.otherKeptPlan = (
        await createPlan(app, other.coach.token, otherSquad, { date: dayOf(DAYS_PER_SEASON - 5) })
      ).id;
      ids.otherOldAttendance = await addAttendance(
        otherId,
        ids.otherKeptPlan,
        otherSquad.playerIds[0],
        DAYS_PER_SEASON + 1,
      );
      // Invitations: 30 days after they expire.
      ids.oldInvitation = await addInvitation(clubId, 31);
      ids.keptInvitation = await addInvitation(clubId, 29);
      // Outbox: 30 days after sending; one that failed for good, 30 days after it was queued.
      ids.oldSent = await addOutbox('sent', 31, 31);
      ids.keptSent = await addOutbox('sent', 29, 29);
      ids.oldFailed = await addOutbox('failed', null, 31);
      ids.pending = await addOutbox('pending', null, 31);
    });

    it('waits while another instance holds the lock, and touches nothing', async () => {
      const holder = app.dataSource.createQueryRunner();
      await holder.connect();
      try {
        await holder.startTransaction();
        await holder.query('SELECT pg_advisory_xact_lock($1::bigint)', [RETENTION_LOCK_KEY]);
        const result = await new RetentionService(app.dataSource).purge(now);
        expect(result).toEqual({
          ran: false,
          invitations: 0,
          plans: 0,
          attendance: 0,
          feedback: 0,
          outbox: 0,
        });
        expect(await exists('session_plan', ids.oldPlan)).toBe(true);
        expect(await exists('invitation', ids.oldInvitation)).toBe(true);
      } finally {
        await holder.rollbackTransaction();
        await holder.release();
      }
    });

    it('two purges at once: one does the work, neither fails; past rows go and younger ones stay', async () => {
      const service = new RetentionService(app.dataSource);
      const other = new RetentionService(app.dataSource);
      const results = await Promise.all([service.purge(now), other.purge(now)]);
      const total = (key: 'plans' | 'attendance' | 'feedback' | 'invitations' | 'outbox') =>
        results.reduce((sum, result) => sum + result[key], 0);
      expect(results.some((result) => result.ran)).toBe(true);
      // Whichever ran (or both, one after the other), each row went once.
      expect(total('plans')).toBe(2);
      expect(total('attendance')).toBe(2);
      expect(total('feedback')).toBe(1);
      expect(total('invitations')).toBe(1);
      expect(total('outbox')).toBe(2);

      const gone = [
        ['session_plan', ids.oldPlan],
        ['attendance', ids.attendanceOnOldPlan],
        ['feedback', ids.feedbackOnOldPlan],
        ['attendance', ids.oldAttendance],
        ['feedback', ids.oldFeedback],
        ['session_plan', ids.otherOldPlan],
        ['attendance', ids.otherOldAttendance],
        ['invitation', ids.oldInvitation],
        ['outbox_message', ids.oldSent],
        ['outbox_message', ids.oldFailed],
      ];
      const kept = [
        ['session_plan', ids.keptPlan],
        ['attendance', ids.keptAttendance],
        ['feedback', ids.keptFeedback],
        ['session_plan', ids.otherKeptPlan],
        ['invitation', ids.keptInvitation],
        ['outbox_message', ids.keptSent],
        ['outbox_message', ids.pending],
      ];
      for (const [table, id] of gone) expect(await exists(table, id), `${table} ${id} gone`).toBe(false);
      for (const [table, id] of kept) expect(await exists(table, id), `${table} ${id} kept`).toBe(true);

      // The kept plan still reads through the API.
      const plan = await app.api.get(`/api/plans/${ids.keptPlan}`, { token: club.coach.token });
      expect(plan.status, plan.text).toBe(200);
    });

    it('a later purge finds nothing more to do', async () => {
      const result = await new RetentionService(app.dataSource).purge(now);
      expect(result).toEqual({ ran: true, invitations: 0, plans: 0, attendance: 0, feedback: 0, outbox: 0 });
    });
  });
});
