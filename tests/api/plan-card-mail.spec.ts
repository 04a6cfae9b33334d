import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { SessionPlanDto } from '../../shared/types/api';
import { freePort } from '../../server/db/free-port';
import { OutboxMessage } from '../../server/entities/outbox-message';
import { OutboxWorker } from '../../server/mail/outbox-worker';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { mailSettingsFromEnv } from '../../server/mail/mail-settings';
import { storedClock } from '../../shared/time/session-clock';
import { CLEARED_BODY } from '../../server/services/mail-queue';
import { clubWithStaff, startTestApp, type ClubCast, type TestApp } from '../support/api-test-app';
import { createPlan, createSquad, SQUAD_NAMES, type Squad } from './fixtures/plan-helpers';

const scratch = mkdtempSync(join(tmpdir(), 'conewise-card-'));

/**
 * The text of a PDF as poppler's pdftotext extracts it, in reading order and on one line, so a
 * title or a name that wraps in a narrow station cell still reads as written.
 */
function pdfText(pdf: Buffer, name = 'card.pdf'): string {
  const file = join(scratch, name);
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-raw', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}

function pdfPageSize(pdf: Buffer): string {
  const file = join(scratch, 'size.pdf');
  writeFileSync(file, pdf);
  return (
    /Page size:\s+([\d.]+ x [\d.]+)/.exec(execFileSync('pdfinfo', [file], { encoding: 'utf8' }))?.[1] ?? ''
  );
}

async function fetchPdf(app: TestApp, planId: string, token: string, paper?: string) {
  const response = await fetch(`${app.http.url}/api/plans/${planId}/pdf${paper ? `?paper=${paper}` : ''}`, {
    headers: { authorization: `Bearer ${token}` },
  });
  return {
    status: response.status,
    type: response.headers.get('content-type'),
    pdf: Buffer.from(await response.arrayBuffer()),
  };
}

function worker(app: TestApp, port: number) {
  return new OutboxWorker({
    dataSource: app.dataSource,
    mail: mailSettingsFromEnv({ host: '127.0.0.1', port }),
    baseDelayMs: 20,
    maxDelayMs: 50,
  });
}

describe('the printed card and e-mail through the outbox', () => {
  let app: TestApp;
  let club: ClubCast;
  let squad: Squad;
  let plan: SessionPlanDto;

  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Brookside Wanderers');
    squad = await createSquad(app, club.coach.token, 12, 'U10 Wrens');
    plan = await createPlan(app, club.coach.token, squad, { kickOff: '10:30' });
  });
  afterAll(async () => {
    await app.close();
    rmSync(scratch, { recursive: true, force: true });
  });

  it('prints the team, the names, clock times counting to kick-off and every station', async () => {
    const { status, type, pdf } = await fetchPdf(app, plan.id, club.coach.token);
    expect(status).toBe(200);
    expect(type).toBe('application/pdf');
    const text = pdfText(pdf);
    expect(text).toContain('U10 Wrens');
    expect(text).toContain('kick-off 10:30');
    for (const name of SQUAD_NAMES.slice(0, 12)) expect(text).toContain(name);
    const total = plan.plan.phases.at(-1)!.endMinute;
    for (const phase of plan.plan.phases) {
      expect(text).toContain(
        `${storedClock(630 - total + phase.startMinute)}–${storedClock(630 - total + phase.endMinute)}`,
      );
      for (const station of phase.stations) {
        expect(text).toContain(station.title);
        if (station.format) expect(text).toContain(station.format);
      }
    }
    // The card's key names the roles its diagrams draw.
    expect(text).toMatch(/Key .*Cone/);
    expect(text).toContain('Kit checklist');
    expect(text).toMatch(/first-aid/);
    expect(pdfPageSize(pdf)).toBe('595.28 x 841.89');
  });

  it('prints on US Letter when asked, and refuses other papers', async () => {
    const letter = await fetchPdf(app, plan.id, club.lead.token, 'letter');
    expect(letter.status).toBe(200);
    expect(pdfPageSize(letter.pdf)).toBe('612 x 792');
    expect((await fetchPdf(app, plan.id, club.lead.token, 'a3')).status).toBe(400);
  });

  it('shares: the fake SMTP server receives one message per recipient with the card attached', async () => {
    const fake = await startFakeSmtp();
    const sender = worker(app, fake.port);
    try {
      const recipients = ['helper.one@example.org', 'helper.two@example.org'];
      const response = await app.api.post(
        `/api/plans/${plan.id}/share`,
        { recipients, message: 'See you at 10!' },
        { token: club.coach.token },
      );
      expect(response.status, response.text).toBe(202);
      expect(response.body.queued).toBe(2);
      await sender.drainOnce();
      for (const to of recipients) {
        const mail = await fake.waitFor((m) => m.to.includes(to));
        expect(mail.to).toEqual([to]);
        expect(mail.subject).toContain('U10 Wrens');
        expect(mail.text).toContain('See you at 10!');
        expect(mail.attachments).toHaveLength(1);
        expect(mail.attachments[0].contentType).toBe('application/pdf');
        expect(pdfText(mail.attachments[0].content, 'attached.pdf')).toContain('U10 Wrens');
      }
      // Once delivered the outbox keeps who, what about and how it went; not the card or body.
      const kept = await app.dataSource.getRepository(OutboxMessage).findByIds(response.body.messageIds);
      expect(kept.map((row) => [row.status, row.subject.includes('U10 Wrens')])).toEqual([
        ['sent', true],
        ['sent', true],
      ]);
      expect(kept.flatMap((row) => row.recipients).sort()).toEqual(recipients);
      for (const row of kept) {
        expect(row).toMatchObject({ textBody: CLEARED_BODY, htmlBody: null, attachments: [] });
      }
      expect(
        (
          await app.api.post(
            `/api/plans/${plan.id}/share`,
            { recipients: ['x@example.org'] },
            { token: club.assistant.token },
          )
        ).status,
      ).toBe(403);
      expect(
        (
          await app.api.post(
            `/api/plans/${plan.id}/share`,
            { recipients: ['not-an-address'] },
            { token: club.coach.token },
          )
        ).status,
      ).toBe(400);
    } finally {
      await sender.stop();
      await fake.stop();
    }
  });

  it('keeps a message queued while SMTP is down and delivers it once it is back', async () => {
    const port = await freePort();
    const sender = worker(app, port);
    let fake: FakeSmtp | null = null;
    try {
      const to = 'down.then.up@example.org';
      const response = await app.api.post(
        `/api/plans/${plan.id}/share`,
        { recipients: [to] },
        { token: club.coach.token },
      );
      const [id] = response.body.messageIds as string[];
      const down = await sender.drainOnce();
      expect(down.retried).toBeGreaterThanOrEqual(1);
      const [row] = await app.dataSource.query(
        'SELECT status, attempts, "lastError" FROM outbox_message WHERE id = $1',
        [id],
      );
      expect(row).toMatchObject({ status: 'pending', attempts: 1 });
      expect(row.lastError).toMatch(/ECONNREFUSED/);

      fake = await startFakeSmtp({ port });
      await new Promise((resolve) => setTimeout(resolve, 120)); // past the backoff
      await sender.drainOnce();
      await fake.waitFor((m) => m.to.includes(to));
      const [sent] = await app.dataSource.query('SELECT status, attempts FROM outbox_message WHERE id = $1', [
        id,
      ]);
      expect(sent).toMatchObject({ status: 'sent', attempts: 2 });
      await sender.drainOnce();
      expect(fake.messages().filter((m) => m.to.includes(to))).toHaveLength(1);
    } finally {
      await sender.stop();
      await fake?.stop();
    }
  });
});

describe('two app instances on one database', () => {
  let one: TestApp;
  let two: TestApp;
  let club: ClubCast;

  beforeAll(async () => {
    // The same signing secret, as instances behind one load balancer share it.
    one = await startTestApp({ jwtSecret: 'shared-secret-for-two-instances-0123456789' });
    two = await startTestApp({ jwtSecret: 'shared-secret-for-two-instances-0123456789' });
    club = await clubWithStaff(one, 'Two Bridges FC');
  });
  afterAll(async () => {
    await one.close();
    await two.close();
  });

  it('reads through one a plan created through the other, and sends each queued e-mail exactly once', async () => {
    const squad = await createSquad(one, club.coach.token, 10, 'U10 Otters');
    const plan = await createPlan(one, club.coach.token, squad);
    const read = await two.api.get(`/api/plans/${plan.id}`, { token: club.coach.token });
    expect(read.status).toBe(200);
    expect(read.body.plan).toEqual(plan.plan);

    const recipients = Array.from({ length: 12 }, (_, i) => `parent.${i}@example.org`);
    const shared = await two.api.post(
      `/api/plans/${plan.id}/share`,
      { recipients },
      { token: club.coach.token },
    );
    expect(shared.status).toBe(202);

    const fake = await startFakeSmtp();
    const senders = [worker(one, fake.port), worker(two, fake.port)];
    try {
      await Promise.all(senders.map((s) => s.drainOnce()));
      for (const to of recipients) await fake.waitFor((m) => m.to.includes(to));
      // Let any double send arrive before counting.
      await new Promise((resolve) => setTimeout(resolve, 200));
      for (const to of recipients)
        expect(
          fake.messages().filter((m) => m.to.includes(to)),
          to,
        ).toHaveLength(1);
      const rows = await one.dataSource.query(
        `SELECT status, count(*)::int AS n FROM outbox_message WHERE id = ANY($1) GROUP BY status`,
        [shared.body.messageIds],
      );
      expect(rows).toEqual([{ status: 'sent', n: 12 }]);
    } finally {
      await Promise.all(senders.map((s) => s.stop()));
      await fake.stop();
    }
  });
});

describe('names on the card and in the e-mail', () => {
  let app: TestApp;
  let club: ClubCast;
  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Heathfield Names');
    mkdirSync(scratch, { recursive: true }); // the suite above removes it when it ends
  });
  afterAll(async () => {
    await app.close();
    rmSync(scratch, { recursive: true, force: true });
  });

  it('keeps every character of the team’s and the players’ names, emoji included', async () => {
    const squad = await createSquad(app, club.coach.token, 8, 'U10 Füchse 🦊');
    for (const displayName of ['Kai M. 🦊', 'Łucja Ś.', 'Аня И.', 'Ζωή Π.']) {
      const player = await app.api.post(
        `/api/teams/${squad.teamId}/players`,
        { displayName },
        { token: club.coach.token },
      );
      expect(player.status, player.text).toBe(201);
      squad.playerIds.push(player.body.id);
    }
    const plan = await createPlan(app, club.coach.token, squad);
    const card = await fetchPdf(app, plan.id, club.coach.token);
    const text = pdfText(card.pdf, 'names.pdf');
    for (const name of ['U10 Füchse 🦊', 'Kai M. 🦊', 'Łucja Ś.', 'Аня И.', 'Ζωή Π.'])
      expect(text).toContain(name);
    expect(text).not.toContain('?');

    const fake = await startFakeSmtp();
    const sender = worker(app, fake.port);
    try {
      const shared = await app.api.post(
        `/api/plans/${plan.id}/share`,
        { recipients: ['parent.helper@example.org'] },
        { token: club.coach.token },
      );
      expect(shared.status, shared.text).toBe(202);
      await sender.drainOnce();
      const mail = await fake.waitFor((m) => m.to.includes('parent.helper@example.org'));
      expect(mail.subject).toContain('U10 Füchse 🦊');
      expect(mail.text).toContain('U10 Füchse 🦊');
      expect(pdfText(mail.attachments[0].content, 'names-attached.pdf')).toContain('Kai M. 🦊');
    } finally {
      await sender.stop();
      await fake.stop();
    }
  });
});
