/**
 * `npm run -s bench:print`: does printing starve planning? A throwaway PostgreSQL cluster and the
 * API in its own process, twice: cards made on the main thread (CARD_WORKERS=0, how it was) and
 * in the worker-thread pool (how it is). Each time POST /api/plans runs at a steady 20 req/s over
 * 4 connections, first alone, then while a printer asks for a card (GET /api/plans/:id/pdf)
 * 4 times a second. Prints p50/p99 of the plans and of the cards; the last line is JSON.
 * Target: POST /api/plans p99 ≤ 50 ms while cards print. BENCH_SECONDS shortens each run (20 s).
 */
import autocannon from 'autocannon';
import { startThrowawayCluster } from '../../server/db/pg-cluster';
import { freePort } from '../../server/db/free-port';
import { benchClub, json, startApi, stopApi } from './support/api-process';

const SECONDS = Number(process.env['BENCH_SECONDS'] ?? 20);
const PLAN_RATE = 20;
const CARDS_PER_SECOND = 4;

interface Latency {
  p50Ms: number;
  p99Ms: number;
}

function plansAtSteadyRate(base: string, token: string, planBody: string): Promise<Latency> {
  return new Promise((resolve, reject) => {
    autocannon(
      {
        url: `${base}/api/plans`,
        method: 'POST',
        headers: { authorization: `Bearer ${token}`, 'content-type': 'application/json' },
        body: planBody,
        connections: 4,
        overallRate: PLAN_RATE,
        duration: SECONDS,
      },
      (error, result) => {
        if (error) return reject(error);
        if (result.non2xx || result.errors)
          return reject(new Error(`plans: ${result.non2xx} non-2xx, ${result.errors} errors`));
        resolve({ p50Ms: result.latency.p50, p99Ms: result.latency.p99 });
      },
    );
  });
}

function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return NaN;
  return Math.round(sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!);
}

/** Asks for a card (of the next plan) every 1/CARDS_PER_SECOND s until stopped; each answer's time and status. */
function startPrinter(
  urls: string[],
  token: string,
): { stop(): Promise<{ latency: Latency; asked: number; ok: number; other: Record<number, number> }> } {
  const times: number[] = [];
  const other: Record<number, number> = {};
  const inFlight = new Set<Promise<void>>();
  let asked = 0;
  const timer = setInterval(() => {
    const url = urls[asked % urls.length]!;
    asked++;
    const started = performance.now();
    const request = fetch(url, { headers: { authorization: `Bearer ${token}` } })
      .then(async (response) => {
        await response.arrayBuffer();
        if (response.status === 200) times.push(performance.now() - started);
        else other[response.status] = (other[response.status] ?? 0) + 1;
      })
      .catch(() => {
        other[0] = (other[0] ?? 0) + 1;
      })
      .finally(() => inFlight.delete(request));
    inFlight.add(request);
  }, 1000 / CARDS_PER_SECOND);
  return {
    async stop() {
      clearInterval(timer);
      await Promise.all([...inFlight]);
      const sorted = times.sort((a, b) => a - b);
      return {
        latency: { p50Ms: percentile(sorted, 50), p99Ms: percentile(sorted, 99) },
        asked,
        ok: times.length,
        other,
      };
    },
  };
}

interface ModeFigures {
  plansAlone: Latency;
  plansWhilePrinting: Latency;
  cards: Latency & { asked: number; ok: number; other: Record<number, number> };
}

async function measure(
  databaseUrl: string,
  env: Record<string, string>,
  label: string,
): Promise<ModeFigures> {
  const port = await freePort();
  const api = await startApi(databaseUrl, port, { env });
  try {
    const base = `http://127.0.0.1:${port}`;
    const club = await benchClub(base, label);
    // A different plan for every card asked for, as on a Saturday morning (a card printed again is
    // laid out once, so repeats would flatter the figures).
    const cardUrls: string[] = [];
    for (let i = 0; i < SECONDS * CARDS_PER_SECOND + 8; i++) {
      const plan = await json(`${base}/api/plans`, 'POST', JSON.parse(club.planBody), club.token);
      cardUrls.push(`${base}/api/plans/${plan.id}/pdf?paper=a4`);
    }
    // Warm the engine, pdfmake and the pool's thread before measuring.
    for (const url of cardUrls.splice(0, 3))
      await fetch(url, { headers: { authorization: `Bearer ${club.token}` } });
    await plansAtSteadyRate(base, club.token, club.planBody);
    const plansAlone = await plansAtSteadyRate(base, club.token, club.planBody);
    const printer = startPrinter(cardUrls, club.token);
    const plansWhilePrinting = await plansAtSteadyRate(base, club.token, club.planBody);
    const cards = await printer.stop();
    return {
      plansAlone,
      plansWhilePrinting,
      cards: { ...cards.latency, asked: cards.asked, ok: cards.ok, other: cards.other },
    };
  } finally {
    await stopApi(api);
  }
}

const cluster = await startThrowawayCluster(() => undefined);
try {
  const before = await measure(cluster.url, { CARD_WORKERS: '0' }, 'main-thread');
  const after = await measure(cluster.url, {}, 'pool');
  console.log(
    `POST /api/plans at ${PLAN_RATE}/s (4 connections), ${SECONDS} s a run; cards asked for ${CARDS_PER_SECOND} times a second`,
  );
  console.log(
    'cards made                 plans alone p50/p99   plans while printing p50/p99   cards p50/p99   cards answered',
  );
  for (const [name, f] of [
    ['on the main thread (before)', before],
    ['in the worker pool (now)', after],
  ] as const) {
    const refused = Object.entries(f.cards.other)
      .map(([status, n]) => `${n}×${status === '0' ? 'failed' : status}`)
      .join(', ');
    console.log(
      `${name.padEnd(27)}${`${f.plansAlone.p50Ms}/${f.plansAlone.p99Ms} ms`.padStart(20)}${`${f.plansWhilePrinting.p50Ms}/${f.plansWhilePrinting.p99Ms} ms`.padStart(31)}${`${f.cards.p50Ms}/${f.cards.p99Ms} ms`.padStart(16)}   ${f.cards.ok} of ${f.cards.asked}${refused ? ` (${refused})` : ''}`,
    );
  }
  const p99 = after.plansWhilePrinting.p99Ms;
  console.log(`target: POST /api/plans p99 while printing ${p99} ms (≤ 50: ${p99 <= 50 ? 'met' : 'missed'})`);
  console.log(JSON.stringify({ before, after }));
} finally {
  await cluster.stop();
}
