/**
 * Bytes as they cross the wire, read from Chromium's own network log (DevTools protocol): each
 * finished request's encodedDataLength, which is the compressed body plus headers.
 */
import type { CDPSession } from 'playwright-core';

export interface WireRecord {
  url: string;
  type: string;
  bytes: number;
}

export class WireMeter {
  private records: WireRecord[] = [];
  private inFlight = new Map<string, { url: string; type: string }>();
  private lastActivity = Date.now();

  constructor(cdp: CDPSession) {
    cdp.on('Network.requestWillBeSent', (event) => {
      this.inFlight.set(event.requestId, { url: event.request.url, type: event.type ?? 'Other' });
      this.lastActivity = Date.now();
    });
    cdp.on('Network.responseReceived', (event) => {
      const seen = this.inFlight.get(event.requestId);
      if (seen) seen.type = event.type;
    });
    cdp.on('Network.loadingFinished', (event) => {
      const seen = this.inFlight.get(event.requestId);
      this.records.push({
        url: seen?.url ?? '',
        type: seen?.type ?? 'Other',
        bytes: event.encodedDataLength,
      });
      this.inFlight.delete(event.requestId);
      this.lastActivity = Date.now();
    });
    cdp.on('Network.loadingFailed', (event) => {
      this.inFlight.delete(event.requestId);
      this.lastActivity = Date.now();
    });
  }

  /** The requests finished since the last call, once nothing has moved for `quietMs`. */
  async takeWhenQuiet(quietMs = 1000): Promise<WireRecord[]> {
    while (this.inFlight.size > 0 || Date.now() - this.lastActivity < quietMs) {
      await new Promise((resolve) => setTimeout(resolve, 100));
    }
    const taken = this.records;
    this.records = [];
    return taken;
  }
}

export function kilobytes(records: WireRecord[]): number {
  return Math.round(records.reduce((sum, r) => sum + r.bytes, 0) / 102.4) / 10;
}

/** kB per resource type (Script, Stylesheet, Font, Fetch, Document, …), largest first. */
export function byType(records: WireRecord[]): [string, number][] {
  const totals = new Map<string, WireRecord[]>();
  for (const record of records) totals.set(record.type, [...(totals.get(record.type) ?? []), record]);
  return [...totals.entries()]
    .map(([type, rs]) => [type, kilobytes(rs)] as [string, number])
    .sort((a, b) => b[1] - a[1]);
}
