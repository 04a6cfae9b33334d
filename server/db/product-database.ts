import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { DATA_DIR } from '../config';
import { BackupRefused } from './database-backup';
import { resolveDataDir, runningCluster, startCluster } from './pg-cluster';

/** The database an operator's command works on, and how to get an empty one in its place. */
export interface ProductDatabase {
  url: string;
  /** Advice for a restore that found the database in use. */
  whenNotEmpty: string;
}

export interface ProductDatabaseOptions {
  /** Make the private cluster when there is none yet (a restore); a backup needs one that exists. */
  create: boolean;
  log: (message: string) => void;
}

/**
 * Runs `work` on the database Conewise uses: DATABASE_URL when set, else the private cluster
 * `npm start` keeps in the data folder. A running cluster is used as it is and left running;
 * a stopped one is started as `npm start` starts it, and stopped again afterwards (also on
 * Ctrl-C).
 */
export async function withProductDatabase<T>(
  options: ProductDatabaseOptions,
  work: (database: ProductDatabase) => Promise<T>,
): Promise<T> {
  const external = process.env['DATABASE_URL'];
  if (external) {
    return work({
      url: external,
      whenNotEmpty:
        'Create an empty database (for example: createdb conewise_restored) and point DATABASE_URL at it.',
    });
  }
  const dataDir = resolveDataDir(join(DATA_DIR, 'pg'), options.log);
  const whenNotEmpty =
    `Stop Conewise, move ${dataDir} and ${dataDir}.password aside, and run the restore again: ` +
    'it then makes a new, empty private database.';
  const running = runningCluster(dataDir);
  if (running) {
    options.log(`[conewise] using the running PostgreSQL on 127.0.0.1:${running.port}, data in ${dataDir}`);
    return work({ url: running.url, whenNotEmpty });
  }
  if (!options.create && !existsSync(join(dataDir, 'PG_VERSION'))) {
    throw new BackupRefused(
      `There is no Conewise database in ${dataDir} yet (npm start makes it). ` +
        'To back up another PostgreSQL database, set DATABASE_URL.',
    );
  }
  const cluster = await startCluster({ dataDir, log: options.log });
  options.log(`[conewise] started PostgreSQL on 127.0.0.1:${cluster.port} for this, data in ${dataDir}`);
  const stopOnSignal = (signal: NodeJS.Signals) => {
    options.log(`[conewise] ${signal}: stopping PostgreSQL`);
    void cluster.stop().finally(() => process.exit(130));
  };
  process.once('SIGINT', stopOnSignal);
  process.once('SIGTERM', stopOnSignal);
  try {
    return await work({ url: cluster.url, whenNotEmpty });
  } finally {
    process.off('SIGINT', stopOnSignal);
    process.off('SIGTERM', stopOnSignal);
    await cluster.stop();
    options.log('[conewise] stopped PostgreSQL again');
  }
}
