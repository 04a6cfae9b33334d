/**
 * ClubScope, the one place that ties rows to the caller's club: another club's ids answer 404,
 * and `transaction` gives work one all-or-nothing transaction bound to the same caller.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Team } from '../../server/entities/team';
import type { AuthContext } from '../../server/http/auth-context';
import { HttpError } from '../../server/http/problem';
import { ClubScope } from '../../server/services/club-scope';
import { NEW_CLUB_UNIT_FIELDS } from '../../shared/units';
import { createTeam, registerClub, startTestApp, type TestApp } from '../support/api-test-app';

describe('ClubScope', () => {
  let app: TestApp;
  let ours: ClubScope;
  let theirs: ClubScope;
  let teamId: string;

  const scopeFor = (user: { id: string; clubId: string; name: string; email: string }): ClubScope => {
    const auth: AuthContext = {
      userId: user.id,
      clubId: user.clubId,
      clubName: 'Scope Test Club',
      role: 'lead',
      name: user.name,
      email: user.email,
      emailVerified: true,
      ...NEW_CLUB_UNIT_FIELDS,
    };
    return new ClubScope(app.dataSource.manager, auth);
  };

  beforeAll(async () => {
    app = await startTestApp();
    const lead = await registerClub(app, 'Scope Test Club');
    const other = await registerClub(app, 'Scope Other Club');
    teamId = (await createTeam(app, lead.token, { name: 'U10 Scope Owls' })).id;
    ours = scopeFor(lead.user);
    theirs = scopeFor(other.user);
  });

  afterAll(async () => {
    await app?.close();
  });

  const status = (error: unknown) => (error instanceof HttpError ? error.status : error);

  it('loads the club’s own team and answers 404 to another club and to an id that is not a uuid', async () => {
    expect((await ours.team(teamId)).name).toBe('U10 Scope Owls');
    expect(await theirs.team(teamId).catch(status)).toBe(404);
    expect(await ours.team('not-a-uuid').catch(status)).toBe(404);
  });

  it('commits all the work of a transaction together, through a scope bound to it', async () => {
    await ours.transaction(async (scope) => {
      expect(scope.manager).not.toBe(ours.manager);
      expect(scope.clubId).toBe(ours.clubId);
      const team = await scope.team(teamId);
      await scope.manager.getRepository(Team).update({ id: team.id }, { name: 'U10 Scope Hawks' });
    });
    expect((await ours.team(teamId)).name).toBe('U10 Scope Hawks');
  });

  it('keeps nothing of a transaction that fails part way, and a nested call joins the outer one', async () => {
    const failed = ours.transaction(async (scope) => {
      await scope.manager.getRepository(Team).update({ id: teamId }, { name: 'U10 Half Saved' });
      await scope.transaction(async (inner) => {
        expect(inner.manager).toBe(scope.manager);
        await inner.manager.getRepository(Team).update({ id: teamId }, { name: 'U10 Inner Saved' });
      });
      await scope.team('00000000-0000-4000-8000-000000000000');
    });
    expect(await failed.catch(status)).toBe(404);
    expect((await ours.team(teamId)).name).toBe('U10 Scope Hawks');
  });

  it('locks no plan it cannot see: an unknown id or one that is not a uuid is 404 inside a transaction', async () => {
    const missing = '00000000-0000-4000-8000-000000000001';
    expect(await ours.transaction((scope) => scope.lockedPlan(missing)).catch(status)).toBe(404);
    expect(await ours.transaction((scope) => scope.lockedPlan('nope')).catch(status)).toBe(404);
  });
});
