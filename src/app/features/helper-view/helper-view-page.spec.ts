import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { provideRouter } from '@angular/router';
import { generatePlan } from '../../../../engine/index';
import type { HelperViewDto, Plan, PlanRequest } from '../../../../shared/types';
import { DEFAULT_UNITS, type Units } from '../../../../shared/units';
import { AuthStore } from '../../core/auth/auth-store';
import { METRIC_WORDS, signInReading, YARDS_AND_FAHRENHEIT } from '../../core/units/units.testing';
import { HelperViewPage } from './helper-view-page';

const TOKEN = 'A'.repeat(20) + '_-' + 'b'.repeat(21);
const FIRST = ['Ada', 'Ben', 'Cleo', 'Dev', 'Edie', 'Finn', 'Gia', 'Hal'];

const REQUEST: PlanRequest = {
  ageGroup: 'U10',
  level: 'intermediate',
  players: FIRST.map((_, i) => ({ id: `h${i + 1}` })),
  coaches: 2,
  equipment: { balls: 10, cones: 30, bibs: 8, goals: 2 },
  space: { width: 36, length: 44 },
  minutes: 20,
  kind: 'match-warm-up',
  seed: 'meadow-larks',
};

/** What GET /api/helper-view answers: the plan's phases with stand-in ids and first names. */
function view(plan: Plan, units: Units = DEFAULT_UNITS): HelperViewDto {
  return {
    teamName: 'Meadow Larks U10',
    kind: 'match-warm-up',
    date: '2026-12-08',
    kickOff: '18:00',
    minutes: 20,
    playerCount: FIRST.length,
    phases: plan.phases,
    cautions: plan.cautions,
    names: Object.fromEntries(FIRST.map((name, i) => [`h${i + 1}`, name])),
    expiresAt: '2026-12-09T23:00:00.000Z',
    units,
  };
}

const settle = async (fixture: { whenStable(): Promise<unknown>; detectChanges(): void }) => {
  for (let i = 0; i < 10; i++) await new Promise((resolve) => setTimeout(resolve, 10));
  await fixture.whenStable();
  fixture.detectChanges();
};

describe('HelperViewPage', () => {
  let plan: Plan;

  beforeAll(async () => {
    plan = await generatePlan(REQUEST);
  });
  afterEach(() => {
    sessionStorage.clear();
    window.location.hash = '';
    vi.restoreAllMocks();
  });

  function setUp() {
    TestBed.configureTestingModule({
      imports: [HelperViewPage],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([]),
        provideNoopAnimations(),
      ],
    });
    const fixture = TestBed.createComponent(HelperViewPage);
    const http = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
    return { fixture, http, root: fixture.nativeElement as HTMLElement };
  }

  it('sends the token from the fragment in a header and shows the plan read-only with first names', async () => {
    vi.spyOn(navigator, 'language', 'get').mockReturnValue('en-GB');
    window.location.hash = `#${TOKEN}`;
    const { fixture, http, root } = setUp();
    const request = http.expectOne('/api/helper-view');
    expect(request.request.headers.get('Helper-Token')).toBe(TOKEN);
    expect(request.request.urlWithParams).not.toContain(TOKEN);
    request.flush(view(plan));
    await settle(fixture);

    expect(root.querySelector('h1')!.textContent).toContain('Meadow Larks U10');
    expect(root.textContent).toContain('Tuesday 8 December, kick-off 18:00');
    const cards = root.querySelectorAll('cw-station-card');
    expect(cards.length).toBe(plan.phases.reduce((n, p) => n + p.stations.length, 0));
    const grouped = plan.phases[0]!.stations.flatMap((s) => s.playerIds);
    for (const id of grouped) expect(root.textContent).toContain(FIRST[Number(id.slice(1)) - 1]!);
    // Read-only: no move menus, area steps or drag handles; every station's details open.
    expect(root.querySelectorAll('cw-station-card button').length).toBe(0);
    expect(root.querySelector('.cdk-drag:not(.cdk-drag-disabled)')).toBeNull();
    for (const details of Array.from(
      root.querySelectorAll<HTMLDetailsElement>('[data-testid="station-details"]'),
    ))
      expect(details.open).toBe(true);
    expect(root.querySelector('[data-testid="cautions"]')).not.toBeNull();
    expect(document.querySelector('meta[name="robots"]')!.getAttribute('content')).toContain('noindex');
  });

  it('reads in the units the link carries (yards), not those of whoever is signed in on the phone', async () => {
    window.location.hash = `#${TOKEN}`;
    const { fixture, http, root } = setUp();
    // Someone signed in on this phone reads metres: the link's units still win.
    signInReading(TestBed.inject(AuthStore), DEFAULT_UNITS);
    http.expectOne('/api/helper-view').flush(view(plan, YARDS_AND_FAHRENHEIT));
    await settle(fixture);

    const cards = Array.from(root.querySelectorAll('cw-station-card'));
    expect(cards.length).toBeGreaterThan(0);
    // The engine's steps ("Area 14 m → 16 m") and every size read in yards.
    const steps = root.textContent!.match(/Area [^\n]*yd/g) ?? [];
    expect(steps.length).toBeGreaterThan(0);
    expect(root.querySelector('[data-testid="station-kind"]')!.textContent).toMatch(/\d+ × \d+ yd/);
    expect(root.querySelector('cw-station-diagram svg[role=img]')!.getAttribute('aria-label')).toMatch(
      / in \d+ × \d+ yd/,
    );
    expect(root.textContent).not.toMatch(METRIC_WORDS);
    localStorage.clear();
  });

  it('reads metres when the link says metres', async () => {
    window.location.hash = `#${TOKEN}`;
    const { fixture, http, root } = setUp();
    http.expectOne('/api/helper-view').flush(view(plan));
    await settle(fixture);
    expect(root.textContent).toMatch(/Area \d+ (× \d+ )?m →/);
    expect(root.textContent).not.toContain(' yd');
  });

  it('keeps the token for the tab when a timeline tap has replaced the fragment', async () => {
    sessionStorage.setItem('conewise.helper-token', TOKEN);
    window.location.hash = '#phase-2';
    const { http } = setUp();
    expect(http.expectOne('/api/helper-view').request.headers.get('Helper-Token')).toBe(TOKEN);
  });

  it('says in plain words that a stopped link no longer works', async () => {
    window.location.hash = `#${TOKEN}`;
    const { fixture, http, root } = setUp();
    http.expectOne('/api/helper-view').flush(
      {
        type: '/problems/helper-link-ended',
        title: 'Helper link ended',
        status: 410,
        detail: 'The coach has stopped this link. Ask them for a new one if you are still helping.',
      },
      { status: 410, statusText: 'Gone' },
    );
    await settle(fixture);
    const ended = root.querySelector('[data-testid="helper-link-ended"]')!;
    expect(ended.textContent).toContain('This link no longer works');
    expect(ended.textContent).toContain('The coach has stopped this link.');
    expect(root.querySelector('cw-station-card')).toBeNull();
  });

  it('asks for the whole link when the address has no token', async () => {
    const { fixture, http, root } = setUp();
    http.expectNone('/api/helper-view');
    await settle(fixture);
    expect(root.textContent).toContain('This link is not complete');
  });

  it('starts a training session at its start time, in a US reader’s words and 12-hour clock', async () => {
    vi.spyOn(navigator, 'language', 'get').mockReturnValue('en-US');
    window.location.hash = `#${TOKEN}`;
    const { fixture, http, root } = setUp();
    http.expectOne('/api/helper-view').flush({ ...view(plan), kind: 'training' });
    await settle(fixture);
    const text = root.textContent!.replace(/[\u202f\u00a0]/g, ' ');
    expect(text).toContain('Tuesday, December 8, start 6:00 PM');
    // Minute 0 is the start time: the first phase of a training session starts at 6:00 PM.
    const firstClock = root
      .querySelector('cw-phase-timeline .cw-clock')!
      .textContent!.replace(/[\u202f\u00a0]/g, ' ');
    expect(firstClock.trim()).toBe('6:00 PM');
  });
});
