import { HttpContext } from '@angular/common/http';
import { randomId } from '../ids/random-id';
import { IDEMPOTENCY_KEY } from './idempotency-interceptor';

/**
 * One Idempotency-Key per form and body: a form sent again unchanged after a failure, say an
 * answer lost on a weak signal, reuses its key, so the server answers with what it made the first
 * time instead of making it twice; a changed form gets a new key.
 */
export class RetryKey {
  private last: { body: string; key: string } | null = null;

  /** The request context that carries the key for this body. */
  for(body: unknown): HttpContext {
    const text = JSON.stringify(body);
    if (this.last?.body !== text) this.last = { body: text, key: randomId() };
    return new HttpContext().set(IDEMPOTENCY_KEY, this.last.key);
  }
}
