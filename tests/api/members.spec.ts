import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OutboxMessage } from '../../server/entities/outbox-message';
import {
  clubWithStaff,
  createTeam,
  linkTokenFor,
  startTestApp,
  TEST_PASSWORD,
  uniqueEmail,
  type ClubCast,
  type TestApp,
} from '../support/api-test-app';
import { createPlan, createSquad } from './fixtures/plan-helpers';

describe('members and invitations', () => {
  let app: TestApp;
  let club: ClubCast;
  let other: ClubCast;
  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Members Club');
    other = await clubWithStaff(app, 'Members Rival');
  });
  afterAll(() => app.close());

  async function outboxFor(email: string): Promise<OutboxMessage> {
    return app.dataSource
      .getRepository(OutboxMessage)
      .createQueryBuilder('m')
      .where("m.kind = 'invitation' AND m.recipients @> :to::jsonb", { to: JSON.stringify([email]) })
      .getOneOrFail();
  }

  async function tokenFromOutbox(email: string): Promise<string> {
    const message = await outboxFor(email);
    const match = /\/join#([\w-]+)/.exec(message.textBody);
    if (!match) throw new Error(`no link in ${message.textBody}`);
    return match[1]!;
  }

  it('the lead invites by e-mail: the outbox holds a mail with a single-use link; accepting joins the club', async () => {
    const team = await createTeam(app, club.lead.token, { name: 'U11 Kites' });
    const email = uniqueEmail('invitee');
    const invited = await app.api.post(
      '/api/invitations',
      { email, role: 'coach', teamId: team.id },
      { token: club.lead.token },
    );
    expect(invited.status).toBe(201);
    expect(invited.body).toMatchObject({ email, role: 'coach', acceptedAt: null });
    expect(Date.parse(invited.body.expiresAt)).toBeGreaterThan(Date.now());

    const outbox = await outboxFor(email);
    expect(outbox.status).toBe('pending');
    expect(outbox.subject).toContain('Members Club');
    const token = await tokenFromOutbox(email);
    expect(outbox.textBody).toContain(`${app.config.publicUrl}/join#`);
    // The token never sits in a path or query string a request log would keep.
    expect(outbox.textBody).not.toMatch(/\/invitations\/|[?&]token=/);

    const lookup = await app.api.post('/api/invitations/lookup', { token });
    expect(lookup.body).toMatchObject({ email, role: 'coach', clubName: 'Members Club' });

    const accepted = await app.api.post('/api/invitations/accept', {
      token,
      name: 'Nico Newcoach',
      password: TEST_PASSWORD,
    });
    expect(accepted.status).toBe(201);
    expect(accepted.body.user).toMatchObject({
      email,
      role: 'coach',
      clubId: club.lead.user.clubId,
      name: 'Nico Newcoach',
    });
    const teamNow = await app.api.get(`/api/teams/${team.id}`, { token: accepted.body.token });
    expect(teamNow.body.coachIds).toContain(accepted.body.user.id);

    const again = await app.api.post('/api/invitations/accept', {
      token,
      name: 'Again',
      password: TEST_PASSWORD,
    });
    expect(again.status).toBe(400);
    expect(again.body.errors[0].field).toBe('token');
    const list = await app.api.get('/api/invitations', { token: club.lead.token });
    expect(list.body.find((i: { email: string }) => i.email === email).acceptedAt).not.toBeNull();
    const members = await app.api.get('/api/members', { token: club.lead.token });
    expect(members.body.map((m: { email: string }) => m.email)).toContain(email);
    // The invitation row says which team; the e-mail named it too.
    const row = list.body.find((i: { email: string }) => i.email === email);
    expect(row).toMatchObject({ teamId: team.id, teamName: 'U11 Kites' });
    expect(outbox.textBody).toContain('with U11 Kites');
  });

  it('a club and lead with the longest names allowed still invite: the subject is shortened, not refused', async () => {
    const clubName = `${'Hazelbrook and District Youth Football Club '.repeat(3)}`.slice(0, 118) + ' ⚽';
    const leadEmail = uniqueEmail('longname');
    const register = await app.api.post('/api/auth/register', {
      clubName,
      name: `${'Alexandra-Christabel '.repeat(6)}`.slice(0, 120),
      email: leadEmail,
      password: 'long-names-secret-42',
    });
    expect(register.status, register.text).toBe(201);
    const confirmation = await linkTokenFor(app, leadEmail, 'email-verification', '/confirm-email');
    expect((await app.api.post('/api/auth/email-confirmation', { token: confirmation })).status).toBe(204);
    const email = uniqueEmail('invitee');
    const invited = await app.api.post(
      '/api/invitations',
      { email, role: 'coach' },
      { token: register.body.token },
    );
    expect(invited.status, invited.text).toBe(201);
    const outbox = await outboxFor(email);
    expect(outbox.subject.length).toBeLessThanOrEqual(200);
    expect(outbox.subject.endsWith('…')).toBe(true);
    expect(outbox.textBody).toContain(clubName);
  });

  it('an invited assistant lands on the invitation’s team and sees its plans at once', async () => {
    const squad = await createSquad(app, club.lead.token, 8, 'U9 Plovers');
    const team = { id: squad.teamId };
    const plan = await createPlan(app, club.lead.token, squad);
    const email = uniqueEmail('helper');
    await app.api.post(
      '/api/invitations',
      { email, role: 'assistant', teamId: team.id },
      { token: club.lead.token },
    );
    const token = await tokenFromOutbox(email);
    const lookup = await app.api.post('/api/invitations/lookup', { token });
    expect(lookup.body).toMatchObject({ role: 'assistant', teamName: 'U9 Plovers' });
    const accepted = await app.api.post('/api/invitations/accept', {
      token,
      name: 'Hana Helper',
      password: TEST_PASSWORD,
    });
    expect(accepted.status).toBe(201);
    const teams = await app.api.get('/api/teams', { token: accepted.body.token });
    expect(teams.body.map((t: { id: string }) => t.id)).toEqual([team.id]);
    const plans = await app.api.get('/api/plans', { token: accepted.body.token });
    expect(plans.status).toBe(200);
    expect(plans.body.items.map((p: { id: string }) => p.id)).toEqual([plan.id]);
  });

  it('e-mail addresses go to the lead only: coaches and assistants get names and roles', async () => {
    const lead = await app.api.get('/api/members', { token: club.lead.token });
    expect(lead.status).toBe(200);
    for (const member of lead.body) expect(member.email).toMatch(/@/);
    for (const signedIn of [club.coach, club.assistant]) {
      const response = await app.api.get('/api/members', { token: signedIn.token });
      expect(response.status).toBe(200);
      expect(response.body.length).toBe(lead.body.length);
      for (const member of response.body) {
        expect(Object.keys(member).sort()).toEqual(['name', 'role', 'userId']);
      }
      expect(JSON.stringify(response.body)).not.toContain('@');
    }
    // Another club's lead sees none of this club's members.
    const rival = await app.api.get('/api/members', { token: other.lead.token });
    const ids = rival.body.map((m: { userId: string }) => m.userId);
    expect(ids).not.toContain(club.coach.user.id);
    expect(ids).not.toContain(club.assistant.user.id);
  });

  it('only the lead invites and manages members (403 for coach and assistant)', async () => {
    for (const member of [club.coach, club.assistant]) {
      const token = member.token;
      expect(
        (await app.api.post('/api/invitations', { email: uniqueEmail(), role: 'coach' }, { token })).status,
      ).toBe(403);
      expect((await app.api.get('/api/invitations', { token })).status).toBe(403);
      expect(
        (await app.api.patch(`/api/members/${club.lead.user.id}`, { role: 'assistant' }, { token })).status,
      ).toBe(403);
      expect((await app.api.delete(`/api/members/${club.lead.user.id}`, { token })).status).toBe(403);
    }
  });

  it('inviting an address of another club answers as for any address (nothing revealed); its owner is told on joining', async () => {
    const taken = await app.api.post(
      '/api/invitations',
      { email: other.coach.user.email, role: 'coach' },
      { token: club.lead.token },
    );
    const fresh = await app.api.post(
      '/api/invitations',
      { email: uniqueEmail('fresh'), role: 'coach' },
      { token: club.lead.token },
    );
    expect(taken.status).toBe(201);
    expect(fresh.status).toBe(201);
    expect(Object.keys(taken.body).sort()).toEqual(Object.keys(fresh.body).sort());
    expect(taken.body).toMatchObject({ acceptedAt: null, role: 'coach' });

    // Only whoever reads that address's mail learns it has an account, and nothing changes.
    const token = await tokenFromOutbox(other.coach.user.email);
    const accepted = await app.api.post('/api/invitations/accept', {
      token,
      name: 'Someone',
      password: TEST_PASSWORD,
    });
    expect(accepted.status).toBe(409);
    expect(accepted.body.detail).toMatch(/already has a Conewise account, in another club/);
    const stillThere = await app.api.get('/api/auth/me', { token: other.coach.token });
    expect(stillThere.body).toMatchObject({ clubId: other.lead.user.clubId, role: 'coach' });
  });

  it("inviting someone already in the lead's own club is refused, naming the address", async () => {
    const response = await app.api.post(
      '/api/invitations',
      { email: club.coach.user.email, role: 'assistant' },
      { token: club.lead.token },
    );
    expect(response.status).toBe(409);
    expect(response.body.errors).toEqual([
      { field: 'email', message: 'is already a member of Members Club' },
    ]);
  });

  it('an expired or unknown token is refused', async () => {
    const email = uniqueEmail('late');
    await app.api.post('/api/invitations', { email, role: 'assistant' }, { token: club.lead.token });
    const token = await tokenFromOutbox(email);
    await app.dataSource.query(
      `UPDATE invitation SET "expiresAt" = now() - interval '1 minute' WHERE email = $1`,
      [email],
    );
    expect(
      (await app.api.post('/api/invitations/accept', { token, name: 'Late', password: TEST_PASSWORD }))
        .status,
    ).toBe(400);
    expect((await app.api.post('/api/invitations/lookup', { token: 'z'.repeat(43) })).status).toBe(400);
  });

  it('changes roles, keeps at least one lead, removes members', async () => {
    const local = await clubWithStaff(app, 'Role Club');
    const promoted = await app.api.patch(
      `/api/members/${local.coach.user.id}`,
      { role: 'lead' },
      { token: local.lead.token },
    );
    expect(promoted.status).toBe(200);
    expect(promoted.body.role).toBe('lead');
    // The change applies to the next request: roles are read from the database, not the token.
    expect((await app.api.get('/api/invitations', { token: local.coach.token })).status).toBe(200);
    await app.api.patch(
      `/api/members/${local.coach.user.id}`,
      { role: 'coach' },
      { token: local.lead.token },
    );
    const lastLead = await app.api.patch(
      `/api/members/${local.lead.user.id}`,
      { role: 'coach' },
      { token: local.lead.token },
    );
    expect(lastLead.status).toBe(409);
    expect(lastLead.body.detail).toContain('needs at least one head of coaching');
    expect(
      (await app.api.delete(`/api/members/${local.lead.user.id}`, { token: local.lead.token })).status,
    ).toBe(409);
    expect(
      (await app.api.delete(`/api/members/${local.assistant.user.id}`, { token: local.lead.token })).status,
    ).toBe(204);
    expect((await app.api.get('/api/auth/me', { token: local.assistant.token })).status).toBe(401);
  });

  it('another club’s members and invitations answer 404', async () => {
    const token = club.lead.token;
    expect(
      (await app.api.patch(`/api/members/${other.coach.user.id}`, { role: 'lead' }, { token })).status,
    ).toBe(404);
    expect((await app.api.delete(`/api/members/${other.coach.user.id}`, { token })).status).toBe(404);
    const theirs = await app.api.post(
      '/api/invitations',
      { email: uniqueEmail(), role: 'coach' },
      { token: other.lead.token },
    );
    expect((await app.api.delete(`/api/invitations/${theirs.body.id}`, { token })).status).toBe(404);
    const teamOfOther = await createTeam(app, other.lead.token);
    const cross = await app.api.post(
      '/api/invitations',
      { email: uniqueEmail(), role: 'coach', teamId: teamOfOther.id },
      { token },
    );
    expect(cross.status).toBe(404);
    const members = await app.api.get('/api/members', { token });
    expect(members.body.map((m: { userId: string }) => m.userId)).not.toContain(other.coach.user.id);
  });

  it('revokes an invitation', async () => {
    const email = uniqueEmail('revoked');
    const invited = await app.api.post(
      '/api/invitations',
      { email, role: 'coach' },
      { token: club.lead.token },
    );
    const token = await tokenFromOutbox(email);
    expect(
      (await app.api.delete(`/api/invitations/${invited.body.id}`, { token: club.lead.token })).status,
    ).toBe(204);
    expect(
      (await app.api.post('/api/invitations/accept', { token, name: 'Too late', password: TEST_PASSWORD }))
        .status,
    ).toBe(400);
  });

  it('junk bodies never cause a 5xx', async () => {
    await fc.assert(
      fc.asyncProperty(fc.jsonValue(), async (junk) => {
        expect(
          (await app.api.post('/api/invitations', junk, { token: club.lead.token })).status,
        ).toBeLessThan(500);
        expect((await app.api.post('/api/invitations/accept', junk)).status).toBeLessThan(500);
        expect(
          (await app.api.patch(`/api/members/${club.coach.user.id}`, junk, { token: club.lead.token }))
            .status,
        ).toBeLessThan(500);
      }),
      { numRuns: 40 },
    );
  });
});
