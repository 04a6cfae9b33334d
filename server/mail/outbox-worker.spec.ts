import { describe, expect, it } from 'vitest';
import { createDataSource } from '../data-source';
import { outboxTimingFromEnv } from './mail-settings';
import { outboxWorkerSettings } from './outbox-worker';

describe('outbox sender settings', () => {
  // Never connected: the settings only hold on to it.
  const dataSource = createDataSource({ url: 'postgres://nobody@127.0.0.1:9/none' });
  const mail = { host: '127.0.0.1', port: 2525, secure: false, from: 'Conewise <no-reply@conewise.invalid>' };

  it('an unset poll interval or lease, passed on as undefined, keeps its default', () => {
    const settings = outboxWorkerSettings({ dataSource, mail, pollMs: undefined, leaseMs: undefined });
    expect(settings.pollMs).toBe(1_000);
    expect(settings.leaseMs).toBe(120_000);
    expect(settings.batchSize).toBe(10);
  });

  it('what is given replaces the default', () => {
    const settings = outboxWorkerSettings({ dataSource, mail, pollMs: 50, leaseMs: 3_000 });
    expect([settings.pollMs, settings.leaseMs]).toEqual([50, 3_000]);
  });

  it('OUTBOX_POLL_MS and OUTBOX_LEASE_MS are read as whole milliseconds; unset or blank gives none', () => {
    expect(outboxTimingFromEnv({ OUTBOX_POLL_MS: '250', OUTBOX_LEASE_MS: ' 30000 ' })).toEqual({
      pollMs: 250,
      leaseMs: 30_000,
    });
    expect(outboxTimingFromEnv({ OUTBOX_LEASE_MS: '' })).toEqual({});
    expect(outboxTimingFromEnv({})).toEqual({});
  });

  it('a value that is not a whole number of milliseconds stops the start, naming the setting', () => {
    for (const bad of ['0', '2.5', '-1', '3s', 'soon']) {
      expect(() => outboxTimingFromEnv({ OUTBOX_LEASE_MS: bad })).toThrow(
        new RegExp(`^OUTBOX_LEASE_MS is "${bad}"; it must be a whole number of milliseconds`),
      );
    }
    expect(() => outboxTimingFromEnv({ OUTBOX_POLL_MS: '1e3' })).toThrow(/^OUTBOX_POLL_MS is "1e3"/);
  });
});
