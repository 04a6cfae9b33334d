import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { RuleSetDto, SessionPlanDto } from '../../shared/types/api';
import { clubWithStaff, startTestApp, type ClubCast, type TestApp } from '../support/api-test-app';
import { createPlan, createSquad } from './fixtures/plan-helpers';

/** Generated junk: any JSON, and objects that look almost right. */
const junk = fc.oneof(
  fc.jsonValue(),
  fc.dictionary(
    fc.constantFrom(
      'stationId',
      'phaseIndex',
      'verdict',
      'clientId',
      'add',
      'remove',
      'fromMinute',
      'playerIds',
      'recipients',
      'body',
      'name',
      'to',
      'edit',
      'plan',
    ),
    fc.oneof(fc.jsonValue(), fc.string(), fc.integer(), fc.array(fc.string())),
  ),
);

describe('junk bodies on attendance, feedback, pitch-side and rule-set routes', () => {
  let app: TestApp;
  let club: ClubCast;
  let plan: SessionPlanDto;
  let draft: RuleSetDto;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Kiln Street Juniors');
    plan = await createPlan(
      app,
      club.coach.token,
      await createSquad(app, club.coach.token, 9, 'U10 Finches'),
    );
    draft = (await app.api.post('/api/rule-sets', {}, { token: club.lead.token })).body;
  });
  afterAll(() => app.close());

  it('answers 4xx, never 5xx, and leaves the stored plan as it was', async () => {
    const routes: [string, string][] = [
      ['POST', `/api/plans/${plan.id}/feedback`],
      ['POST', `/api/plans/${plan.id}/replan`],
      ['POST', `/api/plans/${plan.id}/progression`],
      ['PUT', `/api/plans/${plan.id}/attendance`],
      ['POST', `/api/plans/${plan.id}/share`],
      ['POST', '/api/rule-sets'],
      ['PUT', `/api/rule-sets/${draft.id}`],
      ['POST', '/api/rule-sets/rollback'],
    ];
    await fc.assert(
      fc.asyncProperty(junk, fc.constantFrom(...routes), async (body, [method, path]) => {
        const response = await app.api.call(method, path, {
          body,
          token: club.lead.token,
          headers: { 'If-Match': String(draft.revision) },
        });
        expect(response.status, `${method} ${path} ${JSON.stringify(body)} → ${response.text}`).toBeLessThan(
          500,
        );
        if (response.status >= 400)
          expect(response.headers.get('content-type')).toContain('application/problem+json');
      }),
      { numRuns: 150 },
    );
    const after = await app.api.get(`/api/plans/${plan.id}`, { token: club.coach.token });
    expect(after.body.plan.phases.length).toBe(plan.plan.phases.length);
  });
});
