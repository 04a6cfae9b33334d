import { execFileSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pg from 'pg';
import { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { isFirstFormat, validateRuleSet } from '../../engine';
import type { SessionPlanDto } from '../../shared/types/api';
import type { RuleSetDocument } from '../../shared/types/plan-rules';
import { connectAndMigrate, createDataSource } from '../../server/data-source';
import { MIGRATIONS } from '../../server/migrations';
import { SixteenActivityKinds1764631000000 } from '../../server/migrations/1764631000000-sixteen-activity-kinds';
import { hashPassword } from '../../server/services/auth-service';
import { checkPlanShape } from '../../server/services/plan-shape';
import { startTestApp, TEST_PASSWORD, type TestApp } from '../support/api-test-app';
import firstFormatRules from './fixtures/first-format-rule-set.json';
import { FIRST_FORMAT_PLAN, SAMPLE_NAMES } from './fixtures/sample-plan';

/** The same cluster, another database: the upgrade runs on data of its own. */
function databaseUrl(name: string): string {
  const url = new URL(inject('databaseUrl'));
  url.pathname = `/${name}`;
  return url.toString();
}

async function admin<T>(work: (client: InstanceType<typeof pg.Client>) => Promise<T>): Promise<T> {
  const client = new pg.Client(inject('databaseUrl'));
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

const scratch = mkdtempSync(join(tmpdir(), 'conewise-upgrade-'));

function pdfText(pdf: Buffer): string {
  const file = join(scratch, 'card.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-layout', file, '-'], { encoding: 'utf8' });
}

const UPGRADE_INDEX = MIGRATIONS.indexOf(SixteenActivityKinds1764631000000);

/** A first-format club rule set with numbers the club had tuned, its own activity and rule. */
function tunedFirstFormat() {
  const doc = structuredClone(firstFormatRules) as unknown as {
    parameters: {
      groupSizes: Record<string, Record<string, { min: number; preferred: number; max: number }>>;
      activities: Record<string, unknown>[];
    };
    rules: unknown[];
  };
  doc.parameters.groupSizes['keep-ball']!['intermediate'] = { min: 5, preferred: 6, max: 7 };
  doc.parameters.activities.push({
    id: 'club-wall-passes',
    kind: 'pairs',
    title: 'Wall passes on the fence',
    description: 'Pairs play one-twos along the fence. Swap sides every minute.',
    coachingPoints: ['Pass firmly along the ground'],
    intensity: 2,
    focus: ['passing'],
  });
  return doc;
}

describe('upgrade of stored data to the sixteen activity kinds', () => {
  const name = `conewise_upgrade_${randomBytes(4).toString('hex')}`;
  const url = databaseUrl(name);
  const email = `lead-${randomBytes(3).toString('hex')}@example.org`;
  const ids = {
    club: '0d7a0f3e-1c1e-4f7e-9d55-1f0c2a5b9a01',
    user: '0d7a0f3e-1c1e-4f7e-9d55-1f0c2a5b9a02',
    team: '0d7a0f3e-1c1e-4f7e-9d55-1f0c2a5b9a03',
    plan: '0d7a0f3e-1c1e-4f7e-9d55-1f0c2a5b9a04',
    rules: '0d7a0f3e-1c1e-4f7e-9d55-1f0c2a5b9a05',
    change: '0d7a0f3e-1c1e-4f7e-9d55-1f0c2a5b9a06',
  };
  const playerIds: string[] = [];
  let applied: string[] = [];
  let app: TestApp | null = null;

  beforeAll(async () => {
    await admin((client) => client.query(`CREATE DATABASE "${name}"`));
    // The database as it stood before the upgrade: every earlier migration, first-format rows.
    const before = new DataSource({
      type: 'postgres',
      url,
      entities: [],
      migrations: MIGRATIONS.slice(0, UPGRADE_INDEX),
      migrationsTableName: 'migrations',
    });
    await before.initialize();
    try {
      await before.runMigrations({ transaction: 'each' });
      const q = (sql: string, values: unknown[]) => before.query(sql, values);
      await q('INSERT INTO club (id, name) VALUES ($1, $2)', [ids.club, 'Old Mill Juniors']);
      await q('INSERT INTO app_user (id, email, name, "passwordHash") VALUES ($1, $2, $3, $4)', [
        ids.user,
        email,
        'Wren Lead',
        await hashPassword(TEST_PASSWORD),
      ]);
      await q(`INSERT INTO membership ("clubId", "userId", role) VALUES ($1, $2, 'lead')`, [
        ids.club,
        ids.user,
      ]);
      await q(
        `INSERT INTO team (id, "clubId", name, "ageGroup", level, "spaceWidth", "spaceLength")
         VALUES ($1, $2, 'U10 Millers', 'U10', 'intermediate', 40, 30)`,
        [ids.team, ids.club],
      );
      for (const [i, displayName] of SAMPLE_NAMES.entries()) {
        const [row] = await q(
          `INSERT INTO player ("clubId", "teamId", "displayName", goalkeeper) VALUES ($1, $2, $3, $4) RETURNING id`,
          [ids.club, ids.team, displayName, i === 6],
        );
        playerIds.push(row.id);
      }
      await q(
        `INSERT INTO kit_bag ("teamId", "clubId", balls, cones, bibs, goals) VALUES ($1, $2, 16, 40, 8, 4)`,
        [ids.team, ids.club],
      );
      await q(
        `INSERT INTO session_plan (id, "clubId", "teamId", date, "kickOff", kind, minutes, "playerCount", request,
                                   plan, "ruleSetId", "ruleSetVersion", seed, status, "authorId", version)
         VALUES ($1, $2, $3, '2026-11-07', '10:30', 'match-warm-up', 25, 14, $4::json, $5::json, 'default', 1,
                 'card-sample', 'final', $6, 1)`,
        [
          ids.plan,
          ids.club,
          ids.team,
          JSON.stringify(FIRST_FORMAT_PLAN.request),
          JSON.stringify(FIRST_FORMAT_PLAN),
          ids.user,
        ],
      );
      await q(
        `INSERT INTO feedback ("clubId", "teamId", "planId", "stationId", "phaseIndex", "activityKind", verdict)
         VALUES ($1, $2, $3, 's2-1', 1, 'pairs', 'too-easy')`,
        [ids.club, ids.team, ids.plan],
      );
      const body = JSON.stringify(tunedFirstFormat());
      await q(
        `INSERT INTO rule_set (id, "clubId", name, version, status, body, "authorId", "publishedAt", revision)
         VALUES ($1, $2, 'Old Mill rules', 4, 'published', $3::json, $4, now(), 3)`,
        [ids.rules, ids.club, body, ids.user],
      );
      await q(
        `INSERT INTO rule_set_change (id, "clubId", "ruleSetId", action, version, revision, "authorId", "authorName",
                                      "changedPaths", body)
         VALUES ($1, $2, $3, 'update', 4, 2, $4, 'Wren Lead', $5::jsonb, $6::json)`,
        [ids.change, ids.club, ids.rules, ids.user, JSON.stringify(['/parameters/phaseTemplates/U10']), body],
      );
    } finally {
      await before.destroy();
    }
    const after = createDataSource({ url, poolSize: 2 });
    try {
      applied = await connectAndMigrate(after);
    } finally {
      await after.destroy();
    }
    app = await startTestApp({}, url);
  });

  afterAll(async () => {
    await app?.close();
    await admin((client) => client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
    rmSync(scratch, { recursive: true, force: true });
  });

  const query = async <T>(sql: string, values: unknown[] = []): Promise<T[]> =>
    app!.dataSource.query(sql, values);

  it('runs the upgrade and the migrations after it', () => {
    expect(applied).toEqual(MIGRATIONS.slice(UPGRADE_INDEX).map((m) => new m().name));
  });

  it('upgrades the club rule set: valid in the current format, the club’s tuning and activity kept, columns as they were', async () => {
    const [row] = await query<{
      name: string;
      version: number;
      status: string;
      revision: number;
      body: unknown;
    }>('SELECT name, version, status, revision, body FROM rule_set WHERE id = $1', [ids.rules]);
    expect(row).toMatchObject({ name: 'Old Mill rules', version: 4, status: 'published', revision: 4 });
    expect(isFirstFormat(row!.body)).toBe(false);
    expect(validateRuleSet(row!.body).errors).toEqual([]);
    const body = row!.body as RuleSetDocument;
    expect(body.parameters.groupSizes['keep-ball'].intermediate).toEqual({ min: 5, preferred: 6, max: 7 });
    expect(body.parameters.activities.find((a) => a.id === 'club-wall-passes')).toMatchObject({
      kind: 'passing-pattern',
      origin: 'club',
      title: 'Wall passes on the fence',
    });
    // No activity or age group names the old kind (a passing layout may still be called "pairs").
    expect(body.parameters.activities.filter((a) => (a.kind as string) === 'pairs')).toEqual([]);
    expect(Object.values(body.parameters.ageGroups).flatMap((g) => g.allowedKinds)).not.toContain('pairs');
  });

  it('leaves the rule-set history as it was written', async () => {
    const [change] = await query<{ body: unknown; changedPaths: string[] }>(
      'SELECT body, "changedPaths" FROM rule_set_change WHERE id = $1',
      [ids.change],
    );
    expect(isFirstFormat(change!.body)).toBe(true);
    expect(change!.changedPaths).toEqual(['/parameters/phaseTemplates/U10']);
  });

  it('renames pairs feedback and gives the stored plan kinds on every phase and start positions on every station', async () => {
    const [feedback] = await query<{ activityKind: string }>(
      'SELECT "activityKind" FROM feedback WHERE "planId" = $1',
      [ids.plan],
    );
    expect(feedback!.activityKind).toBe('passing-pattern');
    const [row] = await query<{ plan: SessionPlanDto['plan']; request: SessionPlanDto['request'] }>(
      'SELECT plan, request FROM session_plan WHERE id = $1',
      [ids.plan],
    );
    const plan = row!.plan;
    expect(plan.phases.map((p) => p.activityKind)).toEqual([
      'ball-mastery',
      'passing-pattern',
      'keep-ball',
      'small-sided-game',
    ]);
    expect(plan.phases[1]!.stations.every((s) => s.activityKind === 'passing-pattern')).toBe(true);
    expect(plan.phases.flatMap((p) => p.stations).every((s) => Array.isArray(s.positions))).toBe(true);
    expect(plan.forbiddenActivities).toEqual([{ kind: 'passing-pattern', reason: 'not with this squad' }]);
    for (const request of [plan.request, row!.request])
      expect(request.recentFeedback).toEqual([{ activityKind: 'passing-pattern', verdict: 'too-easy' }]);
    // The stored plan now passes the current plan schema, as a plan sent back by a client must.
    expect(checkPlanShape(plan)).toEqual([]);
  });

  it('serves the old plan and prints its card', async () => {
    const login = await app!.api.post('/api/auth/login', { email, password: TEST_PASSWORD });
    expect(login.status).toBe(200);
    const token = login.body.token as string;
    const read = await app!.api.get(`/api/plans/${ids.plan}`, { token });
    expect(read.status, read.text).toBe(200);
    expect(read.body.plan.phases[1].stations[0].activityKind).toBe('passing-pattern');
    const response = await fetch(`${app!.http.url}/api/plans/${ids.plan}/pdf`, {
      headers: { authorization: `Bearer ${token}` },
    });
    expect(response.status).toBe(200);
    const text = pdfText(Buffer.from(await response.arrayBuffer()));
    expect(text).toContain('U10 Millers');
    expect(text).toContain('Pass through the gate');
    expect(text).toContain('Passing practice');
    for (const player of SAMPLE_NAMES) expect(text).toContain(player);
  });

  it('plans for the team with the upgraded rules, hearing the renamed feedback and the old plan’s activities', async () => {
    const login = await app!.api.post('/api/auth/login', { email, password: TEST_PASSWORD });
    const created = await app!.api.post(
      '/api/plans',
      {
        teamId: ids.team,
        request: {
          ageGroup: 'U10',
          level: 'intermediate',
          players: playerIds.map((id) => ({ id })),
          coaches: 2,
          equipment: { balls: 16, cones: 40, bibs: 8, goals: 4 },
          space: { width: 40, length: 30 },
          minutes: 25,
          kind: 'match-warm-up',
          seed: 'after-upgrade',
        },
      },
      { token: login.body.token },
    );
    expect(created.status, created.text).toBe(201);
    expect(created.body.ruleSetId).toBe(ids.rules);
    expect(created.body.request.recentFeedback[0]).toMatchObject({ activityKind: 'passing-pattern' });
    // The old plan's activities were filled in for variety, in plan order.
    expect(created.body.request.recentActivityIds).toEqual([
      'travel-touches',
      'pass-pairs',
      'rondo-4v1',
      'ssg-7v7',
    ]);
  });

  it('says it cannot be undone rather than pretend to restore the first format', async () => {
    await expect(new SixteenActivityKinds1764631000000().down()).rejects.toThrow(/cannot be undone/);
  });
});
