/**
 * `npm run -s bench:soak`: Saturday morning for ten minutes (BENCH_SECONDS sets another length).
 * Two API instances behind nginx (tests/support/load-balancer.ts) on a throwaway PostgreSQL
 * cluster; coaches keep signing in, reading their teams, making a plan, printing one card in four,
 * re-planning a late arrival pitch-side and judging a station. Prints each instance's memory after
 * the first minute (warm-up) and at the end, p50/p99 per route per minute and the count of 5xx
 * answers; the last line is JSON. Goals: no 5xx, memory growth under 10 % after warm-up, p99 flat.
 */
import type { ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { startThrowawayCluster } from '../../server/db/pg-cluster';
import { freePort } from '../../server/db/free-port';
import { startLoadBalancer } from '../support/load-balancer';
import { benchClub, residentMb, startApi, stopApi } from './support/api-process';

const SECONDS = Number(process.env['BENCH_SECONDS'] ?? 600);
const COACHES = 6;
const WARM_UP_S = Math.min(60, SECONDS / 5);

type Route = 'sign-in' | 'team list' | 'new plan' | 'card' | 're-plan' | 'feedback';
const ROUTES: Route[] = ['sign-in', 'team list', 'new plan', 'card', 're-plan', 'feedback'];

/** Each answer's time by route and minute; 5xx and failures counted apart. */
const times = new Map<string, number[]>();
const serverErrors: Record<string, number> = {};
let failures = 0;
const started = performance.now();
const minuteNow = () => Math.floor((performance.now() - started) / 60_000);

/** Sends a request, notes its time under its route and minute (and a 5xx apart); the answer's text. */
async function timed(
  route: Route,
  url: string,
  init: RequestInit,
): Promise<{ ok: boolean; text: string } | null> {
  const t0 = performance.now();
  try {
    const response = await fetch(url, init);
    const text = await response.text();
    const key = `${route}|${minuteNow()}`;
    if (!times.has(key)) times.set(key, []);
    times.get(key)!.push(performance.now() - t0);
    if (response.status >= 500) {
      const what = `${route} ${response.status}`;
      serverErrors[what] = (serverErrors[what] ?? 0) + 1;
    }
    return { ok: response.ok, text };
  } catch {
    failures++;
    return null;
  }
}

/** The same, for a JSON answer the coach goes on with (null when refused). */
async function bodyOf<T>(route: Route, url: string, init: RequestInit): Promise<T | null> {
  const answer = await timed(route, url, init);
  return answer?.ok ? (JSON.parse(answer.text) as T) : null;
}

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));
const think = () => pause(150 + Math.random() * 350);

interface PlanAnswer {
  id: string;
  plan: { phases: { stations: { id: string }[] }[] };
}

/** One coach, round after round until the time is up. */
async function coach(
  base: string,
  email: string,
  password: string,
  planBody: string,
  spare: string[],
  until: number,
  n: number,
) {
  let round = 0;
  while (performance.now() < until) {
    round++;
    const signedIn = await bodyOf<{ token: string }>('sign-in', `${base}/api/auth/login`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email, password }),
    });
    if (!signedIn) {
      await think();
      continue;
    }
    const auth = { authorization: `Bearer ${signedIn.token}` };
    await think();
    await timed('team list', `${base}/api/teams`, { headers: auth });
    await think();
    const plan = await bodyOf<PlanAnswer>('new plan', `${base}/api/plans`, {
      method: 'POST',
      headers: { ...auth, 'content-type': 'application/json', 'idempotency-key': randomUUID() },
      body: planBody,
    });
    if (!plan) continue;
    await think();
    if ((round + n) % 4 === 0) {
      await timed('card', `${base}/api/plans/${plan.id}/pdf?paper=a4`, { headers: auth });
      await think();
    }
    await timed('re-plan', `${base}/api/plans/${plan.id}/replan`, {
      method: 'POST',
      headers: { ...auth, 'content-type': 'application/json' },
      body: JSON.stringify({
        add: [{ id: spare[round % spare.length] }],
        fromMinute: 5,
        clientId: randomUUID(),
      }),
    });
    await think();
    const station = plan.plan.phases[0]?.stations[0];
    if (station)
      await timed('feedback', `${base}/api/plans/${plan.id}/feedback`, {
        method: 'POST',
        headers: { ...auth, 'content-type': 'application/json' },
        body: JSON.stringify({
          phaseIndex: 0,
          stationId: station.id,
          verdict: 'right',
          clientId: randomUUID(),
        }),
      });
    await think();
  }
}

function percentile(values: number[], p: number): number {
  if (!values.length) return NaN;
  const sorted = [...values].sort((a, b) => a - b);
  return Math.round(sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))]!);
}

const cluster = await startThrowawayCluster(() => undefined);
const instances: ChildProcess[] = [];
let balancer: Awaited<ReturnType<typeof startLoadBalancer>> | null = null;
try {
  const ports = [await freePort(), await freePort()];
  const env = { TRUST_PROXY: 'loopback' };
  // One after the other: the first migrates the empty database.
  for (const port of ports) instances.push(await startApi(cluster.url, port, { env }));
  balancer = await startLoadBalancer(ports);
  const base = balancer.url;
  const club = await benchClub(base, 'soak');
  // The plan takes 14 of the 16; the other two arrive late pitch-side.
  const request = JSON.parse(club.planBody) as { request: { players: { id: string }[] } };
  const spare = request.request.players.splice(14).map((p) => p.id);
  const planBody = JSON.stringify(request);

  const until = performance.now() + SECONDS * 1000;
  const memory: { warm: number[]; end: number[] } = { warm: [], end: [] };
  const warmTimer = setTimeout(
    () => (memory.warm = instances.map((c) => residentMb(c.pid!))),
    WARM_UP_S * 1000,
  );
  await Promise.all(
    Array.from({ length: COACHES }, (_, i) =>
      pause(i * 200).then(() => coach(base, club.email, club.password, planBody, spare, until, i)),
    ),
  );
  clearTimeout(warmTimer);
  memory.end = instances.map((c) => residentMb(c.pid!));

  const minutes = minuteNow() + 1;
  console.log(`${SECONDS} s, ${COACHES} coaches, 2 instances behind nginx; p50/p99 ms per minute (count)`);
  const table: Record<string, { minute: number; count: number; p50Ms: number; p99Ms: number }[]> = {};
  for (const route of ROUTES) {
    const row: string[] = [];
    table[route] = [];
    for (let m = 0; m < minutes; m++) {
      const values = times.get(`${route}|${m}`) ?? [];
      if (!values.length) continue;
      const figures = {
        minute: m + 1,
        count: values.length,
        p50Ms: percentile(values, 50),
        p99Ms: percentile(values, 99),
      };
      table[route].push(figures);
      row.push(`${figures.p50Ms}/${figures.p99Ms} (${figures.count})`.padStart(18));
    }
    console.log(`${route.padEnd(10)} ${row.join('')}`);
  }
  const growth = memory.end.map((end, i) =>
    memory.warm[i] ? ((end - memory.warm[i]!) / memory.warm[i]!) * 100 : NaN,
  );
  for (const [i, end] of memory.end.entries())
    console.log(
      `instance ${i + 1}: ${memory.warm[i]} MB after ${WARM_UP_S} s, ${end} MB at the end (${growth[i]!.toFixed(1)} %)`,
    );
  const fiveXx = Object.values(serverErrors).reduce((a, b) => a + b, 0);
  console.log(
    `5xx answers: ${fiveXx}${fiveXx ? ` (${JSON.stringify(serverErrors)})` : ''}; requests that failed outright: ${failures}`,
  );
  console.log(
    `goals: no 5xx (${fiveXx === 0 ? 'met' : 'missed'}), memory growth under 10 % (${growth.every((g) => g < 10) ? 'met' : 'missed'})`,
  );
  console.log(
    JSON.stringify({
      seconds: SECONDS,
      coaches: COACHES,
      memoryMb: memory,
      growthPercent: growth.map((g) => Math.round(g * 10) / 10),
      fiveXx,
      failures,
      routes: table,
    }),
  );
} finally {
  await balancer?.stop();
  for (const child of instances) await stopApi(child);
  await cluster.stop();
}
