import { copiesToDrop, SNAPSHOT_RETENTION, type StoredCopy } from './snapshot-retention';

const DAY = 24 * 60 * 60 * 1000;
const now = Date.UTC(2025, 8, 20, 18, 0);
const daysAgo = (planId: string, days: number): StoredCopy => ({ planId, savedAt: now - days * DAY });
const none = new Set<string>();

describe('copiesToDrop', () => {
  it('drops copies not saved in the last 14 days and keeps the rest', () => {
    const copies = [daysAgo('fresh', 0), daysAgo('last-week', 7), daysAgo('edge', 14), daysAgo('old', 15)];
    expect(copiesToDrop(copies, { now, queuedPlanIds: none }, SNAPSHOT_RETENTION)).toEqual(['old']);
  });

  it('keeps the 20 newest copies and drops the older ones past that', () => {
    // 25 copies, one every 12 hours: all within the fortnight, so only the count bites.
    const copies = Array.from({ length: 25 }, (_, i) => daysAgo(`p${i}`, i / 2)).reverse();
    const dropped = copiesToDrop(copies, { now, queuedPlanIds: none }, SNAPSHOT_RETENTION);
    expect(dropped.sort()).toEqual(['p20', 'p21', 'p22', 'p23', 'p24']);
  });

  it('makes a place for a plan saved for the first time', () => {
    const copies = Array.from({ length: 20 }, (_, i) => daysAgo(`p${i}`, i / 2));
    const guard = { now, queuedPlanIds: none, keepPlanId: 'new' };
    expect(copiesToDrop(copies, guard, SNAPSHOT_RETENTION)).toEqual(['p19']);
    expect(copiesToDrop(copies, { ...guard, keepPlanId: 'p5' }, SNAPSHOT_RETENTION)).toEqual([]);
  });

  it('never drops a copy with unsent actions or the one being saved, however old', () => {
    const copies = [daysAgo('queued', 40), daysAgo('saving', 30), daysAgo('old', 30)];
    const guard = { now, queuedPlanIds: new Set(['queued']), keepPlanId: 'saving' };
    expect(copiesToDrop(copies, guard, SNAPSHOT_RETENTION)).toEqual(['old']);
  });

  it('counts guarded copies against the limit, so fewer others stay', () => {
    const copies = [daysAgo('a', 1), daysAgo('b', 2), daysAgo('c', 3), daysAgo('queued', 9)];
    const guard = { now, queuedPlanIds: new Set(['queued']), keepPlanId: 'a' };
    expect(copiesToDrop(copies, guard, { ...SNAPSHOT_RETENTION, maxCopies: 3 })).toEqual(['c']);
    // With no room at all, only the guarded copies stay.
    expect(copiesToDrop(copies, guard, { ...SNAPSHOT_RETENTION, maxCopies: 0 }).sort()).toEqual(['b', 'c']);
  });

  it('treats an unreadable or far-future saved time as the oldest', () => {
    const copies = [daysAgo('ok', 1), { planId: 'nan', savedAt: Number.NaN }, daysAgo('future', -30)];
    expect(copiesToDrop(copies, { now, queuedPlanIds: none }, SNAPSHOT_RETENTION).sort()).toEqual([
      'future',
      'nan',
    ]);
    // A clock a few hours fast is not an error.
    expect(copiesToDrop([daysAgo('soon', -0.25)], { now, queuedPlanIds: none }, SNAPSHOT_RETENTION)).toEqual(
      [],
    );
  });
});
