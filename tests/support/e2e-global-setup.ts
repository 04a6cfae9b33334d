/**
 * Global setup of the `e2e` project: a throwaway PostgreSQL cluster with the demo club, the
 * real server (in this process) on a free loopback port serving the built client, the local
 * fake SMTP server and the outbox sender. Tests read:
 *   inject('baseUrl')     the app, e.g. http://127.0.0.1:41234
 *   inject('mailUrl')     the fake's JSON listing of caught mail (GET /, GET /<id>.eml)
 *   inject('databaseUrl') the database, for tests that need to look underneath
 * Everything is stopped and the cluster removed afterwards, also when tests fail.
 */
import { pino } from 'pino';
import type { TestProject } from 'vitest/node';
import { buildClientIfStale } from '../../server/client-build';
import { localeBuilds } from '../../server/build/locale-builds';
import { CLIENT_DIST, loadConfig } from '../../server/config';
import { connectAndMigrate, createDataSource } from '../../server/data-source';
import { startThrowawayCluster } from '../../server/db/pg-cluster';
import { startHttpServer } from '../../server/http-server';
import { closeCardPool } from '../../server/pdf/card-pool';
import { startMailSender } from '../../server/mail-hooks';
import { startFakeSmtp } from '../../server/mail/fake-smtp';
import { mailSettingsFromEnv } from '../../server/mail/mail-settings';
import { seedDemo } from '../../server/seed';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    mailUrl: string;
    databaseUrl: string;
  }
}

const stops: (() => Promise<unknown>)[] = [];

export async function setup(project: TestProject): Promise<void> {
  try {
    // SKIP_CLIENT_BUILD=1 tests whatever build is there (handy while iterating on server code).
    const built = process.env['SKIP_CLIENT_BUILD'] === '1' || buildClientIfStale();
    if (!built || !localeBuilds(CLIENT_DIST).length) {
      throw new Error('The client build failed: run `npx ng build` to see why.');
    }
    const cluster = await startThrowawayCluster(() => undefined);
    stops.push(() => cluster.stop());
    const dataSource = createDataSource({ url: cluster.url });
    await connectAndMigrate(dataSource);
    stops.push(() => dataSource.destroy());
    await seedDemo(dataSource, () => undefined);

    const fake = await startFakeSmtp({ httpPort: 0 });
    stops.push(() => fake.stop());
    const sender = startMailSender({
      dataSource,
      mail: mailSettingsFromEnv({ host: '127.0.0.1', port: fake.port, secure: false }),
      pollMs: 200,
    });
    stops.push(() => sender.stop());

    // Bind first to learn the port, so invitation links point at this server.
    const config = loadConfig({
      staticDir: CLIENT_DIST,
      logLevel: 'silent',
      authRateLimit: { windowMs: 60_000, max: 10_000 },
    });
    const http = await startHttpServer({ dataSource, config, port: 0, logger: pino({ level: 'silent' }) });
    config.publicUrl = http.url;
    stops.push(() => http.close());
    stops.push(() => closeCardPool());

    project.provide('baseUrl', http.url);
    project.provide('mailUrl', `http://127.0.0.1:${fake.httpPort}`);
    project.provide('databaseUrl', cluster.url);
  } catch (error) {
    console.error('[e2e setup] failed:', (error as Error).message);
    await teardown();
    throw error;
  }
}

export async function teardown(): Promise<void> {
  while (stops.length) {
    await stops.pop()!().catch(() => undefined);
  }
}
