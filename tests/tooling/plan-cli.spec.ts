/** The plan CLI: Plan JSON (or, with --text, the plan as a coach reads it) on stdout; an invalid request exits 2 naming each field, no stack trace. */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const root = fileURLToPath(new URL('../..', import.meta.url));
const tsx = join(root, 'node_modules/.bin/tsx');
const cli = join(root, 'server/cli/plan.ts');

function run(args: string[], input?: string) {
  return spawnSync(tsx, [cli, ...args], { cwd: root, input, encoding: 'utf8', timeout: 60_000 });
}

const valid = {
  ageGroup: 'U9',
  level: 'beginner',
  players: [{ id: 'a' }, { id: 'b' }, { id: 'c' }, { id: 'd' }, { id: 'e' }],
  coaches: 1,
  equipment: { balls: 5, cones: 20, bibs: 4, goals: 1 },
  space: { width: 30, length: 30 },
  minutes: 15,
  kind: 'match-warm-up',
  seed: 'cli',
};

describe('npm run plan', () => {
  it('prints the plan for a request file, the same for stdin', () => {
    const dir = mkdtempSync(join(tmpdir(), 'conewise-cli-'));
    const file = join(dir, 'request.json');
    writeFileSync(file, JSON.stringify(valid));
    const fromFile = run([file]);
    expect(fromFile.status).toBe(0);
    const plan = JSON.parse(fromFile.stdout);
    expect(plan.seed).toBe('cli');
    expect(plan.phases.at(-1).endMinute).toBe(15);
    const fromStdin = run(['-'], JSON.stringify(valid));
    expect(fromStdin.stdout).toBe(fromFile.stdout);
  }, 60_000);

  it('prints it as a coach reads it with --text: the session line, each phase with its minutes', () => {
    const result = run(['--text', '-'], JSON.stringify(valid));
    expect(result.status).toBe(0);
    const lines = result.stdout.trim().split('\n');
    expect(lines[0]).toMatch(/^U9 beginner match warm-up, 15 min · 5 players/);
    expect(lines.some((line) => /^ {2}\d+–15 min /.test(line))).toBe(true);
    expect(result.stdout).not.toContain('"phases"');
  }, 60_000);

  it('exits 2 and names each bad field on stderr, without a stack trace', () => {
    const bad = {
      ...valid,
      minutes: 2,
      players: [{ id: 'a' }, { name: 'x' }],
      equipment: { ...valid.equipment, cones: -1 },
    };
    const result = run(['-'], JSON.stringify(bad));
    expect(result.status).toBe(2);
    expect(result.stdout).toBe('');
    const lines = result.stderr.trim().split('\n');
    expect(lines).toEqual(
      expect.arrayContaining([
        'minutes: must be >= 5',
        'players/1/id: is required',
        'equipment/cones: must be >= 0',
      ]),
    );
    expect(result.stderr).not.toMatch(/\n\s+at /);
  }, 60_000);

  it('exits 2 on text that is not JSON', () => {
    const result = run(['-'], '{ not json');
    expect(result.status).toBe(2);
    expect(result.stderr).toMatch(/^\(request\): not valid JSON/);
  }, 60_000);
});
