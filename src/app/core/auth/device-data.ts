/**
 * What Conewise keeps on the device between visits, and forgetting it when someone signs out, so
 * the next person on a shared club tablet finds no roster, plan or pitch-side record.
 *
 * Kept: the session (AuthStore), pitch-side's copies of plans and its queue of changes not yet
 * sent (features/pitch-side), the plan page as last drawn (core/startup/drawn-copy.ts), and the
 * service worker's cache of API answers (ngsw-config.json's data groups). The paper size chosen for printing is a setting of the device and stays.
 */

/** Every key Conewise writes in localStorage starts with this. */
export const DEVICE_KEY_PREFIX = 'conewise.';
/** Pitch-side's changes waiting for a connection (an array), owned by its action queue. */
export const PITCH_SIDE_QUEUE_KEY = `${DEVICE_KEY_PREFIX}pitch-side.queue`;
/** The paper size chosen for printing: a setting of the device rather than anyone's data. */
export const PAPER_SETTING_KEY = `${DEVICE_KEY_PREFIX}paper`;
const DEVICE_SETTINGS = new Set([PAPER_SETTING_KEY]);

/** How many pitch-side changes on this device have not reached the server yet. */
export function unsentPitchSideChanges(storage: Storage | undefined = globalThis.localStorage): number {
  try {
    const parsed: unknown = JSON.parse(storage?.getItem(PITCH_SIDE_QUEUE_KEY) ?? '[]');
    return Array.isArray(parsed) ? parsed.length : 0;
  } catch {
    return 0;
  }
}

/**
 * Removes everything Conewise keeps about people on this device: its localStorage entries other
 * than device settings, and the service worker's cached API answers (its caches for the app's own
 * files stay, so the app still opens offline). Resolves once done; never fails.
 */
export async function forgetDeviceData(
  storage: Storage | undefined = globalThis.localStorage,
  cacheStorage: CacheStorage | undefined = globalThis.caches,
): Promise<void> {
  if (storage) {
    const names: string[] = [];
    for (let i = 0; i < storage.length; i++) {
      const name = storage.key(i);
      if (name?.startsWith(DEVICE_KEY_PREFIX) && !DEVICE_SETTINGS.has(name)) names.push(name);
    }
    for (const name of names) storage.removeItem(name);
  }
  if (!cacheStorage) return;
  try {
    // Angular's service worker names a data group's caches "ngsw:<scope>:…:data:<group>:…".
    const names = await cacheStorage.keys();
    await Promise.all(names.filter((name) => /:data:/.test(name)).map((name) => cacheStorage.delete(name)));
  } catch {
    // Cache Storage can be missing or refused (private windows): nothing was kept there.
  }
}
