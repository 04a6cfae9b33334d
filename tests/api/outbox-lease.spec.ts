/**
 * Two outbox senders and a message whose first send outlasts its lease: the second sender takes
 * it over and delivers it, and the first, failing late, must not put it back in the queue (which
 * would send it a second time).
 */
import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeSmtp, type FakeSmtp } from '../../server/mail/fake-smtp';
import { mailSettingsFromEnv } from '../../server/mail/mail-settings';
import { OutboxWorker } from '../../server/mail/outbox-worker';
import { outboxMailQueue } from '../../server/services/mail-queue';
import { startTestApp, type TestApp } from '../support/api-test-app';

const LEASE_MS = 300;

describe('an outbox lease that runs out mid-send', () => {
  let app: TestApp;
  /** The first sender's mail server: it hangs on recipients starting "slow-". */
  let slowSmtp: FakeSmtp;
  let smtp: FakeSmtp;
  let first: OutboxWorker;
  let second: OutboxWorker;

  beforeAll(async () => {
    app = await startTestApp();
    slowSmtp = await startFakeSmtp({ stall: (recipient) => recipient.startsWith('slow-') });
    smtp = await startFakeSmtp();
    const sender = (port: number) =>
      new OutboxWorker({
        dataSource: app.dataSource,
        mail: mailSettingsFromEnv({ host: '127.0.0.1', port, secure: false }),
        leaseMs: LEASE_MS,
        baseDelayMs: 20,
        maxDelayMs: 50,
      });
    first = sender(slowSmtp.port);
    second = sender(smtp.port);
  });
  afterAll(async () => {
    await Promise.all([first?.stop(), second?.stop()]);
    await Promise.all([slowSmtp?.stop(), smtp?.stop()]);
    await app.close();
  });

  const rowOf = async (id: string) =>
    (
      (await app.dataSource.query('SELECT status, attempts FROM outbox_message WHERE id = $1', [id])) as {
        status: string;
        attempts: number;
      }[]
    )[0];

  it('the sender that took over delivers it once; the first one failing late changes nothing', async () => {
    const recipient = `slow-${randomUUID().slice(0, 8)}@example.org`;
    const id = await outboxMailQueue.enqueue(app.dataSource.manager, {
      clubId: null,
      kind: 'invitation',
      recipients: [recipient],
      subject: 'You are invited',
      text: 'Hello',
    });
    const stuck = first.drainOnce();
    await expect.poll(() => slowSmtp.stalled(), { timeout: 10_000, interval: 20 }).toContain(recipient);
    expect(await rowOf(id)).toEqual({ status: 'pending', attempts: 1 });

    // The lease runs out while the first is still waiting on its mail server.
    await new Promise((resolve) => setTimeout(resolve, LEASE_MS + 100));
    await second.drainOnce();
    expect(smtp.messages().filter((m) => m.to.includes(recipient))).toHaveLength(1);
    expect(await rowOf(id)).toEqual({ status: 'sent', attempts: 2 });

    // The first one's mail server finally answers, with a failure.
    slowSmtp.release();
    await stuck;
    expect(await rowOf(id)).toEqual({ status: 'sent', attempts: 2 });
    await new Promise((resolve) => setTimeout(resolve, 100));
    await second.drainOnce();
    expect(smtp.messages().filter((m) => m.to.includes(recipient))).toHaveLength(1);
  });
});
