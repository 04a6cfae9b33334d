import type { SessionPlanDto } from '../../../../../shared/types';
import { STOPPED_CLOCK } from './phase-clock';
import { PlanSnapshot, type PitchSnapshot } from './plan-snapshot';

const DAY = 24 * 60 * 60 * 1000;
const now = Date.UTC(2025, 8, 20, 18, 0);

/** A snapshot PlanSnapshot reads back; `padding` makes it take that many characters more. */
function snapshot(planId: string, padding = 0): PitchSnapshot {
  return {
    session: { id: planId, plan: { phases: [] } } as unknown as SessionPlanDto,
    roster: [],
    clock: STOPPED_CLOCK,
    verdicts: padding ? { padding: 'x'.repeat(padding) } : {},
  };
}

function queueActionFor(planId: string): void {
  const action = { kind: 'feedback', clientId: `c-${planId}`, planId, queuedAt: '', body: {} };
  localStorage.setItem('conewise.pitch-side.queue', JSON.stringify([action]));
}

const copiesOnDevice = () =>
  Object.keys(localStorage)
    .filter((name) => name.startsWith('conewise.pitch-side.plan.'))
    .map((name) => name.slice('conewise.pitch-side.plan.'.length))
    .sort();

describe('PlanSnapshot', () => {
  const snapshots = new PlanSnapshot();
  beforeEach(() => localStorage.clear());
  afterAll(() => localStorage.clear());

  it('drops copies of other plans not saved for 14 days, unless they still have unsent actions', () => {
    snapshots.save('old', snapshot('old'), now - 20 * DAY);
    snapshots.save('old-queued', snapshot('old-queued'), now - 20 * DAY);
    snapshots.save('recent', snapshot('recent'), now - 10 * DAY);
    queueActionFor('old-queued');

    snapshots.save('today', snapshot('today'), now);

    expect(copiesOnDevice()).toEqual(['old-queued', 'recent', 'today']);
    expect(snapshots.read('old')).toBeNull();
    expect(snapshots.read('recent')?.session.id).toBe('recent');
  });

  it('keeps the 20 most recently saved copies', () => {
    for (let i = 0; i < 23; i++) snapshots.save(`p${i}`, snapshot(`p${i}`), now + i * 60_000);
    expect(copiesOnDevice()).toHaveLength(20);
    expect(copiesOnDevice()).not.toContain('p0');
    expect(copiesOnDevice()).not.toContain('p2');
    expect(copiesOnDevice()).toContain('p3');

    // Saving an older plan again makes it the newest: the next one out is the least recently saved.
    snapshots.save('p3', snapshot('p3'), now + 30 * 60_000);
    snapshots.save('p23', snapshot('p23'), now + 31 * 60_000);
    expect(copiesOnDevice()).toContain('p3');
    expect(copiesOnDevice()).not.toContain('p4');
  });

  it('gives a copy saved before saved times were kept a fresh fortnight', () => {
    localStorage.setItem('conewise.pitch-side.plan.legacy', JSON.stringify(snapshot('legacy')));
    snapshots.save('a', snapshot('a'), now);
    expect(copiesOnDevice()).toEqual(['a', 'legacy']);
    snapshots.save('b', snapshot('b'), now + 15 * DAY);
    expect(copiesOnDevice()).toEqual(['b']);
  });

  it('makes room when the storage is full and saves on the second try', () => {
    // jsdom allows 5,000,000 characters: three 1.4M copies leave too little room for a 1.5M one.
    snapshots.save('queued', snapshot('queued', 1_400_000), now - DAY);
    snapshots.save('other-1', snapshot('other-1', 1_400_000), now - DAY);
    snapshots.save('other-2', snapshot('other-2', 1_400_000), now - DAY);
    queueActionFor('queued');
    expect(copiesOnDevice()).toEqual(['other-1', 'other-2', 'queued']);

    expect(() => snapshots.save('big', snapshot('big', 1_500_000), now)).not.toThrow();

    expect(snapshots.read('big')?.session.id).toBe('big');
    expect(copiesOnDevice()).toEqual(['big', 'queued']);
  });

  it('gives up quietly when even the room made is not enough, keeping copies with unsent actions', () => {
    snapshots.save('queued', snapshot('queued', 1_000_000), now - DAY);
    queueActionFor('queued');

    expect(() => snapshots.save('huge', snapshot('huge', 4_500_000), now)).not.toThrow();

    expect(snapshots.read('huge')).toBeNull();
    expect(snapshots.read('queued')?.session.id).toBe('queued');
  });
});
