import { vi } from 'vitest';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { applyProgression, generatePlan, progressionOutcome, replan } from '../../../../engine/index';
import type { Plan, SessionPlanDto, Station, StationVerdict } from '../../../../shared/types';
import { PitchSidePage } from './pitch-side-page';
import { inUnitsText } from '../../../../shared/units';
import { AuthStore } from '../../core/auth/auth-store';
import { METRIC_WORDS, signInReading, YARDS_AND_FAHRENHEIT } from '../../core/units/units.testing';

const station = (id: string, title: string, playerIds: string[], width = 10): Station => ({
  id,
  activityId: title,
  activityKind: 'keep-ball',
  title,
  playerIds,
  coachJoins: 0,
  roles: { defenders: [playerIds[0]] },
  area: { width, length: width },
  position: { x: 0, y: 0 },
  equipment: { balls: 1, cones: 4, bibs: 1, goals: 0 },
  conePositions: [],
  positions: playerIds.map((pid, i) => ({ id: pid, role: i === 0 ? 'defender' : 'attacker', x: i, y: i })),
  progressions: { easier: ['area 10 → 12 m'], harder: ['area 10 → 8 m'] },
  coachingPoints: [],
  description: '',
});

const plan: Plan = {
  request: {
    ageGroup: 'U10',
    level: 'beginner',
    players: ['a', 'b', 'c', 'd', 'e'].map((id) => ({ id, name: id.toUpperCase() })),
    coaches: 1,
    equipment: { balls: 6, cones: 20, bibs: 6, goals: 0 },
    space: { width: 30, length: 30 },
    minutes: 10,
    kind: 'match-warm-up',
  },
  phases: [
    {
      name: 'Rondo start',
      activityId: 'r',
      activityKind: 'keep-ball',
      startMinute: 0,
      endMinute: 6,
      stations: [station('s1', 'Square one', ['a', 'b', 'c', 'd', 'e'])],
    },
    {
      name: 'Second go',
      activityId: 'r',
      activityKind: 'keep-ball',
      startMinute: 6,
      endMinute: 10,
      stations: [station('s2', 'Square two', ['a', 'b', 'c', 'd', 'e'])],
    },
  ],
  equipmentNeeded: { balls: 1, cones: 4, bibs: 1, goals: 0 },
  equipmentAvailable: { balls: 6, cones: 20, bibs: 6, goals: 0 },
  touches: {},
  activeShare: 0.8,
  warnings: [],
  cautions: [{ code: 'conditions', message: 'The coach judges the weather and the ground.' }],
  trace: [],
  ruleSet: { id: 'rs1', version: 1 },
  seed: 'x',
};

const session = { id: 'p1', teamId: 't1', teamName: 'U10 Kites', plan, ruleSetId: 'rs1' } as SessionPlanDto;

describe('PitchSidePage', () => {
  /** The units of the coach signed in for a test (none: nobody signed in, metres and °C). */
  let reader: typeof YARDS_AND_FAHRENHEIT | null = null;
  beforeEach(() => {
    localStorage.clear();
    reader = null;
  });

  function setUp() {
    TestBed.configureTestingModule({
      imports: [PitchSidePage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
    if (reader) signInReading(TestBed.inject(AuthStore), reader);
    const fixture = TestBed.createComponent(PitchSidePage);
    fixture.componentRef.setInput('planId', 'p1');
    fixture.detectChanges();
    const http = TestBed.inject(HttpTestingController);
    const el = fixture.nativeElement as HTMLElement;
    const button = (selector: string) => el.querySelector(selector) as HTMLButtonElement;
    const settle = async () => {
      await fixture.whenStable();
      fixture.detectChanges();
    };
    return { fixture, http, el, button, settle };
  }

  async function opened(opened: SessionPlanDto = session) {
    const t = setUp();
    t.http.expectOne('/api/plans/p1').flush(opened);
    t.http.expectOne('/api/teams/t1/players').flush([
      ...['a', 'b', 'c', 'd', 'e'].map((id) => ({
        id,
        teamId: 't1',
        displayName: id.toUpperCase(),
        goalkeeper: false,
        active: true,
      })),
      { id: 'f', teamId: 't1', displayName: 'Fen Q.', goalkeeper: false, active: true },
    ]);
    t.http.expectOne('/api/rule-sets/rs1').flush({ id: 'rs1', body: null });
    await t.settle();
    return t;
  }

  it('shows the current phase with its countdown, the next phase and the station group', async () => {
    const { el } = await opened();
    expect(el.querySelector('#current-phase-name')?.textContent).toContain('Rondo start');
    expect(el.querySelector('[data-testid=countdown]')?.textContent?.trim()).toBe('6:00');
    expect(el.textContent).toContain('Next: Second go at minute 6');
    expect(el.querySelector('cw-station-card')?.textContent).toContain('Square one');
    expect(el.textContent).toContain('Fen Q.');
  });

  it('records a verdict with a client id, and replays the same id after the network returns', async () => {
    const { http, el, button, settle } = await opened();
    button('[data-verdict=too-easy]').click();
    const first = http.expectOne('/api/plans/p1/progression');
    const sent = first.request.body as {
      clientId: string;
      verdict: string;
      stationId: string;
      phaseIndex: number;
    };
    expect(sent).toMatchObject({ verdict: 'too-easy', stationId: 's1', phaseIndex: 0 });
    expect(sent.clientId).toMatch(/^[0-9a-f-]{36}$/);
    first.error(new ProgressEvent('error'), { status: 0 });
    await settle();
    expect(el.querySelector('[data-testid=offline-badge]')?.textContent).toContain('1 queued');
    expect(JSON.parse(localStorage.getItem('conewise.pitch-side.queue')!)).toHaveLength(1);

    window.dispatchEvent(new Event('online'));
    const replay = http.expectOne('/api/plans/p1/progression');
    expect((replay.request.body as { clientId: string }).clientId).toBe(sent.clientId);
    const stepped = structuredClone(plan);
    stepped.phases[0].stations[0].area = { width: 8, length: 8 };
    replay.flush({ plan: { ...session, plan: stepped }, moves: [] });
    await settle();
    expect(el.querySelector('[data-testid=offline-badge]')).toBeNull();
    expect(JSON.parse(localStorage.getItem('conewise.pitch-side.queue')!)).toEqual([]);
    expect(el.querySelector('cw-station-card')?.textContent).toContain('8 × 8 m');
  });

  it('takes a double tap on a verdict as one; the same verdict a moment later steps again', async () => {
    vi.useFakeTimers({ toFake: ['Date'] });
    try {
      vi.setSystemTime(new Date('2031-05-06T18:00:00Z'));
      const { http, button, settle } = await opened();
      /** Answers every progression the queue sends (one at a time) and counts them. */
      const answerAll = async () => {
        let sent = 0;
        for (let i = 0; i < 10; i++) {
          await settle();
          const pending = http.match('/api/plans/p1/progression');
          if (pending.length === 0) break;
          for (const request of pending) request.flush({ plan: session, moves: [] });
          sent += pending.length;
        }
        return sent;
      };
      button('[data-verdict=too-easy]').click();
      button('[data-verdict=too-easy]').click();
      expect(await answerAll()).toBe(1);
      vi.setSystemTime(new Date('2031-05-06T18:00:05Z'));
      button('[data-verdict=too-easy]').click();
      expect(await answerAll()).toBe(1);
    } finally {
      vi.useRealTimers();
    }
  });

  it('says under the verdict buttons why a station cannot step further, in plain words', async () => {
    // A real plan whose first station has been made harder until the engine refuses another step.
    let real = await generatePlan({
      ...plan.request,
      players: ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h'].map((id) => ({ id, name: id.toUpperCase() })),
      seed: 'pitch-limit',
    });
    const first = real.phases[0].stations[0];
    const verdict: StationVerdict = 'too-easy';
    for (let i = 0; i < 20 && !progressionOutcome(real, 0, first.id, verdict).refused; i++) {
      real = applyProgression(real, 0, first.id, verdict);
    }
    const refused = progressionOutcome(real, 0, first.id, verdict).refused!;
    expect(refused).toBeTruthy();
    const { http, el, settle } = await opened({ ...session, plan: real });
    const card = el.querySelector('cw-station-card')!;
    card.querySelector<HTMLButtonElement>(`[data-verdict=${verdict}]`)!.click();
    for (let i = 0; i < 100 && !card.querySelector('[data-testid=verdict-refusal]'); i++) {
      await new Promise((resolve) => setTimeout(resolve, 20));
      await settle();
    }
    expect(card.querySelector('[data-testid=verdict-refusal]')!.textContent).toContain(
      `The area stays: ${refused}`,
    );
    expect(card.querySelector('[data-testid=verdict-refusal]')!.textContent).not.toMatch(/s\d|beginner/);
    http.expectOne('/api/plans/p1/progression');
  });

  it('shows a coach who reads yards the steps, sizes and a refused step in yards', async () => {
    reader = YARDS_AND_FAHRENHEIT;
    let real = await generatePlan({
      ...plan.request,
      players: ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h'].map((id) => ({ id, name: id.toUpperCase() })),
      seed: 'pitch-limit',
    });
    const first = real.phases[0].stations[0];
    for (let i = 0; i < 20 && !progressionOutcome(real, 0, first.id, 'too-easy').refused; i++) {
      real = applyProgression(real, 0, first.id, 'too-easy');
    }
    const refused = progressionOutcome(real, 0, first.id, 'too-easy').refused!;
    const { http, el, settle } = await opened({ ...session, plan: real });
    const card = el.querySelector('cw-station-card')!;
    expect(card.querySelector('[data-testid=station-kind]')!.textContent).toMatch(/\d+ × \d+ yd/);
    expect(card.querySelector('svg[role=img]')!.getAttribute('aria-label')).toMatch(/ in \d+ × \d+ yd/);
    card.querySelector<HTMLButtonElement>('[data-verdict=too-easy]')!.click();
    for (let i = 0; i < 100 && !card.querySelector('[data-testid=verdict-refusal]'); i++) {
      await new Promise((resolve) => setTimeout(resolve, 20));
      await settle();
    }
    expect(card.querySelector('[data-testid=verdict-refusal]')!.textContent).toContain(
      inUnitsText(refused, YARDS_AND_FAHRENHEIT),
    );
    expect(el.textContent).not.toMatch(METRIC_WORDS);
    http.expectOne('/api/plans/p1/progression');
  });

  it('puts who moves right under the names that were tapped', async () => {
    const { http, el, button, settle } = await opened();
    button('button[aria-label="Fen Q. arrives"]').click();
    const replanned = structuredClone(plan);
    replanned.request.players.push({ id: 'f', name: 'Fen Q.' });
    http.expectOne('/api/plans/p1/replan').flush({
      plan: { ...session, plan: replanned },
      moves: [{ playerId: 'f', fromStationId: null, toStationId: 's1', phaseIndex: 0 }],
    });
    await settle();
    const moves = el.querySelector('[data-testid=moves]')!;
    expect(moves.closest('.cw-pitch__roster')).not.toBeNull();
    expect(moves.getAttribute('aria-live')).toBe('polite');
  });

  it('adds a late arrival in one tap, shows who moves and asks the server to re-plan from now', async () => {
    const { http, el, button, settle } = await opened();
    button('button[aria-label="Fen Q. arrives"]').click();
    const request = http.expectOne('/api/plans/p1/replan');
    expect(request.request.body).toMatchObject({ add: [{ id: 'f', name: 'Fen Q.' }], fromMinute: 0 });
    const replanned = structuredClone(plan);
    replanned.request.players.push({ id: 'f', name: 'Fen Q.' });
    replanned.phases.forEach((p) => p.stations[0].playerIds.push('f'));
    request.flush({
      plan: { ...session, plan: replanned },
      moves: [{ playerId: 'f', fromStationId: null, toStationId: 's1', phaseIndex: 0 }],
    });
    await settle();
    expect(el.querySelector('[data-testid=moves]')?.textContent).toContain(
      'Rondo start: Fen Q. joins station 1 (Square one)',
    );
    expect(el.querySelector('button[aria-label="Fen Q. leaves early"]')).not.toBeNull();
  });

  it("shows only the engine's re-plan: a working note until it is ready, never a guessed plan", async () => {
    const players = ['a', 'b', 'c', 'd', 'e', 'f', 'g', 'h'].map((id) => ({ id, name: id.toUpperCase() }));
    const real = await generatePlan({ ...plan.request, players: players.slice(0, 7), seed: 'pitch-replan' });
    const t = setUp();
    t.http.expectOne('/api/plans/p1').flush({ ...session, plan: real });
    t.http.expectOne('/api/teams/t1/players').flush(
      players.map((p) => ({
        id: p.id,
        teamId: 't1',
        displayName: p.name,
        goalkeeper: false,
        active: true,
      })),
    );
    t.http.expectOne('/api/rule-sets/rs1').flush({ id: 'rs1', body: null });
    await t.settle();
    const { el, button, fixture, http } = t;
    const present = () =>
      Array.from(el.querySelectorAll('[aria-label=Present] button')).map((b) => b.textContent!.trim());

    button('button[aria-label="H arrives"]').click();
    fixture.detectChanges();
    expect(el.querySelector('[data-testid=replanning]')?.getAttribute('role')).toBe('status');
    expect(present()).not.toContain('H');
    expect(el.querySelector('[data-testid=moves]')).toBeNull();
    http.expectOne('/api/plans/p1/replan');

    const expected = await replan(real, { add: [{ id: 'h', name: 'H' }], fromMinute: 0 });
    for (let i = 0; i < 100 && el.querySelector('[data-testid=replanning]'); i++) {
      await new Promise((resolve) => setTimeout(resolve, 20));
      await t.settle();
    }
    expect(el.querySelector('[data-testid=replanning]')).toBeNull();
    expect(present()).toContain('H');
    const stationOfH = expected.plan.phases[0].stations.findIndex((s) => s.playerIds.includes('h'));
    const cards = el.querySelectorAll('cw-station-card');
    expect(cards[stationOfH]?.textContent).toContain('H');
    expect(el.querySelector('[data-testid=moves]')?.textContent).toContain('H joins');
  });

  it('runs a drinks break as a phase of its own: the countdown says so, no stations, and what to set up next', async () => {
    const game: Station = {
      ...station('s3', 'Two goals', ['a', 'b', 'c', 'd', 'e']),
      activityKind: 'small-sided-game',
      format: '3v2',
      roles: {
        teams: [
          ['a', 'b', 'c'],
          ['d', 'e'],
        ],
      },
      positions: ['a', 'b', 'c', 'd', 'e'].map((id, i) => ({
        id,
        role: i < 3 ? 'team-a' : 'team-b',
        x: i,
        y: i,
      })),
      notes: ['No cones left for its corners: mark the corners with bibs, bags or bottles.'],
    };
    const withBreak: Plan = {
      ...plan,
      phases: [
        {
          name: 'Drinks break (heat)',
          activityId: 'drinks-break',
          activityKind: 'break',
          startMinute: 0,
          endMinute: 2,
          stations: [],
        },
        {
          name: 'Game',
          activityId: 'g',
          activityKind: 'small-sided-game',
          startMinute: 2,
          endMinute: 10,
          stations: [game],
          changeover: { conesPlaced: 4, conesLifted: 0, goalsMoved: 2, minutes: 0 },
        },
      ],
    };
    const { el, button, settle } = await opened({ ...session, plan: withBreak });
    expect(el.querySelector('#current-phase-name')?.textContent).toContain('Drinks break (heat)');
    expect(el.querySelector('[data-testid=countdown]')?.getAttribute('aria-label')).toBe(
      'Time left in the drinks break',
    );
    expect(el.querySelector('[data-testid=countdown]')?.textContent?.trim()).toBe('2:00');
    expect(el.querySelector('[data-testid=break-now]')).not.toBeNull();
    expect(el.querySelectorAll('cw-station-card')).toHaveLength(0);
    expect(el.querySelector('[data-testid=next-set-up]')?.textContent).toContain(
      'Set up during the drinks break: 4 cones, move 2 goals',
    );

    button('button[aria-label="Next phase"]').click();
    await settle();
    const card = el.querySelector('cw-station-card')!;
    expect(card.querySelector('[data-testid=station-kind]')?.textContent).toContain('Small-sided game');
    expect(card.querySelector('[data-testid=station-kind]')?.textContent).toContain('3v2');
    expect(card.querySelector('[data-player=a]')?.textContent).toContain('Side A · bib');
    expect(card.querySelector('[data-player=d]')?.textContent).toContain('Side B');
    expect(card.querySelector('[data-testid=station-notes]')?.textContent).toContain(
      'mark the corners with bibs',
    );
    expect(card.querySelectorAll('cw-station-diagram g.cw-dot')).toHaveLength(5);
  });
});
