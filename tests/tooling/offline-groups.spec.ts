/** The service worker's prefetch list: the shell and the offline screens with all they import. */
import { describe, expect, it } from 'vitest';
import {
  type BuildMetafile,
  chunkOf,
  filesNeededBy,
  prefetchOfflineScreens,
  type ServiceWorkerManifest,
} from '../../server/build/offline-groups';

/** A build shaped like ng build's: main imports two shared chunks, screens are lazy. */
function metafile(): BuildMetafile {
  return {
    outputs: {
      'main-AAAA0001.js': {
        entryPoint: 'src/main.ts',
        imports: [
          { path: 'chunk-CORE0001.js', kind: 'import-statement' },
          { path: 'chunk-SHEL0001.js', kind: 'dynamic-import' },
          { path: 'chunk-PLAN0001.js', kind: 'dynamic-import' },
          { path: 'chunk-SIDE0001.js', kind: 'dynamic-import' },
          { path: 'chunk-TEAM0001.js', kind: 'dynamic-import' },
          { path: 'chunk-ICON0001.js', kind: 'dynamic-import' },
        ],
      },
      'chunk-ICON0001.js': { entryPoint: 'src/app/core/icons/generated/icon-svgs.ts', imports: [] },
      'chunk-CORE0001.js': { imports: [] },
      // The signed-in frame, which opens the account menu's dialogs on demand.
      'chunk-SHEL0001.js': {
        entryPoint: 'src/app/core/layout/shell.ts',
        imports: [
          { path: 'chunk-CORE0001.js', kind: 'import-statement' },
          { path: 'chunk-DLGS0001.js', kind: 'dynamic-import' },
        ],
      },
      'chunk-DLGS0001.js': { entryPoint: 'src/app/core/auth/account-dialogs.ts', imports: [] },
      'chunk-PLAN0001.js': {
        entryPoint: 'src/app/features/plans/plan-page.ts',
        imports: [
          { path: 'chunk-CORE0001.js', kind: 'import-statement' },
          { path: 'chunk-CARD0001.js', kind: 'import-statement' },
          { path: 'chunk-ENGN0001.js', kind: 'dynamic-import' },
        ],
      },
      'chunk-SIDE0001.js': {
        entryPoint: 'src/app/features/pitch-side/pitch-side-page.ts',
        imports: [{ path: 'chunk-CARD0001.js', kind: 'import-statement' }],
      },
      'chunk-CARD0001.js': { imports: [] },
      'chunk-ENGN0001.js': {
        entryPoint: 'engine/index.ts',
        imports: [{ path: 'chunk-RULE0001.js', kind: 'dynamic-import' }],
      },
      'chunk-RULE0001.js': { entryPoint: 'engine/rule-sets.ts', imports: [] },
      'chunk-TEAM0001.js': {
        entryPoint: 'src/app/features/teams/team-page.ts',
        imports: [{ path: 'chunk-CHRT0001.js', kind: 'import-statement' }],
      },
      'chunk-CHRT0001.js': { imports: [] },
    },
  };
}

function manifest(): ServiceWorkerManifest {
  return {
    configVersion: 1,
    assetGroups: [
      { name: 'app', installMode: 'prefetch', urls: ['/index.html', '/main-AAAA0001.js'] },
      {
        name: 'screens',
        installMode: 'lazy',
        urls: Object.keys(metafile().outputs)
          .filter((f) => f.startsWith('chunk-'))
          .map((f) => `/${f}`),
      },
    ],
  };
}

describe('the service worker prefetch list', () => {
  it('follows static imports only for the shell, dynamic ones too for the offline screens', () => {
    expect([...filesNeededBy(metafile(), ['src/main.ts'], 'static')].sort()).toEqual([
      '/chunk-CORE0001.js',
      '/main-AAAA0001.js',
    ]);
    expect(
      [...filesNeededBy(metafile(), ['src/app/features/plans/plan-page.ts'], 'static-and-dynamic')].sort(),
    ).toEqual([
      '/chunk-CARD0001.js',
      '/chunk-CORE0001.js',
      '/chunk-ENGN0001.js',
      '/chunk-PLAN0001.js',
      '/chunk-RULE0001.js',
    ]);
  });

  it('moves the shell and its dialogs, the plan page, pitch-side, the engine and the icons into the prefetched group and leaves other screens lazy', () => {
    const { manifest: tuned, moved } = prefetchOfflineScreens(manifest(), metafile());
    const [app, screens] = tuned.assetGroups;
    expect(app!.urls).toEqual([
      '/chunk-CARD0001.js',
      '/chunk-CORE0001.js',
      '/chunk-DLGS0001.js',
      '/chunk-ENGN0001.js',
      '/chunk-ICON0001.js',
      '/chunk-PLAN0001.js',
      '/chunk-RULE0001.js',
      '/chunk-SHEL0001.js',
      '/chunk-SIDE0001.js',
      '/index.html',
      '/main-AAAA0001.js',
    ]);
    expect(screens!.urls.sort()).toEqual(['/chunk-CHRT0001.js', '/chunk-TEAM0001.js']);
    expect(moved).toBe(9);
  });

  it('refuses a build where no chunk holds an offline screen', () => {
    const meta = metafile();
    delete meta.outputs['chunk-SIDE0001.js']!.entryPoint;
    expect(() => prefetchOfflineScreens(manifest(), meta)).toThrow(/pitch-side-page\.ts/);
  });

  it("after the chunk optimizer, finds a lazy screen by the source it holds and does not follow the app's route table", () => {
    // Angular's chunk optimizer (NG_BUILD_OPTIMIZE_CHUNKS) merges the shared code into main, which
    // the screens then import; only main keeps its entry point, the others are known by their inputs.
    const meta: BuildMetafile = {
      outputs: {
        'main-AAAA0002.js': {
          entryPoint: 'src/main.ts',
          inputs: { 'src/main.ts': {}, 'src/app/app.routes.ts': {} },
          imports: [
            { path: 'chunk-PLAN0002.js', kind: 'dynamic-import' },
            { path: 'chunk-TEAM0002.js', kind: 'dynamic-import' },
          ],
        },
        'chunk-PLAN0002.js': {
          inputs: { 'src/app/features/plans/plan-page.ts': {}, 'src/app/features/plans/plan-session.ts': {} },
          imports: [
            { path: 'main-AAAA0002.js', kind: 'import-statement' },
            { path: 'chunk-ENGN0002.js', kind: 'dynamic-import' },
          ],
        },
        'chunk-PLAN0002.js.map': { inputs: { 'src/app/features/plans/plan-page.ts': {} } },
        'chunk-ENGN0002.js': { inputs: { 'engine/index.ts': {} }, imports: [] },
        'chunk-TEAM0002.js': { inputs: { 'src/app/features/teams/team-page.ts': {} }, imports: [] },
      },
    };
    expect(chunkOf(meta, 'src/app/features/plans/plan-page.ts')).toBe('chunk-PLAN0002.js');
    expect(chunkOf(meta, 'src/main.ts')).toBe('main-AAAA0002.js');
    expect(chunkOf(meta, 'src/app/features/status/status-page.ts')).toBeUndefined();
    expect(
      [...filesNeededBy(meta, ['src/app/features/plans/plan-page.ts'], 'static-and-dynamic')].sort(),
    ).toEqual(['/chunk-ENGN0002.js', '/chunk-PLAN0002.js', '/main-AAAA0002.js']);
  });
});
