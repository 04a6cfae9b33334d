/**
 * The contributor guide's folder map names every folder of the tree, so a newcomer finds where a
 * behaviour lives from it: each folder two levels down (engine/kinds/, tests/faults/, …) and each
 * folder of the client's core, features and shared parts.
 */
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

const root = new URL('../..', import.meta.url).pathname;
const guide = readFileSync(`${root}DEVELOPERS.md`, 'utf8');
const map = guide.slice(
  guide.indexOf('## Folder map'),
  guide.indexOf('\n## ', guide.indexOf('## Folder map') + 1),
);
const tracked = execFileSync('git', ['ls-files'], { cwd: root, encoding: 'utf8' }).split('\n');

/** Folders holding tracked files, `depth` parts deep, under the given tops. */
function folders(tops: string[], depth: number): string[] {
  const found = new Set<string>();
  for (const file of tracked) {
    const parts = file.split('/');
    if (parts.length > depth && tops.includes(parts[0]!)) found.add(parts.slice(0, depth).join('/') + '/');
  }
  return [...found].sort();
}

describe('the folder map in DEVELOPERS.md', () => {
  it('names every folder two levels down, or a folder inside it', () => {
    const unnamed = folders(['engine', 'shared', 'server', 'tests', 'rules'], 2).filter(
      (folder) => !map.includes(`\`${folder}`),
    );
    expect(unnamed).toEqual([]);
  });

  it('names every folder of the client’s core, features and shared parts', () => {
    const unnamed = folders(['src'], 4)
      .filter((folder) => /^src\/app\/(core|features|shared)\//.test(folder))
      .filter((folder) => !map.includes(`\`${folder.split('/')[3]}`));
    expect(unnamed).toEqual([]);
  });

  it('names only folders that exist', () => {
    const named = [...map.matchAll(/`((?:engine|shared|server|tests|rules|src)\/[^`<]*\/)`/g)].map(
      (m) => m[1]!,
    );
    const missing = named.filter((folder) => !tracked.some((file) => file.startsWith(folder)));
    expect(missing).toEqual([]);
  });
});
