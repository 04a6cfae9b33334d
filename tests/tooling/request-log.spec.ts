/** The request log never keeps a secret that can sit in an address. */
import { describe, expect, it } from 'vitest';
import { withoutSecrets } from '../../server/app';

describe('withoutSecrets', () => {
  it('hides a calendar feed’s secret, an old invitation link’s token and any token= query', () => {
    expect(withoutSecrets('/api/calendar/Zk3v9QmVh0a1b2c3d4e5f6g7h8i9j0kL.ics')).toBe(
      '/api/calendar/[secret]',
    );
    expect(withoutSecrets('/invitations/AbCdEfGhIjKlMnOpQrStUvWxYz0123456789_-ab')).toBe(
      '/invitations/[secret]',
    );
    expect(withoutSecrets('/api/invitations/lookup?token=AbCdEfGhIjKlMnOpQrSt&x=1')).toBe(
      '/api/invitations/lookup?token=[secret]&x=1',
    );
  });

  it('leaves addresses without secrets as they are', () => {
    for (const url of [
      '/api/invitations/lookup',
      '/api/invitations/accept',
      '/api/plans/42?teamId=7',
      '/join',
    ])
      expect(withoutSecrets(url)).toBe(url);
    // An invitation's id (revoking it) is not a secret.
    const revoke = '/api/invitations/3f2b8c1e-0000-4000-8000-000000000001';
    expect(withoutSecrets(revoke)).toBe(revoke);
  });
});
