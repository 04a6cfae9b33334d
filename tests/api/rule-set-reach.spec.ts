/** Publishing in words: who the club's rules reach, a version's summary, and each save's before and after. */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RuleSetDto } from '../../shared/types/api';
import type { RuleSetDocument } from '../../shared/types/plan-rules';
import type { RuleSetChangeDto, RuleSetReachDto, RuleSetSummaryDto } from '../../shared/types/rule-set-api';
import {
  clubWithStaff,
  createTeam,
  startTestApp,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';
import { createPlan, createSquad } from './fixtures/plan-helpers';

const scratch = mkdtempSync(join(tmpdir(), 'conewise-rules-card-'));

describe('/api/rule-sets/reach and summary', () => {
  let app: TestApp;
  let club: ClubCast;
  let rival: ClubCast;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Fernmoor Rovers');
    rival = await clubWithStaff(app, 'Saltmarsh United');
  });
  afterAll(async () => {
    await app.close();
    rmSync(scratch, { recursive: true, force: true });
  });

  const reach = async (token: string) => app.api.get('/api/rule-sets/reach', { token });

  it('counts only the club’s own teams and their staff, and only for the head of coaching', async () => {
    expect((await reach(club.lead.token)).body).toEqual({ teams: 0, coaches: 0 });
    await createTeam(app, club.coach.token, { name: 'U9 Comets' });
    await createTeam(app, club.coach.token, { name: 'U11 Swifts', ageGroup: 'U11' });
    for (const name of ['U8 Otters', 'U10 Herons', 'U12 Kites'])
      await createTeam(app, rival.coach.token, { name });

    const ours = await reach(club.lead.token);
    expect(ours.status).toBe(200);
    expect(ours.body as RuleSetReachDto).toEqual({ teams: 2, coaches: 1 });
    expect((await reach(rival.lead.token)).body).toEqual({ teams: 3, coaches: 1 });

    expect((await reach(club.coach.token)).status).toBe(403);
    expect((await reach(club.assistant.token)).status).toBe(403);
  });

  it('sums up a version for any member, without its document, and keeps each save’s before and after', async () => {
    const starting = await app.api.get('/api/rule-sets/default/summary', { token: club.coach.token });
    expect(starting.status).toBe(200);
    expect(starting.body).toMatchObject({ id: 'default', builtIn: true, publishedAt: null });
    expect(starting.body).not.toHaveProperty('body');

    const created = await app.api.post(
      '/api/rule-sets',
      { name: 'Fernmoor rules' },
      { token: club.lead.token },
    );
    const draft = created.body as RuleSetDto;
    const body = structuredClone(draft.body) as RuleSetDocument;
    const before = body.parameters.groupSizes['keep-ball'].beginner.max;
    body.parameters.groupSizes['keep-ball'].beginner.max = before - 1;
    const saved = await app.api.put(
      `/api/rule-sets/${draft.id}`,
      { body },
      { token: club.lead.token, headers: { 'If-Match': `"${draft.revision}"` } },
    );
    expect(saved.status, saved.text).toBe(200);
    const published = await app.api.post(
      `/api/rule-sets/${draft.id}/publish`,
      {},
      { token: club.lead.token },
    );
    expect(published.status, published.text).toBe(200);

    const summary = await app.api.get(`/api/rule-sets/${draft.id}/summary`, { token: club.assistant.token });
    expect(summary.status).toBe(200);
    const words = summary.body as RuleSetSummaryDto;
    expect(words).toMatchObject({ name: 'Fernmoor rules', status: 'published', builtIn: false });
    expect(Date.parse(words.publishedAt!)).toBeGreaterThan(Date.now() - 60_000);
    expect(
      (await app.api.get(`/api/rule-sets/${draft.id}/summary`, { token: rival.lead.token })).status,
    ).toBe(404);

    const history = (await app.api.get('/api/rule-sets/history', { token: club.lead.token }))
      .body as RuleSetChangeDto[];
    const save = history.find((h) => h.action === 'update' && h.ruleSetId === draft.id)!;
    expect(save.changes).toEqual([
      {
        path: '/parameters/groupSizes/keep-ball/beginner/max',
        change: 'changed',
        before,
        after: before - 1,
      },
    ]);
  });

  it('prints the rules in words on the card, the plan ref in small print, no ids', async () => {
    const squad = await createSquad(app, club.coach.token, 10, 'U10 Wagtails');
    const plan = await createPlan(app, club.coach.token, squad);
    const response = await fetch(`${app.http.url}/api/plans/${plan.id}/pdf`, {
      headers: { authorization: `Bearer ${club.coach.token}` },
    });
    expect(response.status).toBe(200);
    const file = join(scratch, 'card.pdf');
    writeFileSync(file, Buffer.from(await response.arrayBuffer()));
    const text = execFileSync('pdftotext', ['-raw', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toMatch(/Club rules: Fernmoor rules, published \d{1,2} \w{3}/);
    expect(text).toContain(`plan ref ${plan.seed}`);
    expect(text).not.toContain(plan.ruleSetId);
    expect(text).not.toMatch(/rules \S+ v\d/);
  });
});
