import pg, { type BackendMessage, type ClientConfig } from 'pg';

/**
 * Whether the server is ending the session with this error. The severity is in the server's
 * language (lc_messages), so the SQLSTATEs of class 57P that end a session (57P01 admin_shutdown,
 * 57P02 crash_shutdown, 57P05 idle_session_timeout, ...) are checked too; 57014 (a cancelled
 * statement) leaves the session open.
 */
function endsTheSession(message: BackendMessage): boolean {
  return message.severity === 'FATAL' || message.severity === 'PANIC' || /^57P/.test(message.code ?? '');
}

/**
 * node-postgres' client for the pool, except that it closes as soon as the server ends its
 * session (a FATAL error: a restart or an administrator terminating it, 57P01). The pool then
 * drops it when the request holding it gives it back, instead of lending out a connection whose
 * socket is about to close, which would fail one more request after the session was already lost.
 * A socket that closes without a word is dropped by node-postgres itself.
 */
export class SessionClient extends pg.Client {
  constructor(config?: ClientConfig) {
    super(config);
    // Only once connected: a FATAL while connecting (a server still starting, a wrong password)
    // already fails the connect.
    this.once('connect', () => {
      this.connection.on('errorMessage', (message: BackendMessage) => {
        if (endsTheSession(message)) this.end().catch(() => undefined);
      });
    });
  }
}
