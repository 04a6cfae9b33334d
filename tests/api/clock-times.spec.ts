/**
 * One session, the same clock times everywhere: what the plan page's timeline shows (the client's
 * own formatting path, timelineClock), what the printed card prints and what the share e-mail
 * says, for a training session (it starts at its start time) and a match warm-up (it ends at
 * kick-off), in the sender's stored locale: a 12-hour clock for en-US, 24-hour for en-GB.
 */
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionPlanDto } from '../../shared/types/api';
import { OutboxWorker } from '../../server/mail/outbox-worker';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { mailSettingsFromEnv } from '../../server/mail/mail-settings';
import { timelineClock } from '../../src/app/features/plans/services/timeline-clock';
import { clubWithStaff, startTestApp, type ClubCast, type TestApp } from '../support/api-test-app';
import { createPlan, createSquad, type Squad } from './fixtures/plan-helpers';

const scratch = mkdtempSync(join(tmpdir(), 'conewise-clock-'));

/** Spaces of any width as one plain space, so "6:00 PM" compares whatever space Intl put before PM. */
const plain = (text: string) => text.replace(/[\s\u00a0\u202f]+/g, ' ');

function pdfText(pdf: Buffer): string {
  const file = join(scratch, 'card.pdf');
  writeFileSync(file, pdf);
  return plain(execFileSync('pdftotext', ['-raw', file, '-'], { encoding: 'utf8' }));
}

describe('clock times agree on screen, on the card and in the e-mail', () => {
  let app: TestApp;
  let club: ClubCast;
  let squad: Squad;
  let fake: FakeSmtp;
  let sender: OutboxWorker;
  let training: SessionPlanDto;
  let warmUp: SessionPlanDto;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Clockwork Rovers');
    squad = await createSquad(app, club.coach.token, 12, 'U11 Kestrels');
    training = await createPlan(app, club.coach.token, squad, {
      kickOff: '18:00',
      request: { kind: 'training', minutes: 60 },
    });
    warmUp = await createPlan(app, club.coach.token, squad, {
      kickOff: '10:30',
      request: { kind: 'match-warm-up', minutes: 20 },
    });
    fake = await startFakeSmtp();
    sender = new OutboxWorker({
      dataSource: app.dataSource,
      mail: mailSettingsFromEnv({ host: '127.0.0.1', port: fake.port }),
      baseDelayMs: 20,
      maxDelayMs: 50,
    });
  });
  afterAll(async () => {
    await fake?.stop();
    await app.close();
    rmSync(scratch, { recursive: true, force: true });
  });

  async function useLocale(locale: string): Promise<void> {
    const response = await app.api.patch('/api/auth/me', { locale }, { token: club.coach.token });
    expect(response.status, response.text).toBe(200);
  }

  async function cardText(plan: SessionPlanDto): Promise<string> {
    const response = await fetch(`${app.http.url}/api/plans/${plan.id}/pdf`, {
      headers: { authorization: `Bearer ${club.coach.token}` },
    });
    expect(response.status).toBe(200);
    return pdfText(Buffer.from(await response.arrayBuffer()));
  }

  async function mailText(plan: SessionPlanDto, to: string): Promise<{ subject: string; text: string }> {
    const response = await app.api.post(
      `/api/plans/${plan.id}/share`,
      { recipients: [to] },
      { token: club.coach.token },
    );
    expect(response.status, response.text).toBe(202);
    await sender.drainOnce();
    const mail = await fake.waitFor((m) => m.to.includes(to));
    return { subject: plain(mail.subject), text: plain(mail.text) };
  }

  /** Each phase as "start–end" from the screen's clock: a row's start, and the next row's start or the end. */
  function screenRanges(plan: SessionPlanDto, locale: string): string[] {
    const screen = timelineClock(plan.plan.phases, plan.plan.request.kind, plan.kickOff, locale);
    return screen.starts.map((start, i) => plain(`${start}–${screen.starts[i + 1] ?? screen.end}`));
  }

  const cases = [
    // Training at 18:00 starts at 18:00; the warm-up before a 10:30 kick-off ends at 10:30.
    { name: 'training session', plan: () => training, locale: 'en-GB', first: '18:00', end: '19:00' },
    { name: 'training session', plan: () => training, locale: 'en-US', first: '6:00 PM', end: '7:00 PM' },
    { name: 'match warm-up', plan: () => warmUp, locale: 'en-GB', first: '10:10', end: '10:30' },
    { name: 'match warm-up', plan: () => warmUp, locale: 'en-US', first: '10:10 AM', end: '10:30 AM' },
  ];

  for (const c of cases) {
    it(`${c.name} in ${c.locale}: the screen, the card and the e-mail show the same times`, async () => {
      const plan = c.plan();
      await useLocale(c.locale);
      const ranges = screenRanges(plan, c.locale);
      expect(ranges[0]!.startsWith(`${c.first}–`), ranges[0]).toBe(true);
      expect(ranges.at(-1)!.endsWith(`–${c.end}`), ranges.at(-1)).toBe(true);

      const card = await cardText(plan);
      const { subject, text } = await mailText(plan, `${c.locale}.${plan.id.slice(0, 8)}@example.org`);
      for (const range of ranges) {
        expect(card).toContain(range);
        expect(text).toContain(range);
      }
      // 12-hour in en-US, 24-hour in en-GB, wherever people read a time.
      const twelveHour = /\d (AM|PM)\b/;
      expect(twelveHour.test(card)).toBe(c.locale === 'en-US');
      expect(twelveHour.test(text)).toBe(c.locale === 'en-US');
      // The subject names the day in words, never as an ISO date.
      expect(subject).not.toMatch(/\d{4}-\d{2}-\d{2}/);
      expect(subject).toContain(c.locale === 'en-US' ? 'Saturday, December 5' : 'Saturday 5 December');
    });
  }

  it('refuses a locale that is not a language tag, naming the field', async () => {
    const response = await app.api.patch(
      '/api/auth/me',
      { locale: 'en_GB; drop' },
      { token: club.coach.token },
    );
    expect(response.status).toBe(400);
    expect(JSON.stringify(response.body)).toContain('locale');
  });
});
