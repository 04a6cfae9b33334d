import {
  forgetDeviceData,
  PAPER_SETTING_KEY,
  PITCH_SIDE_QUEUE_KEY,
  unsentPitchSideChanges,
} from './device-data';

/** A Cache Storage with named caches, as a browser's (jsdom has none). */
function cacheStorage(names: string[]): CacheStorage {
  const live = new Set(names);
  return {
    keys: async () => [...live],
    delete: async (name: string) => live.delete(name),
    has: async (name: string) => live.has(name),
  } as unknown as CacheStorage;
}

describe('device data', () => {
  beforeEach(() => localStorage.clear());

  it('counts pitch-side changes not yet sent, and none when the queue is missing or unreadable', () => {
    expect(unsentPitchSideChanges()).toBe(0);
    localStorage.setItem(PITCH_SIDE_QUEUE_KEY, JSON.stringify([{ planId: 'p1' }, { planId: 'p2' }]));
    expect(unsentPitchSideChanges()).toBe(2);
    localStorage.setItem(PITCH_SIDE_QUEUE_KEY, '{not json');
    expect(unsentPitchSideChanges()).toBe(0);
  });

  it('forgets the session, pitch-side copies and queue and cached API answers, keeping settings and app files', async () => {
    localStorage.setItem('conewise.session', '{"token":"t"}');
    localStorage.setItem('conewise.pitch-side.plan.p1', '{"roster":["Ada K."]}');
    localStorage.setItem('conewise.pitch-side.saved-at', '{"p1":1}');
    localStorage.setItem(PITCH_SIDE_QUEUE_KEY, '[{"planId":"p1"}]');
    localStorage.setItem(PAPER_SETTING_KEY, 'letter');
    localStorage.setItem('another-site-key', 'x');
    const caches = cacheStorage([
      'ngsw:/:1:assets:app:cache',
      'ngsw:/:1:data:api-read:cache',
      'ngsw:/:db:ngsw:/:1:data:api-read:lru',
      'ngsw:/:db:control',
    ]);

    await forgetDeviceData(localStorage, caches);

    const left = Object.keys({ ...localStorage }).sort();
    expect(left).toEqual(['another-site-key', PAPER_SETTING_KEY]);
    expect((await caches.keys()).sort()).toEqual(['ngsw:/:1:assets:app:cache', 'ngsw:/:db:control']);
  });

  it('still clears the device when Cache Storage refuses', async () => {
    localStorage.setItem('conewise.session', '{"token":"t"}');
    const refusing = { keys: () => Promise.reject(new Error('SecurityError')) } as unknown as CacheStorage;
    await expect(forgetDeviceData(localStorage, refusing)).resolves.toBeUndefined();
    expect(localStorage.getItem('conewise.session')).toBeNull();
  });
});
