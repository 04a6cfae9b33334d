import {
  HttpContextToken,
  HttpErrorResponse,
  HttpInterceptorFn,
  type HttpRequest,
} from '@angular/common/http';
import { retry, throwError, timer } from 'rxjs';
import { randomId } from '../ids/random-id';

/** The request header the server reads (server/middleware/idempotency.ts). */
export const IDEMPOTENCY_KEY_HEADER = 'Idempotency-Key';

/** A key of the caller's own for one request, e.g. one kept while a form is retried by hand. */
export const IDEMPOTENCY_KEY = new HttpContextToken<string | null>(() => null);

/** How often a POST is sent again on its own while the server says its first copy is still running. */
export const IDEMPOTENT_RETRIES = 3;

/**
 * POSTs that get no key: signing in and registering create nothing twice (a second registration
 * is refused as a taken address) and, like accepting an invitation, come from someone with no
 * account yet, while the server keeps keys per member.
 */
const WITHOUT_KEY = [/^\/api\/auth\//, /^\/api\/invitations\/accept(\?|$)/];

/** Keys already given, by request object: a re-sent request keeps its key. */
const keys = new WeakMap<HttpRequest<unknown>, string>();

/** The key for a request: the caller's, the one it was given before, or a new one. */
function keyFor(request: HttpRequest<unknown>): string {
  const key = request.context.get(IDEMPOTENCY_KEY) ?? keys.get(request) ?? randomId();
  keys.set(request, key);
  return key;
}

/** The server's "the same request is still being processed" answer. */
function stillRunning(error: unknown): boolean {
  return (
    error instanceof HttpErrorResponse &&
    error.status === 409 &&
    (error.error as { type?: string } | null)?.type === '/problems/request-in-progress'
  );
}

/**
 * Gives every POST to the API an Idempotency-Key, so a double tap or a retry creates one team,
 * player, plan, share or invitation. The same request object keeps its key when it is sent again
 * (an RxJS retry above this interceptor re-runs it with that object), and this interceptor itself
 * sends it again, with the same key, when the server says the first copy is still running; the
 * server then answers with the first result. Lost connections are left to the caller (the
 * pitch-side queue has its own retries), so being offline is said at once.
 */
export const idempotencyInterceptor: HttpInterceptorFn = (request, next) => {
  const applies =
    request.method === 'POST' &&
    request.url.startsWith('/api/') &&
    !WITHOUT_KEY.some((pattern) => pattern.test(request.url)) &&
    !request.headers.has(IDEMPOTENCY_KEY_HEADER);
  if (!applies) return next(request);
  const keyed = request.clone({ setHeaders: { [IDEMPOTENCY_KEY_HEADER]: keyFor(request) } });
  return next(keyed).pipe(
    retry({
      count: IDEMPOTENT_RETRIES,
      delay: (error: unknown, attempt: number) =>
        stillRunning(error) ? timer(attempt * 700) : throwError(() => error),
    }),
  );
};
