/**
 * `npm run db:backup [-- FILE]`: writes a backup of Conewise's database (pg_dump's custom format)
 * to FILE, or to backups/conewise-<UTC time>.dump. The database is DATABASE_URL's, else the
 * private cluster `npm start` keeps: the running one, or started for the backup and stopped
 * again. Exits 2 when there is something to put right first, 1 when pg_dump fails.
 */
import { join, resolve } from 'node:path';
import { PROJECT_ROOT } from '../config';
import {
  backupFileName,
  BackupRefused,
  describeDatabase,
  dumpDatabase,
  formatBytes,
} from '../db/database-backup';
import { withProductDatabase } from '../db/product-database';

const USAGE = 'usage: npm run db:backup [-- FILE]   (default: backups/conewise-<UTC time>.dump)';
const log = (message: string) => console.log(message);

async function main(args: string[]): Promise<number> {
  if (args.includes('-h') || args.includes('--help')) {
    log(USAGE);
    return 0;
  }
  if (args.length > 1 || args[0]?.startsWith('-')) {
    console.error(USAGE);
    return 2;
  }
  // npm runs scripts from the project folder; a relative FILE means where the operator typed it.
  const file = args[0]
    ? resolve(process.env['INIT_CWD'] ?? process.cwd(), args[0])
    : join(PROJECT_ROOT, 'backups', backupFileName(new Date()));
  try {
    await withProductDatabase({ create: false, log }, async ({ url }) => {
      const bytes = await dumpDatabase(url, file);
      log(`[conewise] backup of ${describeDatabase(url)} written to ${file} (${formatBytes(bytes)})`);
    });
  } catch (error) {
    console.error(`[conewise] no backup made: ${(error as Error).message}`);
    return error instanceof BackupRefused ? 2 : 1;
  }
  log("  It holds the club's people and children's names: keep it as safe as the database (it is");
  log('  readable by you only), on storage you control; never send it by e-mail.');
  log(`  Restore it into an empty database with: npm run db:restore -- ${file}`);
  return 0;
}

process.exit(await main(process.argv.slice(2)));
