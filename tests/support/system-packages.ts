/** Debian packages the tests need: PostgreSQL's server, Chromium, and poppler for reading PDFs. */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';

interface Requirement {
  /** Debian package that provides it. */
  debian: string;
  present: () => boolean;
}

const REQUIREMENTS: Requirement[] = [
  { debian: 'postgresql', present: () => findPostgresBin('postgres') !== null },
  { debian: 'chromium', present: () => existsSync('/usr/bin/chromium') },
  {
    debian: 'poppler-utils',
    present: () => existsSync('/usr/bin/pdftotext') && existsSync('/usr/bin/pdftoppm'),
  },
];

/** Path of a PostgreSQL server binary from Debian's versioned folders, newest first. */
export function findPostgresBin(name: string): string | null {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const versions = readdirSync(base).sort((a, b) => Number(b) - Number(a));
  for (const version of versions) {
    const candidate = `${base}/${version}/bin/${name}`;
    if (existsSync(candidate)) return candidate;
  }
  return null;
}

/** Installs what is missing when root; otherwise names the exact command to run. */
export function ensureSystemPackages(): { ok: boolean; message: string } {
  const missing = REQUIREMENTS.filter((r) => !r.present()).map((r) => r.debian);
  if (missing.length === 0) return { ok: true, message: 'system packages present' };
  const command = `apt-get install -y ${missing.join(' ')}`;
  if (process.getuid?.() !== 0) {
    return { ok: false, message: `Missing Debian packages. Run: sudo apt-get update && sudo ${command}` };
  }
  console.log(`Installing missing Debian packages: ${missing.join(', ')}`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  const install = spawnSync('apt-get', ['install', '-y', '-qq', ...missing], { stdio: 'inherit', env });
  const still = REQUIREMENTS.filter((r) => !r.present()).map((r) => r.debian);
  if (install.status !== 0 || still.length > 0) {
    return { ok: false, message: `Could not install ${still.join(', ')}. Run: ${command}` };
  }
  return { ok: true, message: `installed ${missing.join(', ')}` };
}
