import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { PitchSync, type ServerPlan } from './pitch-sync';

const QUEUE_KEY = 'conewise.pitch-side.queue';
/** Enough of a plan to tell one from another. */
const planOf = (seed: string) => ({ seed, phases: [] });
/** The server's answer to a re-plan or progression (PlanChangeDto): the stored plan and who moved. */
const changeOf = (seed: string, moves: unknown[] = []) => ({
  plan: { id: 'p1', version: 2, plan: planOf(seed) },
  moves,
});

describe('PitchSync', () => {
  beforeEach(() => {
    localStorage.clear();
    TestBed.configureTestingModule({
      providers: [provideHttpClient(), provideHttpClientTesting(), PitchSync],
    });
  });
  afterEach(() => localStorage.clear());

  it('sends a verdict with a client id, kept on the device and counted until the server has it', async () => {
    const sync = TestBed.inject(PitchSync);
    const http = TestBed.inject(HttpTestingController);
    sync.sendVerdict('p1', { phaseIndex: 1, stationId: 's2', verdict: 'too-hard' });
    const request = http.expectOne('/api/plans/p1/progression');
    expect(request.request.body).toMatchObject({ phaseIndex: 1, stationId: 's2', verdict: 'too-hard' });
    expect((request.request.body as { clientId: string }).clientId).toMatch(/^[0-9a-f-]{36}$/);
    expect(sync.pendingCount('p1')).toBe(1);
    expect(sync.pendingCount('p2')).toBe(0);
    expect(sync.verdictQueued('p1', 1, 's2')).toBe(true);
    expect(sync.verdictQueued('p1', 0, 's2')).toBe(false);
    expect(JSON.parse(localStorage.getItem(QUEUE_KEY)!)).toHaveLength(1);
    request.flush(changeOf('stepped'));
    await Promise.resolve();
    await new Promise((resolve) => setTimeout(resolve));
    expect(sync.pendingCount('p1')).toBe(0);
    expect(JSON.parse(localStorage.getItem(QUEUE_KEY)!)).toEqual([]);
  });

  it("gives the server's plan only once no later change of that plan waits on the device", async () => {
    const sync = TestBed.inject(PitchSync);
    const http = TestBed.inject(HttpTestingController);
    const seen: ServerPlan[] = [];
    sync.serverPlans.subscribe((plan) => seen.push(plan));
    sync.sendRosterChange('p1', { add: [{ id: 'f', name: 'F' }], fromMinute: 3 });
    sync.sendRosterChange('p1', { remove: ['a'], fromMinute: 4 });
    expect(sync.waiting('p1')).toBe(true);
    const first = http.expectOne('/api/plans/p1/replan');
    expect(first.request.body).toMatchObject({ add: [{ id: 'f' }], fromMinute: 3 });
    first.flush(changeOf('first'));
    const second = await waitForRequest(http);
    expect(second.request.body).toMatchObject({ remove: ['a'], fromMinute: 4 });
    expect(seen).toEqual([]);
    const move = { playerId: 'a', fromStationId: 's1', toStationId: null, phaseIndex: 1 };
    second.flush(changeOf('second', [move]));
    await new Promise((resolve) => setTimeout(resolve));
    expect(seen).toEqual([{ planId: 'p1', kind: 'replan', plan: planOf('second'), moves: [move] }]);
    expect(sync.waiting('p1')).toBe(false);
  });

  it('sends what an earlier visit left unsent as soon as a screen opens', () => {
    const action = {
      kind: 'feedback',
      clientId: 'c-1',
      planId: 'p1',
      queuedAt: '2031-05-06T18:00:00Z',
      body: { phaseIndex: 0, stationId: 's1', verdict: 'right' },
    };
    localStorage.setItem(QUEUE_KEY, JSON.stringify([action]));
    TestBed.inject(PitchSync);
    const request = TestBed.inject(HttpTestingController).expectOne('/api/plans/p1/feedback');
    expect(request.request.body).toMatchObject({ clientId: 'c-1', verdict: 'right' });
  });
});

/** The queue sends one action at a time: the next goes once the answer before it is handled. */
async function waitForRequest(http: HttpTestingController) {
  for (let i = 0; i < 20; i++) {
    const found = http.match('/api/plans/p1/replan');
    if (found.length) return found[0];
    await new Promise((resolve) => setTimeout(resolve));
  }
  throw new Error('The second re-plan was never sent');
}
