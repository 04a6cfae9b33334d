/**
 * The API in Spanish: what the server writes follows the reader's language (the language cookie,
 * else Accept-Language, which the app sets to its own build's) — a plan's words, the printed card,
 * an e-mail, a refusal — while everything that is not words (ids, minutes, places, codes, problem
 * types) stays the same. Expected Spanish comes from the translation files through the server's
 * own `$localize` and rules/words/es.json, so the test follows the translators, not a copy.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import startingRulesInSpanish from '../../rules/words/es.json';
import { inLanguage } from '../../server/i18n/translations';
import { schemaWords } from '../../shared/i18n/schema-words';
import type { Plan } from '../../shared/types';
import type { SessionPlanDto } from '../../shared/types/api';
import {
  clubWithStaff,
  createTeam,
  newestMail,
  startTestApp,
  uniqueEmail,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';
import { createSquad, planRequest, type Squad } from './fixtures/plan-helpers';

const RULE_WORDS: Record<string, string> = startingRulesInSpanish;
const scratch = mkdtempSync(join(tmpdir(), 'conewise-es-'));
const SPANISH = { 'accept-language': 'es-ES,es;q=0.9' };
const ENGLISH = { 'accept-language': 'en-GB,en;q=0.9' };

function pdfText(pdf: Buffer): string {
  const file = join(scratch, 'card.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-raw', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}

/** A plan without its words: what must not change with the language. */
const shape = (plan: Plan) => ({
  phases: plan.phases.map((p) => ({
    minutes: [p.startMinute, p.endMinute],
    activityId: p.activityId,
    stations: p.stations.map((s) => [
      s.activityId,
      s.playerIds,
      s.area,
      s.position,
      s.conePositions,
      s.positions,
    ]),
  })),
  warnings: plan.warnings.map((n) => n.code),
  cautions: plan.cautions.map((n) => n.code),
  touches: plan.touches,
  equipmentNeeded: plan.equipmentNeeded,
});

const stations = (plan: Plan) => plan.phases.flatMap((p) => p.stations);

describe('the API in Spanish', () => {
  let app: TestApp;
  let club: ClubCast;
  let squad: Squad;
  let english: SessionPlanDto;
  let spanish: SessionPlanDto;

  const makePlan = async (headers: Record<string, string>) => {
    const response = await app.api.post(
      '/api/plans',
      { teamId: squad.teamId, date: '2026-12-05', kickOff: '10:30', request: planRequest(squad.playerIds) },
      { token: club.coach.token, headers },
    );
    expect(response.status, response.text).toBe(201);
    return response;
  };

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Alderbank Juniors');
    squad = await createSquad(app, club.coach.token, 12, 'U10 Larks');
    english = (await makePlan(ENGLISH)).body;
    // The planner varies a team's activities from one plan to the next: the English plan goes, so
    // the Spanish one is made from the same history.
    expect(
      (await app.api.call('DELETE', `/api/plans/${english.id}`, { token: club.coach.token })).status,
    ).toBe(204);
    const made = await makePlan(SPANISH);
    expect(made.headers.get('content-language')).toBe('es');
    spanish = made.body;
  });
  afterAll(async () => {
    await app.close();
    rmSync(scratch, { recursive: true, force: true });
  });

  it('makes the same plan in either language: only the words differ', () => {
    expect(shape(spanish.plan)).toEqual(shape(english.plan));
    const [en, es] = [stations(english.plan), stations(spanish.plan)];
    expect(en.length).toBeGreaterThan(0);
    es.forEach((station, i) => {
      // The starting rules' activity titles, read in Spanish.
      expect(station.title).toBe(RULE_WORDS[en[i]!.title] ?? station.title);
      expect(station.title).not.toBe(en[i]!.title);
      // Coaching points from the rules and from the roles, every one in Spanish.
      expect(station.coachingPoints).toHaveLength(en[i]!.coachingPoints.length);
      station.coachingPoints.forEach((point, j) => expect(point).not.toBe(en[i]!.coachingPoints[j]));
    });
    for (const [i, caution] of spanish.plan.cautions.entries())
      expect(caution.message).not.toBe(english.plan.cautions[i]!.message);
    expect(spanish.plan.phases.map((p) => p.name)).not.toEqual(english.plan.phases.map((p) => p.name));
  });

  it('prints the card in the reader’s language', async () => {
    const card = async (headers: Record<string, string>) => {
      const response = await fetch(`${app.http.url}/api/plans/${spanish.id}/pdf`, {
        headers: { authorization: `Bearer ${club.coach.token}`, ...headers },
      });
      expect(response.status).toBe(200);
      return pdfText(Buffer.from(await response.arrayBuffer()));
    };
    const text = await card(SPANISH);
    const heading = inLanguage('es', () => $localize`Coaching points`);
    expect(heading).not.toBe('Coaching points');
    expect(text).toContain(heading);
    expect(text).toContain(inLanguage('es', () => $localize`Safety`));
    expect(text).not.toContain('Coaching points');
    expect(text).toContain(stations(spanish.plan)[0]!.title);
    expect(await card(ENGLISH)).toContain('Coaching points');
  });

  it('writes an invitation e-mail in the inviter’s language', async () => {
    const team = await createTeam(app, club.lead.token, { name: 'U9 Finches' });
    const email = uniqueEmail('invitado');
    const invited = await app.api.post(
      '/api/invitations',
      { email, role: 'coach', teamId: team.id },
      { token: club.lead.token, headers: SPANISH },
    );
    expect(invited.status, invited.text).toBe(201);
    const mail = await newestMail(app, email, 'invitation');
    const inviter = club.lead.user.name;
    const clubName = 'Alderbank Juniors';
    expect(mail.subject).toBe(
      inLanguage('es', () => $localize`${inviter}:inviter: invited you to ${clubName}:clubName: on Conewise`),
    );
    expect(mail.subject).not.toContain('invited you');
    expect(mail.textBody).toContain(`${app.config.publicUrl}/join#`);
  });

  it('refuses in the reader’s language, with the same problem type; the chosen language beats the browser’s', async () => {
    const asked = (headers: Record<string, string>) =>
      app.api.post('/api/teams', { name: '' }, { token: club.coach.token, headers });
    const [en, es, chosen] = [
      await asked(ENGLISH),
      await asked(SPANISH),
      await asked({ ...ENGLISH, cookie: 'cw-lang=es' }),
    ];
    expect(en.status).toBe(400);
    expect(es.status).toBe(400);
    expect(es.body.type).toBe(en.body.type);
    expect(es.body.title).not.toBe(en.body.title);
    expect(es.body.errors.map((e: { field: string }) => e.field)).toEqual(
      en.body.errors.map((e: { field: string }) => e.field),
    );
    expect(es.body.errors[0].message).not.toBe(en.body.errors[0].message);
    expect(chosen.body.title).toBe(es.body.title);
    // A problem the request schema words itself reads in Spanish too.
    const badTag = await app.api.call('PATCH', '/api/auth/me', {
      body: { locale: 'not a tag' },
      token: club.coach.token,
      headers: SPANISH,
    });
    expect(badTag.status).toBe(400);
    const words = inLanguage('es', () => schemaWords('must be a language tag such as en-GB'));
    expect(words).not.toBe('must be a language tag such as en-GB');
    expect(badTag.body.errors).toContainEqual({ field: 'locale', message: words });
  });
});
