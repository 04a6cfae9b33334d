import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from '../support/api-test-app';

/** Every error is application/problem+json with no stack trace (RFC 9457). */
function expectProblem(response: { status: number; headers: Headers; text: string }, status: number) {
  expect(response.status).toBe(status);
  expect(response.headers.get('content-type')).toMatch(/^application\/problem\+json/);
  const body = JSON.parse(response.text);
  expect(body).toMatchObject({ status, type: expect.any(String), title: expect.any(String) });
  expect(response.text).not.toMatch(/at .*\.(ts|js):\d+/);
  return body;
}

describe('errors as problems', () => {
  let app: TestApp;
  beforeAll(async () => {
    app = await startTestApp();
  });
  afterAll(() => app.close());

  it('unknown /api paths answer a 404 problem', async () => {
    const body = expectProblem(await app.api.get('/api/no-such-thing'), 404);
    expect(body.detail).toContain('/api/no-such-thing');
    expectProblem(await app.api.post('/api/health', {}), 404);
  });

  it('malformed JSON answers 400, not 500', async () => {
    const response = await app.api.call('POST', '/api/auth/login', {
      rawBody: '{"email": "a@example.org", "password": ',
      headers: { 'content-type': 'application/json' },
    });
    const body = expectProblem(response, 400);
    expect(body.title).toBe('Malformed JSON');
  });

  it('a body over the JSON limit answers 413', async () => {
    const response = await app.api.post('/api/auth/register', {
      clubName: 'x'.repeat(300 * 1024),
      name: 'N',
      email: 'big@example.org',
      password: 'long-enough-secret',
    });
    expectProblem(response, 413);
  });

  it('security headers are set and the CSP allows this origin only', async () => {
    const response = await app.api.get('/api/health');
    const csp = response.headers.get('content-security-policy') ?? '';
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    // Validators are precompiled, so nothing may be evaluated in the page.
    const scriptSrc = csp.split(';').find((directive) => directive.trim().startsWith('script-src')) ?? '';
    expect(scriptSrc.trim()).toBe("script-src 'self'");
    expect(csp).not.toContain("'unsafe-eval'");
    expect(csp).not.toMatch(/https?:\/\//);
    expect(response.headers.get('x-content-type-options')).toBe('nosniff');
    expect(response.headers.get('x-powered-by')).toBeNull();
  });

  it('a validation error names each bad field', async () => {
    const body = expectProblem(
      await app.api.post('/api/auth/register', {
        clubName: '',
        email: 'not-an-email',
        password: 'short',
        extra: 1,
      }),
      400,
    );
    const fields = body.errors.map((e: { field: string }) => e.field).sort();
    expect(fields).toEqual(expect.arrayContaining(['clubName', 'email', 'extra', 'name', 'password']));
  });
});
