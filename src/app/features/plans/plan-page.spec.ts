import { BreakpointObserver } from '@angular/cdk/layout';
import { NEW_CLUB_UNIT_FIELDS, type Units } from '../../../../shared/units';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting, TestRequest } from '@angular/common/http/testing';
import { ComponentFixture, TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { provideRouter } from '@angular/router';
import { of } from 'rxjs';
import { areaLimits, defaultRuleSet, generatePlan, listActivities } from '../../../../engine/index';
import {
  ACTIVITY_KIND_LABELS,
  POSITION_STYLE,
  type Plan,
  type PlanRequest,
  type RuleSetDocument,
  type RuleSetDto,
  type SessionPlanDto,
} from '../../../../shared/types';
import type { PlanEdit } from '../../../../shared/types/plan-edit';
import { AuthStore } from '../../core/auth/auth-store';
import { BrowserEngine } from '../../core/engine/browser-engine';
import { PrintState } from '../../core/layout/print-state';
import { WHEN_IDLE } from '../../core/layout/when-idle';
import { PlanPage } from './plan-page';
import { PlanSession } from './services/plan-session';
import { isPlannerStep } from './components/why-panel';
import { METRIC_WORDS, YARDS_AND_FAHRENHEIT } from '../../core/units/units.testing';

const NAMES = ['Ada P.', 'Ben O.', 'Cleo R.', 'Dev S.', 'Edie T.', 'Finn U.', 'Gia V.', 'Hal W.', 'Ines X.'];
const ALL = [...NAMES, 'Jon Y.', 'Kit Z.', 'Lou A.', 'Max B.'];

const REQUEST: PlanRequest = {
  ageGroup: 'U10',
  level: 'intermediate',
  players: ALL.map((name, i) => ({ id: `p${i + 1}`, name, ...(i === 0 ? { goalkeeper: true } : {}) })),
  coaches: 2,
  equipment: { balls: 14, cones: 12, bibs: 8, goals: 2 },
  space: { width: 36, length: 44 },
  minutes: 20,
  kind: 'match-warm-up',
  seed: 'harbour-hawks',
};

/** A hot hour of U12 training with two keepers and one adult: drinks breaks, a game in goals, a supervision warning. */
const TRAINING: PlanRequest = {
  ageGroup: 'U12',
  level: 'intermediate',
  players: [...ALL, 'Nia C.'].map((name, i) => ({
    id: `p${i + 1}`,
    name,
    ...(i < 2 ? { goalkeeper: true } : {}),
  })),
  coaches: 1,
  equipment: { balls: 14, cones: 40, bibs: 10, goals: 2 },
  space: { width: 45, length: 60 },
  minutes: 60,
  kind: 'training',
  focus: ['finishing'],
  conditions: { temperatureC: 29 },
  seed: 'harbour-hawks',
};

function dto(plan: Plan, version = 1): SessionPlanDto {
  return {
    id: 'plan-1',
    teamId: 'team-1',
    teamName: 'Harbour Hawks U10',
    date: '2026-12-05',
    kickOff: '10:30',
    kind: plan.request.kind,
    minutes: plan.request.minutes,
    playerCount: plan.request.players.length,
    status: 'draft',
    createdAt: '2026-12-01T18:00:00Z',
    request: plan.request,
    plan,
    ruleSetId: plan.ruleSet.id,
    ruleSetVersion: plan.ruleSet.version,
    seed: plan.seed,
    authorId: 'u1',
    version,
  };
}

/** The rule set a plan names, as GET /api/rule-sets/:id answers it. */
function ruleSetDto(body: RuleSetDocument): RuleSetDto {
  return {
    id: body.id,
    name: body.name,
    version: body.version,
    status: 'published',
    body,
    authorId: 'u0',
    authorName: 'Lead',
    createdAt: '2026-11-01T09:00:00Z',
    updatedAt: '2026-11-01T09:00:00Z',
    revision: 1,
  };
}

const settle = async (fixture: { whenStable(): Promise<unknown>; detectChanges(): void }) => {
  for (let i = 0; i < 30; i++) await new Promise((resolve) => setTimeout(resolve, 10));
  await fixture.whenStable();
  fixture.detectChanges();
};

// A shared, busy machine can make the first render slow; the checks, not the clock, are the test.

describe('PlanPage', () => {
  const idleWork: (() => void)[] = [];
  let plan: Plan;
  let training: Plan;

  beforeAll(async () => {
    plan = await generatePlan(REQUEST);
    training = await generatePlan(TRAINING);
  });

  /** `phone` answers the page's breakpoint query as a 390 px screen would. */
  /** `rules` is what the server answers for the plan's rule set (the club's published rules). */
  /** `shown` is the plan the server answers with (the U10 warm-up unless a test says otherwise). */
  async function setUp({
    phone = false,
    rules = defaultRuleSet as RuleSetDocument,
    shown = undefined as Plan | undefined,
    role = 'coach' as 'coach' | 'assistant',
    drawAll = true,
    units = undefined as Units | undefined,
  } = {}) {
    const served = shown ?? plan;
    idleWork.length = 0;
    TestBed.configureTestingModule({
      imports: [PlanPage],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([]),
        provideNoopAnimations(),
        // Work the page leaves for a quiet moment waits here until the test runs it.
        { provide: WHEN_IDLE, useValue: (work: () => void) => idleWork.push(work) },
        ...(phone
          ? [
              {
                provide: BreakpointObserver,
                useValue: { observe: () => of({ matches: true, breakpoints: {} }) },
              },
            ]
          : []),
      ],
    });
    // The register and why panels are a deferred block: their code is loaded like a route's.
    await TestBed.compileComponents();
    TestBed.inject(AuthStore).signIn({
      token: 't',
      user: {
        id: 'u1',
        name: 'Rhea Coach',
        email: 'rhea@example.org',
        clubId: 'c1',
        clubName: 'Harbour',
        emailVerified: true,
        role,
        ...NEW_CLUB_UNIT_FIELDS,
        ...(units ? { units } : {}),
      },
    });
    const fixture = TestBed.createComponent(PlanPage);
    fixture.componentRef.setInput('planId', 'plan-1');
    const http = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
    http.expectOne('/api/plans/plan-1').flush(dto(served));
    // The plan's rules are read with the engine, when the area limits, an edit or the swap menu
    // first need them: on a wide screen a coach's page works out the limits at once.
    fixture.detectChanges();
    const rulesRead = http.match(`/api/rule-sets/${served.ruleSet.id}`);
    for (const read of rulesRead) read.flush(ruleSetDto(rules));
    expect(rulesRead.length).toBe(role === 'assistant' || phone ? 0 : 1);
    await fixture.whenStable();
    fixture.detectChanges();
    // Later phases and the panels are drawn after the first paint (on idle or near the screen):
    // most tests read the whole page, as a coach who scrolled would.
    if (drawAll) await drawDeferred(fixture);
    return { fixture, http, root: fixture.nativeElement as HTMLElement };
  }

  /** Runs the page's quiet moments until the later phases and the panels are drawn. */
  async function drawDeferred(fixture: ComponentFixture<PlanPage>): Promise<void> {
    for (
      let moments = 0;
      moments < 50 && !fixture.nativeElement.querySelector('cw-register-panel');
      moments++
    ) {
      await quietMoment(fixture);
    }
  }

  /** One quiet moment: the work waiting for it runs, and the page draws what it changed. */
  async function quietMoment(fixture: ComponentFixture<PlanPage>): Promise<void> {
    for (const work of idleWork.splice(0)) work();
    await fixture.whenStable();
    fixture.detectChanges();
  }

  it('draws the first phase with the page and the rest after the first paint', async () => {
    const { fixture, root } = await setUp({ drawAll: false });
    const phases = Array.from(root.querySelectorAll('[data-testid="phase"]'));
    expect(phases.length).toBe(plan.phases.length);
    const drawn = () => phases.map((el) => el.querySelectorAll('cw-station-card').length);
    const counts = plan.phases.map((ph) => ph.stations.length);
    expect(drawn()[0]).toBe(counts[0]);
    expect(
      drawn()
        .slice(1)
        .every((n) => n === 0),
    ).toBe(true);
    expect(root.querySelector('cw-register-panel')).toBeNull();
    // One more phase at each quiet moment, in order.
    await quietMoment(fixture);
    expect(drawn()[1]).toBe(counts[1]);
    expect(
      drawn()
        .slice(2)
        .every((n) => n === 0),
    ).toBe(true);
    await drawDeferred(fixture);
    expect(drawn()).toEqual(counts);
    expect(root.querySelector('cw-register-panel')).not.toBeNull();
  });

  it('draws everything at once for paper, folded station cards open', async () => {
    const { fixture, root } = await setUp({ drawAll: false, phone: true });
    expect(root.querySelector('cw-station-card .cw-group')).toBeNull();
    TestBed.inject(PrintState).printing.set(true);
    fixture.detectChanges();
    const total = plan.phases.reduce((n, p) => n + p.stations.length, 0);
    expect(root.querySelectorAll('cw-station-card').length).toBe(total);
    expect(root.querySelectorAll('cw-station-card .cw-group').length).toBe(total);
    // The panels' code arrives a moment later (a deferred block, fetched in advance when idle).
    await fixture.whenStable();
    fixture.detectChanges();
    expect(root.querySelector('cw-register-panel')).not.toBeNull();
  });

  afterEach(() => {
    localStorage.clear();
    vi.restoreAllMocks();
  });

  /** The radio of the paper group whose label reads `label`. */
  const paperButton = (root: HTMLElement, label: string) =>
    Array.from(root.querySelectorAll<HTMLLabelElement>('[data-testid="paper"] label'))
      .find((l) => l.textContent?.trim() === label)!
      .querySelector('input')!;

  /** Clicks "Print card" and answers the PDF request; returns the paper it asked for. */
  async function printCard(
    fixture: Awaited<ReturnType<typeof setUp>>['fixture'],
    http: HttpTestingController,
  ) {
    const root = fixture.nativeElement as HTMLElement;
    root.querySelector<HTMLButtonElement>('[data-testid="print"]')!.click();
    await settle(fixture);
    const request = http.expectOne((r) => r.url === '/api/plans/plan-1/pdf');
    request.flush(new Blob(['%PDF-1.7'], { type: 'application/pdf' }));
    await settle(fixture);
    return request.request.params.get('paper');
  }

  function stubDownload() {
    // jsdom has no object URLs and no navigation; the page's own logic is what is tested.
    Object.assign(URL, { createObjectURL: vi.fn(() => 'blob:card'), revokeObjectURL: vi.fn() });
    return vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(() => undefined);
  }

  it('prints on A4 for a browser in an A4 country until the coach picks US Letter, then asks for Letter', async () => {
    vi.spyOn(navigator, 'languages', 'get').mockReturnValue(['en-GB']);
    const download = stubDownload();
    const { fixture, http, root } = await setUp();
    expect(paperButton(root, 'A4').checked).toBe(true);
    expect(await printCard(fixture, http)).toBe('a4');

    paperButton(root, 'US Letter').click();
    await settle(fixture);
    expect(paperButton(root, 'US Letter').checked).toBe(true);
    expect(await printCard(fixture, http)).toBe('letter');
    expect(download).toHaveBeenCalledTimes(2);
    // The register panel reads its own data; this test is about the card.
    http.match((r) => r.url.endsWith('/attendance') || r.url.startsWith('/api/teams/'));
    http.verify();
  });

  it('remembers Letter on the device: after a reload the next card is Letter again', async () => {
    vi.spyOn(navigator, 'languages', 'get').mockReturnValue(['de-DE']);
    stubDownload();
    const first = await setUp();
    paperButton(first.root, 'US Letter').click();
    await settle(first.fixture);
    expect(localStorage.getItem('conewise.paper')).toBe('letter');

    // A reload: a fresh injector and page, only localStorage carried over.
    TestBed.resetTestingModule();
    const { fixture, http, root } = await setUp();
    expect(paperButton(root, 'US Letter').checked).toBe(true);
    expect(await printCard(fixture, http)).toBe('letter');
  });

  it('attaches the card to a shared e-mail on the paper the coach chose', async () => {
    localStorage.setItem('conewise.paper', 'letter');
    const { fixture, http, root } = await setUp();
    root.querySelector<HTMLButtonElement>('[data-testid="share"]')!.click();
    await settle(fixture);
    expect(document.querySelector('cw-share-dialog')!.textContent).toContain('US Letter paper');
    const recipients = document.querySelector<HTMLTextAreaElement>('[data-testid="share-recipients"]')!;
    recipients.value = 'helper@example.org';
    recipients.dispatchEvent(new Event('input'));
    document.querySelector<HTMLButtonElement>('[data-testid="share-send"]')!.click();
    // The dialog checks the body against the share schema first, which loads on demand.
    let sent: TestRequest[] = [];
    for (let i = 0; i < 50 && !sent.length; i++) {
      await settle(fixture);
      sent = http.match({ method: 'POST', url: '/api/plans/plan-1/share' });
    }
    expect(sent).toHaveLength(1);
    const [send] = sent;
    expect(send.request.body).toEqual({ recipients: ['helper@example.org'], paper: 'letter' });
    // The confirmation states the server's count of queued e-mails, not the number typed.
    send.flush({ queued: 3, messageIds: ['m1', 'm2', 'm3'] });
    await settle(fixture);
    await settle(fixture);
    expect(document.querySelector('mat-snack-bar-container')?.textContent).toContain(
      '3 e-mails queued for sending.',
    );
  });

  it('offers an assistant helper links only, saying e-mailing the card is for coaches and the lead', async () => {
    const { fixture, http, root } = await setUp({ role: 'assistant' });
    root.querySelector<HTMLButtonElement>('[data-testid="share"]')!.click();
    await settle(fixture);
    const dialog = document.querySelector('cw-share-dialog')!;
    expect(dialog.textContent).toContain('E-mailing the card is for the team');
    expect(dialog.querySelector('[data-testid="share-recipients"]')).toBeNull();
    expect(dialog.querySelector('[data-testid="share-send"]')).toBeNull();
    expect(dialog.querySelector('cw-helper-links')).not.toBeNull();
    http.match('/api/plans/plan-1/helper-links').forEach((r) => r.flush([]));
  });

  it("folds each station's details on a phone and keeps title, area and diagram in view", async () => {
    const { fixture, root } = await setUp({ phone: true });
    const stations = Array.from(root.querySelectorAll('cw-station-card'));
    expect(stations.length).toBe(plan.phases.reduce((n, p) => n + p.stations.length, 0));
    for (const card of stations) {
      const details = card.querySelector<HTMLDetailsElement>('[data-testid="station-details"]')!;
      expect(details.open).toBe(false);
      expect(details.querySelector('summary')!.textContent).toContain('coaching points');
      // What the coach scans first stays outside the fold.
      expect(details.contains(card.querySelector('h4'))).toBe(false);
      expect(details.contains(card.querySelector('cw-station-diagram'))).toBe(false);
      // Folded, the body is not even drawn: half a plan's page lives in these.
      expect(card.querySelector('.cw-group')).toBeNull();
    }
    // Opened, it is drawn inside the fold.
    const card = stations[0]!;
    const details = card.querySelector<HTMLDetailsElement>('[data-testid="station-details"]')!;
    details.open = true;
    details.dispatchEvent(new Event('toggle'));
    await settle(fixture);
    expect(details.contains(card.querySelector('.cw-group'))).toBe(true);
    const description = card.querySelector('.cw-description');
    if (description) expect(details.contains(description)).toBe(true);
  });

  it("keeps every station's details open on a wide screen, with no fold to open", async () => {
    const { root } = await setUp();
    const details = Array.from(root.querySelectorAll<HTMLDetailsElement>('[data-testid="station-details"]'));
    expect(details.length).toBeGreaterThan(0);
    for (const d of details) {
      expect(d.open).toBe(true);
      expect(d.classList).toContain('cw-details-fixed');
    }
  });

  it('shows every phase with clock times counting to kick-off, and every player once in each', async () => {
    vi.spyOn(navigator, 'language', 'get').mockReturnValue('en-GB');
    const { root } = await setUp();
    const phases = root.querySelectorAll('[data-testid="phase"]');
    expect(phases.length).toBe(plan.phases.length);
    // Kick-off 10:30 after a 20-minute warm-up: the first phase starts at 10:10.
    const timeline = root.querySelector('cw-phase-timeline')!.textContent!;
    expect(timeline).toContain('10:10');
    expect(timeline).toContain('10:30');
    vi.restoreAllMocks();
    for (const phase of Array.from(phases)) {
      const ids = Array.from(phase.querySelectorAll('[data-player]')).map((el) =>
        el.getAttribute('data-player'),
      );
      expect(ids.sort()).toEqual(REQUEST.players.map((p) => p.id).sort());
    }
    expect(root.textContent).toContain('Cleo R.');
  });

  it('draws each station from the engine coordinates: one circle per start position, in its role colour', async () => {
    const { root } = await setUp();
    const station = plan.phases[0].stations[0];
    const svg = root.querySelector('cw-station-diagram svg')!;
    expect(svg.getAttribute('aria-label')).toContain(`${station.area.width} × ${station.area.length} m`);
    expect(svg.querySelectorAll('polygon[data-marker="cone"]').length).toBe(station.conePositions.length);
    const circles = svg.querySelectorAll('g.cw-dot');
    expect(circles.length).toBe(station.positions.length);
    expect(circles.length).toBe(station.playerIds.length + station.coachJoins);
    station.positions.forEach((position, i) => {
      expect(circles[i].getAttribute('transform')).toBe(`translate(${position.x} ${position.y})`);
      expect(circles[i].querySelector('circle')!.getAttribute('fill')).toBe(
        POSITION_STYLE[position.role].fill,
      );
    });
    const area = svg.querySelector('rect')!;
    expect(Number(area.getAttribute('x'))).toBe(station.position.x);
    expect(Number(area.getAttribute('width'))).toBe(station.area.width);
  });

  it('lists the sides of a game with keepers, who is in goal, its format, and a key to the diagram', async () => {
    const { root } = await setUp({ shown: training });
    const phaseIndex = training.phases.findIndex((p) =>
      p.stations.some(
        (s) => s.activityKind === 'small-sided-game' && (s.roles.goalkeeper ?? []).length === 2,
      ),
    );
    expect(phaseIndex, 'the training plan has a game with two keepers').toBeGreaterThanOrEqual(0);
    const game = training.phases[phaseIndex].stations[0];
    const name = (id: string) => training.request.players.find((p) => p.id === id)!.name!;
    const card = root.querySelectorAll('[data-testid="phase"]')[phaseIndex].querySelector('cw-station-card')!;
    const kind = card.querySelector('[data-testid="station-kind"]')!.textContent!;
    expect(kind).toContain(ACTIVITY_KIND_LABELS['small-sided-game']);
    expect(kind).toContain(game.format!);
    const roles = Array.from(card.querySelectorAll('[data-testid="station-roles"] dt')).map((dt) => [
      dt.textContent!.trim(),
      dt.nextElementSibling!.textContent!,
    ]);
    const [sideA, sideB] = game.roles.teams!;
    expect(roles.map(([label]) => label)).toEqual(['Side A (bibs)', 'Side B', 'Goalkeeper']);
    for (const id of sideA) expect(roles[0][1]).toContain(name(id));
    for (const id of sideB) expect(roles[1][1]).toContain(name(id));
    for (const id of game.roles.goalkeeper!) expect(roles[2][1]).toContain(name(id));
    const keys = Array.from(card.querySelectorAll('.cw-legend li')).map((li) => li.textContent!.trim());
    expect(keys).toEqual(expect.arrayContaining(['Goalkeeper', 'Side A (bibs)', 'Side B', 'Goal']));
    expect(card.querySelectorAll('cw-station-diagram g.cw-dot[data-role="goalkeeper"]').length).toBe(2);
  });

  it('shows each drinks break as a row of its own with no stations, in the timeline and the page', async () => {
    const { root } = await setUp({ shown: training });
    const breaks = training.phases.filter((p) => p.activityKind === 'break');
    expect(breaks.length).toBeGreaterThan(0);
    const rows = Array.from(root.querySelectorAll('[data-testid="phase"][data-kind="break"]'));
    expect(rows).toHaveLength(breaks.length);
    for (const [i, row] of rows.entries()) {
      const minutes = breaks[i].endMinute - breaks[i].startMinute;
      expect(row.textContent).toContain('Drinks break');
      expect(row.textContent).toContain(`${breaks[i].name} · ${minutes} min`);
      expect(row.querySelector('cw-station-card')).toBeNull();
      expect(row.querySelector('.cw-swap')).toBeNull();
    }
    expect(root.querySelectorAll('cw-phase-timeline li[data-kind="break"]')).toHaveLength(breaks.length);
    expect(root.querySelectorAll('[data-testid="phase"]')).toHaveLength(training.phases.length);
  });

  it('says what to set up before a phase, and the theme of a training session', async () => {
    const { root } = await setUp({ shown: training });
    const index = training.phases.findIndex((p) => (p.changeover?.minutes ?? 0) > 0);
    expect(index).toBeGreaterThan(0);
    const change = training.phases[index].changeover!;
    const phases = root.querySelectorAll('[data-testid="phase"]');
    const line = phases[index].querySelector('[data-testid="changeover"]')!;
    expect(line.textContent).toContain(`Set up first: ${change.conesPlaced} cones`);
    expect(line.textContent).toContain(`${change.minutes} min of this phase`);
    expect(root.querySelector('[data-testid="plan-theme"]')!.textContent).toContain('Theme: Finishing');
  });

  it('puts a supervision warning first, with the guidance it comes from', async () => {
    const { root } = await setUp({ shown: training });
    const warning = training.warnings.find((w) => w.code === 'supervision-ratio')!;
    expect(warning, 'one adult for 14 U12 players is below the ratio').toBeTruthy();
    const box = root.querySelector('[data-testid="supervision"]')!;
    expect(box.textContent).toContain(warning.message);
    expect(box.textContent).toContain(`Source: ${warning.source}`);
    expect(box.textContent).toContain('usual guidance 1:8, so 2 adults');
    // Shown above the other notices, and not twice.
    expect(root.querySelector('cw-plan-notices section')).toBe(box);
    expect(root.querySelector('[data-testid="warnings"]')?.textContent ?? '').not.toContain(warning.message);
  });

  it('puts cautions where they cannot be missed, and the rules that fired in the why panel', async () => {
    const { root } = await setUp();
    expect(plan.cautions.length).toBeGreaterThan(0);
    const cautions = root.querySelector('[data-testid="cautions"]')!;
    for (const caution of plan.cautions) expect(cautions.textContent).toContain(caution.message);
    // Club rules are counted apart from the planner's own steps (engine.*).
    const clubRules = plan.trace.filter((t) => t.fired && !isPlannerStep(t));
    const steps = plan.trace.filter((t) => t.fired && isPlannerStep(t));
    expect(clubRules.length).toBeGreaterThan(1);
    expect(root.querySelector('cw-why-panel')!.textContent).toContain(
      `${clubRules.length} club rules applied · ${steps.length} planner steps`,
    );
  });

  it('shows a coach who reads yards and °F the whole plan in them: header, notices, cards, steps, why', async () => {
    const { root } = await setUp({ shown: training, units: YARDS_AND_FAHRENHEIT });
    // 45 × 60 m is 49 × 66 yd.
    expect(root.querySelector('[data-testid="plan-space"]')!.textContent!.trim()).toBe('49×66 yd');
    // The engine's steps ("Area 13 × 20 m → 12 × 18 m") come in yards, and so does each diagram's label.
    expect(root.textContent).toMatch(/Area \d+ (× \d+ )?yd → \d+ (× \d+ )?yd/);
    for (const svg of Array.from(root.querySelectorAll('cw-station-diagram svg[role=img]')))
      expect(svg.getAttribute('aria-label')).toMatch(/ in \d+ × \d+ yd/);
    expect(root.querySelector('[data-testid="warnings"], [data-testid="cautions"]')).not.toBeNull();
    expect(root.textContent).not.toMatch(METRIC_WORDS);
  });

  it('keeps metres for a coach who reads metres', async () => {
    const { root } = await setUp({ shown: training });
    expect(root.querySelector('[data-testid="plan-space"]')!.textContent!.trim()).toBe('45×60 m');
    expect(root.textContent).toMatch(/Area \d+ (× \d+ )?m → /);
    expect(root.textContent).not.toContain(' yd');
  });

  it('moves a player to another station, re-checks it in the browser, announces it and saves the edit', async () => {
    const { fixture, http, root } = await setUp();
    const phaseIndex = plan.phases.findIndex((p) => p.stations.length > 1);
    expect(phaseIndex).toBeGreaterThanOrEqual(0);
    const [from, to] = plan.phases[phaseIndex].stations;
    const playerId = from.playerIds[0];
    const phaseEl = root.querySelectorAll('[data-testid="phase"]')[phaseIndex];
    const chip = phaseEl.querySelector(`[data-player="${playerId}"]`)!;
    chip.querySelector<HTMLButtonElement>('button.cw-move')!.click();
    await fixture.whenStable();
    const item = Array.from(document.querySelectorAll<HTMLButtonElement>('[mat-menu-item]')).find((b) =>
      b.textContent?.includes(to.title),
    )!;
    item.click();
    await settle(fixture);

    const save = http.expectOne({ method: 'PATCH', url: '/api/plans/plan-1' });
    expect(save.request.headers.get('If-Match')).toBe('1');
    const edit = (save.request.body as { edit: PlanEdit }).edit;
    expect(edit).toEqual({ type: 'move-player', playerId, toStationId: to.id, phaseIndex });

    // Before the server answers, the browser's engine has already moved the player.
    const target = phaseEl.querySelector(`[data-station="${to.id}"]`)!;
    expect(target.querySelector(`[data-player="${playerId}"]`)).not.toBeNull();
    expect(root.querySelector('[data-testid="plan-announcement"]')!.textContent).toContain('moved to');
    expect(root.querySelector('[data-testid="plan-announcement"]')!.textContent).toContain('Re-checked');

    const stored = structuredClone(plan);
    stored.phases[phaseIndex].stations[0].playerIds = from.playerIds.slice(1);
    stored.phases[phaseIndex].stations[1].playerIds = [...to.playerIds, playerId];
    save.flush(dto(stored, 2));
    await settle(fixture);
    expect(root.querySelector(`[data-station="${to.id}"] [data-player="${playerId}"]`)).not.toBeNull();
  });

  it('offers every other activity in the swap menu, grouped by kind, those ruled out saying why, and saves the swap', async () => {
    const { fixture, http, root } = await setUp();
    const phase = root.querySelectorAll('[data-testid="phase"]')[0]!;
    const swap = Array.from(phase.querySelectorAll<HTMLButtonElement>('button')).find((b) =>
      b.textContent?.includes('Swap activity'),
    )!;
    swap.click();
    await settle(fixture);
    const items = Array.from(document.querySelectorAll<HTMLButtonElement>('[mat-menu-item]'));
    const offered = listActivities(defaultRuleSet, plan).filter((a) => a.id !== plan.phases[0]!.activityId);
    expect(items).toHaveLength(offered.length);
    const current = plan.phases[0]!.stations[0]!.title;
    expect(items.some((b) => b.querySelector('.cw-swap-title')?.textContent?.trim() === current)).toBe(false);
    // Each option says in a line what it is, or why it is not for this plan; the latter cannot be picked.
    for (const option of offered) {
      const item = items.find((b) => b.getAttribute('data-activity') === option.id)!;
      expect(item.querySelector('.cw-swap-title')!.textContent!.trim()).toBe(option.title);
      if (option.allowed) {
        expect(item.disabled).toBe(false);
        expect(item.querySelector('.cw-swap-summary')!.textContent!.trim()).toBe(option.summary);
      } else {
        expect(item.disabled).toBe(true);
        expect(item.querySelector('.cw-swap-summary')!.textContent).toContain(option.reason!);
      }
    }
    // Grouped by kind, the phase's own kind first.
    const groups = Array.from(document.querySelectorAll('.mat-mdc-menu-panel [role="group"]'));
    expect(groups[0].getAttribute('aria-label')).toBe(ACTIVITY_KIND_LABELS[plan.phases[0]!.activityKind]);
    for (const group of groups) {
      const kind = group.getAttribute('data-kind');
      for (const item of Array.from(group.querySelectorAll('[data-activity]'))) {
        expect(offered.find((a) => a.id === item.getAttribute('data-activity'))!.kind).toBe(kind);
      }
    }
    items.find((b) => !b.disabled)!.click();
    await settle(fixture);
    const save = http.expectOne({ method: 'PATCH', url: '/api/plans/plan-1' });
    const edit = (save.request.body as { edit: PlanEdit }).edit;
    expect(edit).toMatchObject({ type: 'swap-activity', phaseIndex: 0 });
    expect(edit).not.toMatchObject({ activityId: plan.phases[0]!.activityId });
  });

  it("fills the swap menu from the club's own rules the plan was made with, not the engine's", async () => {
    // The club reworded one activity the plan could swap to; the menu must use the club's wording.
    const offered = listActivities(defaultRuleSet, plan).find(
      (a) => a.allowed && a.id !== plan.phases[0]!.activityId,
    )!;
    const clubRules = structuredClone(defaultRuleSet) as RuleSetDocument;
    clubRules.parameters.activities.find((a) => a.id === offered.id)!.title = 'Harbour rondo, our way';
    const { fixture, root } = await setUp({ rules: clubRules });
    const swap = Array.from(
      root.querySelectorAll('[data-testid="phase"]')[0]!.querySelectorAll<HTMLButtonElement>('button'),
    ).find((b) => b.textContent?.includes('Swap activity'))!;
    swap.click();
    await settle(fixture);
    const titles = Array.from(document.querySelectorAll('[mat-menu-item] .cw-swap-title')).map((b) =>
      b.textContent?.trim(),
    );
    expect(titles).toContain('Harbour rondo, our way');
    expect(titles).not.toContain(offered.title);
  });

  it('puts the plan back and says so when the server refuses the edit', async () => {
    const { fixture, http, root } = await setUp();
    const station = plan.phases[0].stations[0];
    const smaller = Array.from(root.querySelectorAll<HTMLButtonElement>('button')).find((b) =>
      b.textContent?.includes('Smaller area'),
    )!;
    smaller.click();
    await settle(fixture);
    http
      .expectOne({ method: 'PATCH', url: '/api/plans/plan-1' })
      .flush(
        { type: 'about:blank', title: 'Conflict', status: 409, detail: 'The plan changed since version 1.' },
        { status: 409, statusText: 'Conflict' },
      );
    await settle(fixture);
    // Said in the card whose button was tapped, not at the top of the page.
    const card = smaller.closest('cw-station-card')!;
    expect(card.querySelector('[data-testid="edit-feedback"]')!.textContent).toContain(
      'That change was not saved: The plan changed since version 1.',
    );
    expect(root.querySelector('[data-testid="plan-announcement"]')!.textContent).toContain('not saved');
    const label = root.querySelector('cw-station-diagram svg')!.getAttribute('aria-label')!;
    expect(label).toContain(`${station.area.width} × ${station.area.length} m`);
  });

  it('greys out an area button at its limit and says the limit under it, from the engine', async () => {
    // A small space: some station is at its largest (or smallest) area from the start.
    const tight = await generatePlan({ ...REQUEST, space: { width: 24, length: 30 } });
    const limits = areaLimits(tight, defaultRuleSet);
    const [key, limit] = Object.entries(limits).find(([, l]) => l.larger || l.smaller)!;
    const { fixture, root } = await setUp({ shown: tight });
    await settle(fixture);
    const [phaseIndex, stationId] = key.split(':');
    const phaseEl = root.querySelectorAll('[data-testid="phase"]')[Number(phaseIndex)];
    const card = phaseEl.querySelector(`[data-station="${stationId}"]`)!.closest('cw-station-card')!;
    for (const size of ['larger', 'smaller'] as const) {
      const button = card.querySelector<HTMLButtonElement>(`[data-testid="area-${size}"]`)!;
      expect(button.disabled).toBe(!!limit[size]);
      if (limit[size]) {
        expect(card.querySelector('.cw-area-note')!.textContent).toContain(limit[size]);
        expect(button.getAttribute('aria-describedby')).toBe(`area-note-${stationId}`);
      }
    }
    expect(card.querySelector('.cw-area-note')!.textContent).not.toMatch(/p\d+-s\d+|beginner/);
  });

  it('on a phone leaves the engine unloaded until a coach opens a station card, then greys its area buttons', async () => {
    const tight = await generatePlan({ ...REQUEST, space: { width: 24, length: 30 } });
    const [key, limit] = Object.entries(areaLimits(tight, defaultRuleSet)).find(
      ([, l]) => l.larger || l.smaller,
    )!;
    const load = vi.spyOn(BrowserEngine.prototype, 'load');
    const { fixture, http, root } = await setUp({ phone: true, shown: tight });
    await settle(fixture);
    // The engine is a large download: reading a plan on a phone does not fetch it, nor the rules.
    expect(load).not.toHaveBeenCalled();
    http.expectNone(`/api/rule-sets/${tight.ruleSet.id}`);

    const [phaseIndex, stationId] = key.split(':');
    const phaseEl = root.querySelectorAll('[data-testid="phase"]')[Number(phaseIndex)];
    // Folded, the card's body (where data-station is) is not drawn yet: find the card by its place.
    const place = tight.phases[Number(phaseIndex)]!.stations.findIndex((st) => st.id === stationId);
    const card = phaseEl.querySelectorAll('cw-station-card')[place]!;
    const details = card.querySelector('details')!;
    details.open = true;
    details.dispatchEvent(new Event('toggle'));
    await settle(fixture);
    http.expectOne(`/api/rule-sets/${tight.ruleSet.id}`).flush(ruleSetDto(defaultRuleSet as RuleSetDocument));
    await settle(fixture);
    expect(load).toHaveBeenCalled();
    const size = limit.larger ? 'larger' : 'smaller';
    expect(card.querySelector<HTMLButtonElement>(`[data-testid="area-${size}"]`)!.disabled).toBe(true);
    expect(card.querySelector('.cw-area-note')!.textContent).toContain(limit[size]);
  });

  it('does not send an edit the engine refuses, and says why in the card that asked', async () => {
    const tight = await generatePlan({ ...REQUEST, space: { width: 24, length: 30 } });
    const [key, limit] = Object.entries(areaLimits(tight, defaultRuleSet)).find(([, l]) => l.larger)!;
    const [phaseIndex, stationId] = key.split(':');
    const { fixture, http, root } = await setUp({ shown: tight });
    // The button is greyed; a keyboard shortcut or a stale screen could still ask, so the session checks too.
    const session = fixture.debugElement.injector.get(PlanSession);
    await session.edit(
      { type: 'resize-area', phaseIndex: Number(phaseIndex), stationId, step: 'larger' },
      'Area made larger',
      `area:${phaseIndex}:${stationId}`,
    );
    await settle(fixture);
    http.expectNone({ method: 'PATCH', url: '/api/plans/plan-1' });
    const phaseEl = root.querySelectorAll('[data-testid="phase"]')[Number(phaseIndex)];
    const card = phaseEl.querySelector(`[data-station="${stationId}"]`)!.closest('cw-station-card')!;
    expect(card.querySelector('[data-testid="edit-feedback"]')!.textContent).toContain(limit.larger!);
    expect(root.querySelector('[data-testid="plan-announcement"]')!.textContent).toContain(
      `Not changed. ${limit.larger}`,
    );
    // Said once, not again as the standing limit under the buttons.
    expect(card.querySelectorAll('[data-testid="area-limit"]').length).toBe(limit.smaller ? 1 : 0);
  });

  it('names each move destination by station number and title, no two alike', async () => {
    const { fixture, root } = await setUp();
    const phaseIndex =
      plan.phases.findIndex((p) => p.stations.length > 2) >= 0
        ? plan.phases.findIndex((p) => p.stations.length > 2)
        : plan.phases.findIndex((p) => p.stations.length > 1);
    const phase = plan.phases[phaseIndex];
    const first = phase.stations[0];
    const phaseEl = root.querySelectorAll('[data-testid="phase"]')[phaseIndex];
    phaseEl
      .querySelector(`[data-player="${first.playerIds[0]}"] button.cw-move`)!
      .dispatchEvent(new MouseEvent('click'));
    await settle(fixture);
    const labels = Array.from(document.querySelectorAll('.cw-move-to')).map((b) => b.textContent!.trim());
    expect(labels).toHaveLength(phase.stations.length - 1);
    expect(new Set(labels).size).toBe(labels.length);
    phase.stations.slice(1).forEach((s, i) => {
      expect(labels[i]).toBe(`To Station ${i + 2} · ${s.title}${s.format ? ` ${s.format}` : ''}`);
    });
  });

  it('folds the notices on a phone to the first safety line and a count, the rest a tap away', async () => {
    const { root } = await setUp({ phone: true, shown: training });
    const box = root.querySelector<HTMLDetailsElement>('[data-testid="notices-folded"]')!;
    expect(box.open).toBe(false);
    const summary = box.querySelector('summary')!;
    expect(summary.querySelector('[data-testid="safety-line"]')!.textContent).toContain(
      `Safety: ${training.cautions[0].message}`,
    );
    const distinct = new Set([...training.warnings, ...training.cautions].map((n) => n.message));
    expect(summary.textContent).toContain(`Read all ${distinct.size}`);
    // Everything is in the box, each message once.
    const items = Array.from(box.querySelectorAll('li')).map((li) => li.firstChild!.textContent!.trim());
    expect(new Set(items).size).toBe(items.length);
    expect(items).toHaveLength(distinct.size);
    // No separate boxes push the first activity down.
    expect(root.querySelector('section[data-testid="cautions"]')).toBeNull();
  });
});
