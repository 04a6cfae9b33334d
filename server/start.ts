/**
 * `npm start`: everything Conewise needs on one machine. Builds the client when stale, starts a
 * private PostgreSQL cluster (data in .data/pg) unless DATABASE_URL is set, runs the migrations,
 * seeds the demo club on first run, starts a local fake SMTP server (caught mail in .data/mail)
 * and serves API and client on http://127.0.0.1:4300 (PORT overrides). Ctrl-C stops it all.
 */
import { join } from 'node:path';
import { buildClientIfStale } from './client-build';
import { bindHostFromEnv, CLIENT_DIST, DATA_DIR, loadConfig, loadJwtSecret } from './config';
import { connectAndMigrate, createDataSource } from './data-source';
import { startCluster, type PgCluster } from './db/pg-cluster';
import { startHttpServer, type RunningHttpServer } from './http-server';
import { startMailSender, type Stoppable } from './mail-hooks';
import { startFakeSmtp, type FakeSmtp } from './mail/fake-smtp';
import { mailSettingsFromEnv, outboxTimingFromEnv } from './mail/mail-settings';
import { closeCardPool } from './pdf/card-pool';
import { DEMO_PASSWORD, DEMO_PEOPLE, seedDemo } from './seed';
import { startRetentionJob } from './services/retention-service';

const log = (message: string) => console.log(message);
const cleanups: (() => Promise<unknown>)[] = [];
let stopping = false;

async function stopAll(code: number): Promise<never> {
  if (!stopping) {
    stopping = true;
    for (const cleanup of cleanups.reverse()) {
      await cleanup().catch((error) => console.error('[conewise] while stopping:', (error as Error).message));
    }
  }
  process.exit(code);
}

for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    log(`\n[conewise] ${signal}: stopping the server, mail and database`);
    void stopAll(0);
  });
}

async function main(): Promise<void> {
  const port = Number(process.env['PORT'] ?? 4300);
  const host = bindHostFromEnv();
  // Before the slow steps: a server reachable from other machines needs JWT_SECRET.
  const jwtSecret = loadJwtSecret(DATA_DIR, host);
  const outboxTiming = outboxTimingFromEnv();
  process.env['PUBLIC_URL'] ??= `http://${host}:${port}`;

  if (process.env['SKIP_CLIENT_BUILD'] !== '1' && !buildClientIfStale(log)) {
    log('[conewise] the client build failed; serving the API and any earlier build');
  }

  let databaseUrl = process.env['DATABASE_URL'];
  if (!databaseUrl) {
    const cluster: PgCluster = await startCluster({ dataDir: join(DATA_DIR, 'pg'), log });
    cleanups.push(() => cluster.stop());
    databaseUrl = cluster.url;
    log(`[conewise] PostgreSQL on 127.0.0.1:${cluster.port}, data in ${cluster.dataDir}`);
  } else {
    log('[conewise] using the PostgreSQL at DATABASE_URL');
  }

  const dataSource = createDataSource({ url: databaseUrl });
  const applied = await connectAndMigrate(dataSource);
  cleanups.push(() => dataSource.destroy());
  if (applied.length) log(`[conewise] migrations applied: ${applied.join(', ')}`);
  // The demo accounts share a published password: they go into the private cluster only, or into
  // an external database when asked for with SEED_DEMO=1.
  const withDemo = !process.env['DATABASE_URL'] || process.env['SEED_DEMO'] === '1';
  if (withDemo) await seedDemo(dataSource, log);
  else log('[conewise] no demo accounts added to DATABASE_URL (SEED_DEMO=1 adds them)');

  let fake: FakeSmtp | null = null;
  const useFake = !process.env['SMTP_HOST'];
  if (useFake) {
    fake = await startFakeSmtp({ dir: join(DATA_DIR, 'mail'), httpPort: 0 });
    cleanups.push(() => fake!.stop());
  }
  const mail = mailSettingsFromEnv(fake ? { host: '127.0.0.1', port: fake.port, secure: false } : {});
  const sender: Stoppable = startMailSender({ dataSource, mail, ...outboxTiming });
  cleanups.push(() => sender.stop());
  const retention = startRetentionJob({
    dataSource,
    onError: (error) => console.error('[conewise] retention purge failed:', (error as Error).message),
  });
  cleanups.push(() => retention.stop());

  const config = loadConfig({ staticDir: CLIENT_DIST, jwtSecret });
  let http: RunningHttpServer;
  try {
    http = await startHttpServer({ dataSource, config, port, host });
  } catch (error) {
    const code = (error as { code?: string }).code;
    console.error(
      code === 'EADDRINUSE'
        ? `[conewise] port ${port} is in use; start with another, e.g. PORT=4301 npm start`
        : `[conewise] could not listen: ${(error as Error).message}`,
    );
    return void (await stopAll(1));
  }
  cleanups.push(() => http.close());
  cleanups.push(() => closeCardPool());

  log('');
  log(`  Conewise is running at ${http.url}`);
  if (fake) {
    log(
      `  Caught e-mail: ${join(DATA_DIR, 'mail')} (.eml files), list at http://127.0.0.1:${fake.httpPort}/`,
    );
  }
  if (withDemo) {
    log(`  Demo sign-ins (password "${DEMO_PASSWORD}"):`);
    for (const person of DEMO_PEOPLE) log(`    ${person.role.padEnd(9)} ${person.email}  (${person.name})`);
  }
  log('  Press Ctrl-C to stop.');
}

main().catch(async (error) => {
  console.error(`[conewise] failed to start: ${(error as Error).message}`);
  await stopAll(1);
});
