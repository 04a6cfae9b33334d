/**
 * A person's own name (PATCH /api/auth/me): checked by the shared schema with the field named,
 * written for the caller only, and seen at once by everyone in the club (members list, /me).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { MemberDto, UserDto } from '../../shared/types/api';
import { clubWithStaff, startTestApp, type ClubCast, type TestApp } from '../support/api-test-app';

describe('changing my own name', () => {
  let app: TestApp;
  let club: ClubCast;
  beforeAll(async () => {
    app = await startTestApp();
    club = await clubWithStaff(app, 'Namewell Athletic');
  });
  afterAll(() => app.close());

  const me = async (token: string): Promise<UserDto> => {
    const response = await app.api.get<UserDto>('/api/auth/me', { token });
    expect(response.status, response.text).toBe(200);
    return response.body;
  };

  it('answers the caller with the new name (trimmed), and the club sees it', async () => {
    const response = await app.api.patch<UserDto>(
      '/api/auth/me',
      { name: '  Cora Fenwick-Ó Briain  ' },
      { token: club.coach.token },
    );
    expect(response.status, response.text).toBe(200);
    expect(response.body).toEqual({ ...club.coach.user, name: 'Cora Fenwick-Ó Briain' });
    expect((await me(club.coach.token)).name).toBe('Cora Fenwick-Ó Briain');
    const members = await app.api.get<MemberDto[]>('/api/members', { token: club.lead.token });
    expect(members.body.find((m) => m.userId === club.coach.user.id)?.name).toBe('Cora Fenwick-Ó Briain');
  });

  it.each([
    ['blank', '   ', 'is needed'],
    ['empty', '', 'is needed'],
    ['too long', 'A'.repeat(121), 'can have at most 120 characters'],
    ['not text', 42, 'must be text'],
  ])('refuses a %s name with 400 naming the field, and keeps the old one', async (_, name, message) => {
    const before = (await me(club.assistant.token)).name;
    const response = await app.api.patch('/api/auth/me', { name }, { token: club.assistant.token });
    expect(response.status, response.text).toBe(400);
    expect(response.headers.get('content-type')).toMatch(/application\/problem\+json/);
    expect(response.body.errors).toEqual([{ field: 'name', message }]);
    expect((await me(club.assistant.token)).name).toBe(before);
  });

  it('takes 120 characters exactly', async () => {
    const name = 'B'.repeat(120);
    const response = await app.api.patch('/api/auth/me', { name }, { token: club.assistant.token });
    expect(response.status, response.text).toBe(200);
    expect((await me(club.assistant.token)).name).toBe(name);
  });

  it('never changes anyone but the caller: an id, e-mail or role in the body is refused', async () => {
    const leadBefore = await me(club.lead.token);
    for (const extra of [
      { id: club.lead.user.id },
      { userId: club.lead.user.id },
      { email: club.lead.user.email },
      { role: 'lead' },
    ]) {
      const response = await app.api.patch(
        '/api/auth/me',
        { name: 'Mallory Takeover', ...extra },
        { token: club.coach.token },
      );
      expect(response.status, response.text).toBe(400);
      expect(response.body.errors).toEqual([
        { field: Object.keys(extra)[0], message: 'is not a known field' },
      ]);
    }
    expect(await me(club.lead.token)).toEqual(leadBefore);
    const coach = await me(club.coach.token);
    expect(coach.name).not.toBe('Mallory Takeover');
    expect(coach.role).toBe('coach');

    // The only way to name a person is the token: the coach renaming themselves leaves the lead be.
    const renamed = await app.api.patch('/api/auth/me', { name: 'Cora Coach' }, { token: club.coach.token });
    expect(renamed.body.id).toBe(club.coach.user.id);
    expect(await me(club.lead.token)).toEqual(leadBefore);
  });

  it('refuses a caller without a valid token with 401 and changes nothing', async () => {
    const response = await app.api.patch('/api/auth/me', { name: 'Nobody' });
    expect(response.status).toBe(401);
    const forged = await app.api.patch('/api/auth/me', { name: 'Nobody' }, { token: 'not-a-token' });
    expect(forged.status).toBe(401);
    expect((await me(club.lead.token)).name).toBe('Lena Lead');
  });
});
