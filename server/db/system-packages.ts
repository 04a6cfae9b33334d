import { execFileSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import { chromiumInstalled } from '../build/chromium';

/** What Conewise needs from the operating system, with the Debian package that provides it. */
const NEEDS = {
  postgresql: { package: 'postgresql', present: () => findPgBinDir() !== null },
  chromium: { package: 'chromium', present: chromiumInstalled },
  pdftotext: { package: 'poppler-utils', present: () => existsSync('/usr/bin/pdftotext') },
  nginx: { package: 'nginx', present: () => existsSync('/usr/sbin/nginx') },
  openssl: { package: 'openssl', present: () => existsSync('/usr/bin/openssl') },
} as const;

export type SystemNeed = keyof typeof NEEDS;

export function isRoot(): boolean {
  return typeof process.getuid === 'function' && process.getuid() === 0;
}

/** The newest Debian PostgreSQL bin folder (/usr/lib/postgresql/N/bin) that has initdb, or null. */
export function findPgBinDir(): string | null {
  const root = '/usr/lib/postgresql';
  if (!existsSync(root)) return null;
  const versions = readdirSync(root)
    .filter((name) => /^\d+$/.test(name) && existsSync(`${root}/${name}/bin/initdb`))
    .map(Number)
    .sort((a, b) => b - a);
  return versions.length ? `${root}/${versions[0]}/bin` : null;
}

/**
 * Makes sure the given system packages are there: installs the missing ones with apt-get when
 * running as root, otherwise throws an error naming the exact command to run.
 */
export function ensureSystemPackages(needs: SystemNeed[]): void {
  const missing = needs.filter((need) => !NEEDS[need].present()).map((need) => NEEDS[need].package);
  if (missing.length === 0) return;
  const command = `apt-get install -y ${missing.join(' ')}`;
  if (!isRoot()) {
    throw new Error(`Missing system packages: ${missing.join(', ')}. Install them with: sudo ${command}`);
  }
  console.log(`[conewise] installing ${missing.join(', ')}: ${command}`);
  execFileSync('apt-get', ['update'], { stdio: 'inherit' });
  execFileSync('apt-get', ['install', '-y', ...missing], {
    stdio: 'inherit',
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
  });
  const still = needs.filter((need) => !NEEDS[need].present());
  if (still.length) throw new Error(`apt-get ran but these are still missing: ${still.join(', ')}`);
}
