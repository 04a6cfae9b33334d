/**
 * `npm run db:restore -- FILE`: loads a backup made by `npm run db:backup` into an empty database:
 * DATABASE_URL's, else the private cluster `npm start` keeps (made new when there is none). A
 * database that already has tables is refused and left as it was. Exits 2 when there is
 * something to put right first, 1 when pg_restore fails (the database is then left as it was).
 */
import { resolve } from 'node:path';
import {
  appliedMigrations,
  BackupRefused,
  checkBackupFile,
  describeDatabase,
  restoreDatabase,
} from '../db/database-backup';
import { withProductDatabase } from '../db/product-database';
import { MIGRATIONS } from '../migrations';

const USAGE = 'usage: npm run db:restore -- FILE   (a file made by npm run db:backup)';
const log = (message: string) => console.log(message);

/** What the restored database's migrations say about this version of Conewise. */
function migrationNote(applied: string[]): string {
  const known = MIGRATIONS.map((migration) => migration.name);
  const unknown = applied.filter((name) => !known.includes(name));
  if (unknown.length) {
    return `  The backup comes from a newer Conewise (migration ${unknown.at(-1)} is unknown here): run that version on it.`;
  }
  const pending = known.filter((name) => !applied.includes(name)).length;
  return pending
    ? `  The backup comes from an older Conewise: the next start applies ${pending} newer migration(s).`
    : '  Its migrations match this version: the next start applies none.';
}

async function main(args: string[]): Promise<number> {
  if (args.includes('-h') || args.includes('--help')) {
    log(USAGE);
    return 0;
  }
  if (args.length !== 1 || args[0]!.startsWith('-')) {
    console.error(USAGE);
    return 2;
  }
  const file = resolve(process.env['INIT_CWD'] ?? process.cwd(), args[0]!);
  try {
    // Before any database is started or made: a wrong file name should cost nothing.
    checkBackupFile(file);
    await withProductDatabase({ create: true, log }, async ({ url, whenNotEmpty }) => {
      const tables = await restoreDatabase(url, file, whenNotEmpty);
      log(`[conewise] ${file} restored into ${describeDatabase(url)}: ${tables.length} tables`);
      log(migrationNote(await appliedMigrations(url)));
    });
  } catch (error) {
    console.error(`[conewise] nothing restored: ${(error as Error).message}`);
    return error instanceof BackupRefused ? 2 : 1;
  }
  return 0;
}

process.exit(await main(process.argv.slice(2)));
