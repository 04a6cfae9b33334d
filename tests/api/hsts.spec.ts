/**
 * Strict-Transport-Security only where the deployment asks for it (HSTS_MAX_AGE): a club laptop
 * serving plain HTTP must not send it, a deployment behind TLS turns it on.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { hstsMaxAgeFromEnv } from '../../server/config';
import { startTestApp, type TestApp } from '../support/api-test-app';

const YEAR = 31_536_000;

describe('HSTS setting', () => {
  let plain: TestApp;
  let behindTls: TestApp;
  beforeAll(async () => {
    plain = await startTestApp();
    behindTls = await startTestApp({ hstsMaxAgeSeconds: YEAR });
  });
  afterAll(async () => {
    await behindTls.close();
    await plain.close();
  });

  it('sends no Strict-Transport-Security header when HSTS_MAX_AGE is unset', async () => {
    for (const path of ['/api/health', '/api/auth/me', '/api/nothing-here']) {
      const response = await plain.api.get(path);
      expect(response.headers.get('strict-transport-security'), path).toBeNull();
      // Helmet's other headers are there all the same.
      expect(response.headers.get('x-content-type-options'), path).toBe('nosniff');
    }
  });

  it('sends it on every answer, errors included, when HSTS_MAX_AGE is set', async () => {
    for (const path of ['/api/health', '/api/auth/me', '/api/nothing-here']) {
      const response = await behindTls.api.get(path);
      // OWASP ASVS 4.0 14.4.5: a max-age, for the subdomains too.
      expect(response.headers.get('strict-transport-security'), path).toBe(
        `max-age=${YEAR}; includeSubDomains`,
      );
    }
  });

  it('reads HSTS_MAX_AGE as whole seconds, unset or blank as off, and refuses anything else', () => {
    expect(hstsMaxAgeFromEnv(undefined)).toBeNull();
    expect(hstsMaxAgeFromEnv(' ')).toBeNull();
    expect(hstsMaxAgeFromEnv('31536000')).toBe(YEAR);
    expect(hstsMaxAgeFromEnv('0')).toBe(0);
    for (const bad of ['1y', '-5', '3.5', 'on'])
      expect(() => hstsMaxAgeFromEnv(bad), bad).toThrow('HSTS_MAX_AGE is');
  });
});
