import { HttpClient, HttpContext, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { firstValueFrom, retry } from 'rxjs';
import { IDEMPOTENCY_KEY, idempotencyInterceptor } from './idempotency-interceptor';
import { RetryKey } from './retry-key';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/;

describe('idempotencyInterceptor', () => {
  let http: HttpClient;
  let backend: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([idempotencyInterceptor])), provideHttpClientTesting()],
    });
    http = TestBed.inject(HttpClient);
    backend = TestBed.inject(HttpTestingController);
  });

  afterEach(() => {
    backend.verify();
    vi.useRealTimers();
  });

  const keyOf = (url: string) => {
    const request = backend.expectOne(url);
    return { request, key: request.request.headers.get('Idempotency-Key') };
  };

  it('gives each POST to the API a fresh key', () => {
    http.post('/api/teams', { name: 'U9 Moths' }).subscribe();
    http.post('/api/teams', { name: 'U9 Moths' }).subscribe();
    const [first, second] = backend.match('/api/teams');
    const keys = [first!, second!].map((r) => r.request.headers.get('Idempotency-Key'));
    expect(keys[0]).toMatch(UUID);
    expect(keys[1]).toMatch(UUID);
    expect(keys[0]).not.toBe(keys[1]);
    first!.flush({});
    second!.flush({});
  });

  it('leaves reads, edits, sign-in, registration, invitation acceptance and other sites alone', () => {
    http.get('/api/teams').subscribe();
    http.patch('/api/teams/t1', {}).subscribe();
    http.delete('/api/plans/p1').subscribe();
    http.post('/api/auth/login', {}).subscribe();
    http.post('/api/auth/register', {}).subscribe();
    http.post('/api/invitations/accept', {}).subscribe();
    http.post('https://elsewhere.example/api/x', {}).subscribe();
    for (const url of [
      '/api/teams',
      '/api/teams/t1',
      '/api/plans/p1',
      '/api/auth/login',
      '/api/auth/register',
      '/api/invitations/accept',
      'https://elsewhere.example/api/x',
    ]) {
      const { request, key } = keyOf(url);
      expect(key, url).toBeNull();
      request.flush({});
    }
  });

  it('an invitation, a share and a roster import get keys', () => {
    http.post('/api/invitations', {}).subscribe();
    http.post('/api/plans/p1/share', {}).subscribe();
    http.post('/api/teams/t1/players/import/commit', {}).subscribe();
    for (const url of ['/api/invitations', '/api/plans/p1/share', '/api/teams/t1/players/import/commit']) {
      const { request, key } = keyOf(url);
      expect(key, url).toMatch(UUID);
      request.flush({});
    }
  });

  it('a request retried by its caller is sent again with the same key', async () => {
    const answer = firstValueFrom(http.post<{ id: string }>('/api/plans', { teamId: 't1' }).pipe(retry(1)));
    const first = keyOf('/api/plans');
    first.request.flush(null, { status: 502, statusText: 'Bad Gateway' });
    const second = keyOf('/api/plans');
    expect(second.key).toBe(first.key);
    second.request.flush({ id: 'p1' });
    expect(await answer).toEqual({ id: 'p1' });
  });

  it('while the server says the first copy is still running, it asks again with the same key', async () => {
    vi.useFakeTimers();
    const answer = firstValueFrom(
      http.post<{ id: string }>('/api/teams/t1/players', { displayName: 'Ada B.' }),
    );
    const first = keyOf('/api/teams/t1/players');
    first.request.flush(
      { type: '/problems/request-in-progress', title: 'Still being processed', status: 409 },
      { status: 409, statusText: 'Conflict' },
    );
    backend.expectNone('/api/teams/t1/players');
    await vi.advanceTimersByTimeAsync(1000);
    const second = keyOf('/api/teams/t1/players');
    expect(second.key).toBe(first.key);
    second.request.flush({ id: 'p9' }, { headers: { 'Idempotent-Replayed': 'true' } });
    expect(await answer).toEqual({ id: 'p9' });
  });

  it('other refusals reach the caller at once, unretried', async () => {
    const answer = firstValueFrom(http.post('/api/teams', {})).catch(
      (error: { status: number }) => error.status,
    );
    keyOf('/api/teams').request.flush(
      { type: '/problems/conflict', title: 'Conflict', status: 409 },
      { status: 409, statusText: 'Conflict' },
    );
    expect(await answer).toBe(409);
    backend.expectNone('/api/teams');
  });

  it('uses a key the caller chose', () => {
    http
      .post('/api/plans', {}, { context: new HttpContext().set(IDEMPOTENCY_KEY, 'wizard-key-0001') })
      .subscribe();
    const { request, key } = keyOf('/api/plans');
    expect(key).toBe('wizard-key-0001');
    request.flush({});
  });

  it('a form sent again unchanged reuses its key; a changed form gets a new one', () => {
    const form = new RetryKey();
    const send = (body: object) => {
      http.post('/api/teams', body, { context: form.for(body) }).subscribe({ error: () => undefined });
      const { request, key } = keyOf('/api/teams');
      request.flush(null, { status: 0, statusText: 'Unknown Error' });
      return key;
    };
    const first = send({ name: 'U9 Moths', ageGroup: 'U9' });
    expect(first).toMatch(UUID);
    expect(send({ name: 'U9 Moths', ageGroup: 'U9' })).toBe(first);
    const changed = send({ name: 'U9 Mayflies', ageGroup: 'U9' });
    expect(changed).toMatch(UUID);
    expect(changed).not.toBe(first);
    expect(new RetryKey().for({ name: 'U9 Moths', ageGroup: 'U9' }).get(IDEMPOTENCY_KEY)).not.toBe(first);
  });
});
