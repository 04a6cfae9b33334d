import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { KitBagDto, TeamDto } from '../../../../shared/types';
import defaultRules from '../../../../rules/default-rule-set.json';
import { RuleTryIt } from './rule-try-it';
import { AuthStore } from '../../core/auth/auth-store';
import { METRIC_WORDS, signInReading, YARDS_AND_FAHRENHEIT } from '../../core/units/units.testing';

const team = (over: Partial<TeamDto>): TeamDto => ({
  id: 't1',
  name: 'Harbour Herons U9',
  ageGroup: 'U9',
  level: 'beginner',
  usualSpace: { width: 30, length: 36 },
  coachIds: ['u1'],
  playerCount: 9,
  pinnedActivityIds: [],
  ...over,
});
const herons = team({});
const otters = team({
  id: 't2',
  name: 'Millbrook Otters U13',
  ageGroup: 'U13',
  level: 'advanced',
  usualSpace: { width: 50, length: 64 },
  playerCount: 15,
});
const heronsKit: KitBagDto = { balls: 7, cones: 16, bibs: 8, goals: 0 };

describe('RuleTryIt', () => {
  function setUp(teams: TeamDto[], yards = false) {
    TestBed.configureTestingModule({
      imports: [RuleTryIt],
      providers: [provideHttpClient(), provideHttpClientTesting()],
    });
    if (yards) signInReading(TestBed.inject(AuthStore), YARDS_AND_FAHRENHEIT, 'lead');
    const fixture = TestBed.createComponent(RuleTryIt);
    fixture.componentRef.setInput('draftBody', structuredClone(defaultRules));
    const http = TestBed.inject(HttpTestingController);
    http.expectOne('/api/teams').flush(teams);
    const el = fixture.nativeElement as HTMLElement;
    const select = (label: string) =>
      Array.from(el.querySelectorAll('label'))
        .find((l) => l.textContent?.trim().startsWith(label))
        ?.querySelector('select') ?? null;
    const labels = () =>
      Array.from(el.querySelectorAll('[data-testid=try-result] h3')).map((h) => h.textContent);
    /** Clicks Run, answers the club's recent plans with none, and waits for the results. */
    const run = async (count: number, kit?: { teamId: string; body: KitBagDto | 'fails' }) => {
      (el.querySelector('[data-testid=try-run]') as HTMLButtonElement).click();
      const kitRequest = kit && http.expectOne(`/api/teams/${kit.teamId}/kit`);
      if (kit?.body === 'fails') kitRequest?.flush(null, { status: 503, statusText: 'Unavailable' });
      else if (kit) kitRequest?.flush(kit.body);
      http.expectOne((req) => req.url === '/api/plans').flush([]);
      await expect
        // Twelve or so plans made in jsdom: allow a slow machine its time.
        .poll(
          async () => {
            await fixture.whenStable();
            return labels().length;
          },
          { timeout: 20_000 },
        )
        .toBe(count);
    };
    return { fixture, http, el, select, labels, run };
  }

  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it("starts from the club's first team: its age and level, and the team as usual with its own kit", async () => {
    const { fixture, el, select, labels, run } = setUp([herons, otters]);
    await fixture.whenStable();
    expect(select('Team')?.value).toBe('t1');
    expect(select('Age group')?.value).toBe('U9');
    expect(select('Level')?.value).toBe('beginner');
    expect(el.querySelector('[data-testid=try-team-summary]')?.textContent).toContain(
      'U9 beginner, 9 active players on 30 × 36 m',
    );

    await run(6, { teamId: 't1', body: heronsKit });
    expect(labels()[0]).toContain('Harbour Herons U9 as usual (9 players on 30 × 36 m, 7 balls, 0 goals)');
    // The five sample squads follow, now of the team's age and level.
    expect(labels()[1]).toContain('Small squad (5)');
    // Every one of the team's nine players is placed in each phase of its plan.
    const groups = el.querySelector('[data-testid=try-result] tbody tr td')?.textContent ?? '';
    const phases = groups.split('\n').filter((line) => line.includes(':'));
    expect(phases.length).toBeGreaterThan(0);
    for (const line of phases) {
      const placed = (line.split(':')[1].match(/\d+/g) ?? []).map(Number).reduce((a, b) => a + b, 0);
      expect(placed, line).toBe(9);
    }
  });

  it('puts the team, the squads and every area in yards for a head of coaching who reads yards', async () => {
    const { fixture, el, labels, run } = setUp([herons], true);
    await fixture.whenStable();
    // 30 × 36 m is 33 × 39 yd.
    expect(el.querySelector('[data-testid=try-team-summary]')?.textContent).toContain(
      'players on 33 × 39 yd',
    );
    await run(6, { teamId: 't1', body: heronsKit });
    expect(labels()[0]).toContain('(9 players on 33 × 39 yd, 7 balls, 0 goals)');
    // 15 × 20 m is 16 × 22 yd.
    expect(labels().some((l) => l?.includes('Tiny space (12 on 16 × 22 yd)'))).toBe(true);
    const areas = Array.from(el.querySelectorAll('[data-testid=try-result] tbody tr:nth-child(2) td'));
    expect(areas.length).toBeGreaterThan(0);
    for (const cell of areas) expect(cell.textContent).toMatch(/\d+ × \d+ yd/);
    expect(el.textContent).not.toMatch(METRIC_WORDS);
    localStorage.clear();
  });

  it("switches to another of the club's teams from the selector", async () => {
    const { fixture, select, labels, run } = setUp([herons, otters]);
    await fixture.whenStable();
    const teamSelect = select('Team')!;
    teamSelect.value = 't2';
    teamSelect.dispatchEvent(new Event('change'));
    await fixture.whenStable();
    expect(select('Age group')?.value).toBe('U13');
    expect(select('Level')?.value).toBe('advanced');

    await run(6, { teamId: 't2', body: { balls: 16, cones: 30, bibs: 10, goals: 2 } });
    expect(labels()[0]).toContain(
      'Millbrook Otters U13 as usual (15 players on 50 × 64 m, 16 balls, 2 goals)',
    );
  });

  it('falls back to the U10 intermediate sample squads when the club has no team', async () => {
    const { fixture, el, select, labels, run } = setUp([]);
    await fixture.whenStable();
    expect(select('Team')).toBeNull();
    expect(select('Age group')?.value).toBe('U10');
    expect(select('Level')?.value).toBe('intermediate');
    expect(el.querySelector('[data-testid=try-team-summary]')).toBeNull();

    // No kit bag is asked for: only the five sample squads run.
    await run(5);
    expect(labels()[0]).toContain('Small squad (5)');
    expect(labels().some((label) => label?.includes('as usual'))).toBe(false);
  });

  it('tries only the sample squads for a team with no active players', async () => {
    const { fixture, el, labels, run } = setUp([team({ playerCount: 0 })]);
    await fixture.whenStable();
    expect(el.querySelector('[data-testid=try-team-summary]')?.textContent).toContain(
      'no active players yet',
    );
    await run(5, { teamId: 't1', body: heronsKit });
    expect(labels().some((label) => label?.includes('as usual'))).toBe(false);
  });

  it("still runs the sample squads when the team's kit bag cannot be read, and says so", async () => {
    const { fixture, el, labels, run } = setUp([herons]);
    await fixture.whenStable();
    await run(5, { teamId: 't1', body: 'fails' });
    expect(labels()[0]).toContain('Small squad (5)');
    expect(el.querySelector('[role=alert]')?.textContent).toContain(
      'Harbour Herons U9 was left out because its kit bag could not be read.',
    );
  });
});
