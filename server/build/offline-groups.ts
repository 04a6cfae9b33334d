/**
 * Which built files the service worker fetches on install, and which it keeps only once used.
 *
 * Angular's ngsw-config.json chooses by file-name pattern, but a build's chunks are named by hash,
 * so the config alone cannot say "the plan page and pitch-side, and everything they import".
 * After `ng build --stats-json`, this reads esbuild's metafile (dist/conewise/stats.json) and
 * moves into the prefetched group every chunk the app shell, the plan page and pitch-side need,
 * through static imports and the dynamic ones they make (the engine, for re-planning offline).
 * Every other screen stays in the lazy group: cached the first time a coach opens it.
 */

/** Screens a coach needs at the pitch with no signal, by their source file. */
export const OFFLINE_SCREENS = [
  // The signed-in frame around the plan page, and what its account menu opens (signing out).
  'src/app/core/layout/shell.ts',
  'src/app/features/plans/plan-page.ts',
  'src/app/features/pitch-side/pitch-side-page.ts',
  // The icons, loaded on first use by the icon registry (src/app/core/icons/provide-icons.ts).
  'src/app/core/icons/generated/icon-svgs.ts',
] as const;

/** The app's entry point: its static imports make the app shell. */
export const APP_ENTRY = 'src/main.ts';

/** The parts of esbuild's metafile read here. */
export interface BuildMetafile {
  outputs: Record<
    string,
    {
      entryPoint?: string;
      inputs?: Record<string, unknown>;
      imports?: { path: string; kind: string; external?: boolean }[];
    }
  >;
}

/**
 * The built chunk that starts `entry` (a source file). esbuild names it as the chunk's entry
 * point; after Angular's chunk optimizer (NG_BUILD_OPTIMIZE_CHUNKS, server/client-build.ts) only
 * the app's entry keeps that name, and a lazy screen's chunk is the one holding its source file.
 */
export function chunkOf(meta: BuildMetafile, entry: string): string | undefined {
  const outputs = Object.entries(meta.outputs);
  return (
    outputs.find(([, output]) => output.entryPoint === entry)?.[0] ??
    outputs.find(([file, output]) => file.endsWith('.js') && output.inputs && entry in output.inputs)?.[0]
  );
}

/** The parts of ngsw.json read and written here. */
export interface ServiceWorkerManifest {
  assetGroups: { name: string; installMode: 'prefetch' | 'lazy'; urls: string[] }[];
  [key: string]: unknown;
}

/** Built files (as URLs, e.g. "/chunk-AB12CD34.js") needed to run `entries`. */
export function filesNeededBy(
  meta: BuildMetafile,
  entries: readonly string[],
  follow: 'static' | 'static-and-dynamic',
): Set<string> {
  const needed = new Set<string>();
  const pending: string[] = [];
  for (const entry of entries) {
    const file = chunkOf(meta, entry);
    if (!file) throw new Error(`the build has no chunk for ${entry}: is it still lazy-loaded?`);
    pending.push(file);
  }
  // Screens import shared code from the app's own chunk once the chunk optimizer has merged it
  // there; its dynamic imports are the route table (every screen), not what a screen needs.
  const app = chunkOf(meta, APP_ENTRY);
  while (pending.length) {
    const file = pending.pop()!;
    if (needed.has(file)) continue;
    needed.add(file);
    for (const imported of meta.outputs[file]?.imports ?? []) {
      if (imported.external) continue;
      if (
        imported.kind === 'import-statement' ||
        (follow === 'static-and-dynamic' && imported.kind === 'dynamic-import' && file !== app)
      ) {
        pending.push(imported.path);
      }
    }
  }
  return new Set([...needed].map((file) => `/${file}`));
}

/**
 * Moves the shell's and the offline screens' files from the lazy group `lazyGroup` into the
 * prefetched group `prefetchGroup`. Returns the manifest changed and the number of files moved.
 */
export function prefetchOfflineScreens(
  manifest: ServiceWorkerManifest,
  meta: BuildMetafile,
  prefetchGroup = 'app',
  lazyGroup = 'screens',
): { manifest: ServiceWorkerManifest; moved: number } {
  const prefetch = manifest.assetGroups.find((g) => g.name === prefetchGroup && g.installMode === 'prefetch');
  const lazy = manifest.assetGroups.find((g) => g.name === lazyGroup && g.installMode === 'lazy');
  if (!prefetch || !lazy)
    throw new Error(`ngsw.json needs a prefetch group "${prefetchGroup}" and a lazy group "${lazyGroup}"`);
  const wanted = new Set([
    ...filesNeededBy(meta, [APP_ENTRY], 'static'),
    ...filesNeededBy(meta, OFFLINE_SCREENS, 'static-and-dynamic'),
  ]);
  const moving = lazy.urls.filter((url) => wanted.has(url));
  lazy.urls = lazy.urls.filter((url) => !wanted.has(url));
  prefetch.urls = [...prefetch.urls, ...moving].sort();
  return { manifest, moved: moving.length };
}
