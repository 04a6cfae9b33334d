import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { By } from '@angular/platform-browser';
import { MatStepper } from '@angular/material/stepper';
import { provideRouter, Router } from '@angular/router';
import {
  FOCUSES,
  FOCUS_LABELS,
  type PlanRequest,
  type PlayerDto,
  type TeamDto,
} from '../../../../shared/types';
import type { Units } from '../../../../shared/units';
import { AuthStore } from '../../core/auth/auth-store';
import { PlanWizard } from './plan-wizard';

const TEAM: TeamDto = {
  id: 'team-1',
  name: 'Harbour Hawks U10',
  ageGroup: 'U10',
  level: 'intermediate',
  usualSpace: { width: 36, length: 44 },
  coachIds: [],
  playerCount: 15,
  pinnedActivityIds: [],
};

const NAMES = ['Ada P.', 'Ben O.', 'Cleo R.', 'Dev S.', 'Edie T.', 'Finn U.', 'Gia V.', 'Hal W.'];
const MORE = ['Ines X.', 'Jon Y.', 'Kit Z.', 'Lou A.', 'Max B.', 'Nia C.', 'Oli D.'];
const ROSTER: PlayerDto[] = [...NAMES, ...MORE].map((displayName, i) => ({
  id: `p${i + 1}`,
  teamId: TEAM.id,
  displayName,
  goalkeeper: i === 2,
  // Two players are no longer in the squad and must not be ticked.
  active: i < 13,
}));

// A shared, busy machine can make the first render slow; the checks, not the clock, are the test.

describe('PlanWizard', () => {
  afterEach(() => localStorage.removeItem('conewise.session'));

  /** `units`: the signed-in coach's units (no one signed in reads metres and °C). */
  async function setUp(units?: Units) {
    TestBed.configureTestingModule({
      imports: [PlanWizard],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([]),
        provideNoopAnimations(),
      ],
    });
    if (units) {
      TestBed.inject(AuthStore).signIn({
        token: 'token',
        user: {
          id: 'u1',
          name: 'Sam Coach',
          email: 'sam@example.org',
          emailVerified: true,
          clubId: 'c1',
          clubName: 'Harbour',
          role: 'coach',
          units,
          clubUnits: units,
          ownUnits: { distance: null, temperature: null },
        },
      });
    }
    const fixture = TestBed.createComponent(PlanWizard);
    fixture.componentRef.setInput('teamId', TEAM.id);
    const http = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
    http.expectOne('/api/teams').flush([TEAM]);
    http.expectOne((r) => r.url === `/api/teams/${TEAM.id}/players`).flush(ROSTER);
    http.expectOne(`/api/teams/${TEAM.id}/kit`).flush({ balls: 14, cones: 30, bibs: 10, goals: 4 });
    await fixture.whenStable();
    const root = fixture.nativeElement as HTMLElement;
    const input = (name: string) => root.querySelector<HTMLInputElement>(`input[formcontrolname="${name}"]`)!;
    const type = async (name: string, value: string) => {
      const el = input(name);
      el.value = value;
      el.dispatchEvent(new Event('input'));
      await fixture.whenStable();
    };
    const submit = async () => {
      const button = root.querySelector<HTMLButtonElement>('[data-testid="make-plan"]')!;
      button.click();
      // The schema check loads its validator lazily: wait until the wizard sends or says what is wrong
      // (the button is off from the tap, before the check, so it says nothing about sending).
      const pending = () => {
        let open = false;
        // A predicate that matches nothing takes no request away from the test.
        http.match(() => ((open = true), false));
        return open;
      };
      for (let i = 0; i < 150; i++) {
        await new Promise((resolve) => setTimeout(resolve, 20));
        fixture.detectChanges();
        if (root.querySelector('[data-testid="wizard-error"]') || pending()) break;
      }
      await fixture.whenStable();
    };
    const stepper = () =>
      fixture.debugElement.query(By.directive(MatStepper)).componentInstance as MatStepper;
    /** Taps a step's "Next" and waits until it has moved on or said what to fix. */
    const next = async (step: 'who' | 'kit' | 'time') => {
      const before = stepper().selectedIndex;
      root.querySelector<HTMLButtonElement>(`[data-testid="next-${step}"]`)!.click();
      for (let i = 0; i < 150; i++) {
        await new Promise((resolve) => setTimeout(resolve, 20));
        fixture.detectChanges();
        if (stepper().selectedIndex !== before || root.querySelector('[data-testid="step-problem"]')) break;
      }
      await fixture.whenStable();
      fixture.detectChanges();
    };
    /** The text under a field (its mat-form-field). */
    const fieldText = (name: string) => input(name).closest('mat-form-field')!.textContent ?? '';
    const problem = () => root.querySelector('[data-testid="step-problem"]')?.textContent ?? '';
    return { fixture, http, root, input, type, submit, stepper, next, fieldText, problem };
  }

  it('ticks the active roster and fills kit and space from the bag and the usual space', async () => {
    const { root, input } = await setUp();
    expect(root.querySelector('[data-testid="present-count"]')?.textContent).toContain('13 here');
    expect(root.querySelectorAll('mat-list-option').length).toBe(13);
    expect(input('cones').value).toBe('30');
    expect(input('goals').value).toBe('4');
    expect(input('width').value).toBe('36');
    expect(input('length').value).toBe('44');
  });

  it('sends the request the coach described and opens the plan', async () => {
    const { http, type, submit } = await setUp();
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    await type('cones', '12');
    await type('goals', '2');
    await type('minutes', '25');
    await submit();
    const call = http.expectOne('/api/plans');
    expect(call.request.method).toBe('POST');
    const body = call.request.body as { teamId: string; request: PlanRequest };
    expect(body.teamId).toBe(TEAM.id);
    expect(body.request.players).toHaveLength(13);
    expect(body.request.players.find((p) => p.id === 'p3')).toEqual({
      id: 'p3',
      name: 'Cleo R.',
      goalkeeper: true,
    });
    expect(body.request.players.some((p) => p.id === 'p14')).toBe(false);
    expect(body.request.equipment).toEqual({ balls: 14, cones: 12, bibs: 10, goals: 2 });
    expect(body.request).toMatchObject({
      ageGroup: 'U10',
      level: 'intermediate',
      minutes: 25,
      space: { width: 36, length: 44 },
    });
    call.flush({ id: 'plan-9', plan: {} });
    await new Promise((resolve) => setTimeout(resolve, 0));
    expect(navigate).toHaveBeenCalledWith(['/plans', 'plan-9']);
  });

  it('offers half and a third of the age group pitch and fills the space from a pick', async () => {
    const { fixture, root, input } = await setUp();
    const buttons = Array.from(root.querySelectorAll<HTMLButtonElement>('.cw-presets button'));
    const half = buttons.find((b) => b.textContent?.includes('Half a 7v7 pitch'))!;
    expect(buttons.some((b) => b.textContent?.includes('A third of a 7v7 pitch'))).toBe(true);
    // 7v7 pitch, US Soccer 2016: 35–45 yd wide, 55–65 yd long; midpoints 40 × 60 yd = 36.6 × 54.9 m,
    // whole metres 37 × 55; half of its length 27.4 m, so 27.
    expect(half.textContent).toContain('37×27 m');
    expect(root.querySelector('[data-testid="preset-source"]')?.textContent).toContain(
      'US Soccer Player Development Initiatives (2016)',
    );
    half.click();
    await fixture.whenStable();
    expect(input('width').value).toBe('37');
    expect(input('length').value).toBe('27');
  });

  it('in yards and °F: presets, the usual space and the limits in yards, the request in metres and °C', async () => {
    const { fixture, root, input, type, next, stepper, fieldText, http, submit } = await setUp({
      distance: 'yards',
      temperature: 'fahrenheit',
    });
    expect(root.textContent).toContain('Space (yards)');
    // The team's usual 36 × 44 m in whole yards.
    expect(input('width').value).toBe('39');
    expect(input('length').value).toBe('48');
    const buttons = Array.from(root.querySelectorAll<HTMLButtonElement>('.cw-presets button'));
    expect(buttons.map((b) => b.textContent?.trim())).toEqual([
      'Full 7v7 pitch · 40×60 yd',
      'Half a 7v7 pitch · 40×30 yd',
      'A third of a 7v7 pitch · 40×20 yd',
    ]);
    buttons[0].click();
    await fixture.whenStable();
    expect(input('width').value).toBe('40');
    expect(input('length').value).toBe('60');
    // The schema's 200 m is 218.7 yd: 219 is refused in words, 218 taken.
    await type('length', '219');
    await next('who');
    await next('kit');
    expect(stepper().selectedIndex).toBe(1);
    expect(fieldText('length')).toContain('Length must be at most 218.');
    await type('length', '60');
    await next('kit');
    expect(stepper().selectedIndex).toBe(2);
    expect(root.textContent).toContain('Temperature (°F)');
    // −30…50 °C is −22…122 °F.
    await type('temperature', '123');
    await next('time');
    expect(fieldText('temperature')).toContain('Temperature must be at most 122.');
    await type('temperature', '70');
    await submit();
    const body = http.expectOne('/api/plans').request.body as { request: PlanRequest };
    expect(body.request.space).toEqual({ width: 36.58, length: 54.86 });
    expect(body.request.conditions).toEqual({ temperatureC: 21.1 });
  });

  it('adds the guests to the team in one request and plans with them', async () => {
    const { fixture, http, root, submit } = await setUp();
    const addGuest = Array.from(root.querySelectorAll('button')).find((b) =>
      b.textContent?.includes('Add a guest'),
    )!;
    addGuest.click();
    await fixture.whenStable();
    const guestName = root.querySelector<HTMLInputElement>('.cw-guest input[formcontrolname="name"]')!;
    guestName.value = 'Pip Q.';
    guestName.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    await submit();
    // One request for all of today's guests: added together or not at all.
    const added = http.expectOne({ method: 'POST', url: `/api/teams/${TEAM.id}/guests` });
    expect(added.request.body).toEqual({ guests: [{ displayName: 'Pip Q.', goalkeeper: false }] });
    added.flush([{ id: 'p99', teamId: TEAM.id, displayName: 'Pip Q.', goalkeeper: false, active: false }]);
    await new Promise((resolve) => setTimeout(resolve, 0));
    const body = http.expectOne('/api/plans').request.body as { request: PlanRequest };
    expect(body.request.players).toHaveLength(14);
    expect(body.request.players.at(-1)).toEqual({ id: 'p99', name: 'Pip Q.' });
  });

  it('offers the ten focuses in their words, and a training session names the first one picked as its theme', async () => {
    const { fixture, http, root, submit } = await setUp();
    const chips = Array.from(root.querySelectorAll<HTMLElement>('.cw-focus mat-chip-option'));
    expect(chips.map((c) => c.textContent?.trim())).toEqual(FOCUSES.map((f) => FOCUS_LABELS[f]));
    expect(chips).toHaveLength(10);
    const hint = () => root.querySelector('[data-testid="focus-hint"]')!.textContent!;
    // A match warm-up (the wizard's default) says a focus only tips its choices.
    expect(hint()).toContain('only tips the choice of activities');
    expect(hint()).not.toContain('as its theme');

    const training = Array.from(root.querySelectorAll<HTMLButtonElement>('.cw-kind button')).find((b) =>
      b.textContent?.includes('Training'),
    )!;
    training.click();
    fixture.detectChanges();
    expect(hint()).toContain('first focus you pick as its theme');
    const chip = (label: string) =>
      chips
        .find((c) => c.textContent?.trim() === label)!
        .querySelector<HTMLElement>('[role="option"], button') ??
      chips.find((c) => c.textContent?.trim() === label)!;
    chip('Possession').click();
    await fixture.whenStable();
    chip('Passing').click();
    await fixture.whenStable();
    fixture.detectChanges();
    expect(hint()).toContain('Theme: Possession');

    await submit();
    const body = http.expectOne('/api/plans').request.body as { request: PlanRequest };
    expect(body.request.kind).toBe('training');
    expect(body.request.focus).toEqual(['possession', 'passing']);
  });

  it('refuses minutes outside what the engine accepts, in plain words, without calling the server', async () => {
    const { fixture, http, root, type, submit } = await setUp();
    await type('minutes', '200');
    await submit();
    http.expectNone('/api/plans');
    fixture.detectChanges();
    expect(root.textContent).toContain('Minutes must be at most 120.');
  });

  it('pins a server 400 to the field it names', async () => {
    const { fixture, http, root, submit } = await setUp();
    await submit();
    http.expectOne('/api/plans').flush(
      {
        type: 'about:blank',
        title: 'Bad request',
        status: 400,
        detail: 'The request has bad fields.',
        errors: [{ field: 'request.equipment.cones', message: 'Cones must be a whole number.' }],
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();
    fixture.detectChanges();
    const conesField = root.querySelector('input[formcontrolname="cones"]')!.closest('mat-form-field')!;
    expect(conesField.textContent).toContain('Cones must be a whole number.');
    expect(root.querySelector('[data-testid="wizard-error"]')?.textContent).toContain(
      'The request has bad fields.',
    );
  });

  it('keeps "Next" on who is here until someone is ticked, and says so under the list', async () => {
    const { fixture, root, stepper, next, problem } = await setUp();
    Array.from(root.querySelectorAll<HTMLButtonElement>('button'))
      .find((b) => b.textContent?.trim() === 'Clear')!
      .click();
    await fixture.whenStable();
    await next('who');
    expect(stepper().selectedIndex).toBe(0);
    expect(problem()).toContain('Tick at least one player who is here, or add a guest.');
    expect(root.querySelector('[data-testid="no-players"]')).not.toBeNull();
    Array.from(root.querySelectorAll<HTMLButtonElement>('button'))
      .find((b) => b.textContent?.trim() === 'Tick all')!
      .click();
    await fixture.whenStable();
    await next('who');
    expect(stepper().selectedIndex).toBe(1);
  });

  it('refuses text in a number field visibly, and no adults, on the first step', async () => {
    const { stepper, next, type, input, fieldText } = await setUp();
    await type('coaches', 'two');
    await next('who');
    expect(stepper().selectedIndex).toBe(0);
    // The text stays as typed, with the reason under it.
    expect(input('coaches').value).toBe('two');
    expect(fieldText('coaches')).toContain('Adults must be a number, written in digits.');
    await type('coaches', '0');
    await next('who');
    expect(stepper().selectedIndex).toBe(0);
    expect(fieldText('coaches')).toContain('Count at least one adult');
    await type('coaches', '2');
    await next('who');
    expect(stepper().selectedIndex).toBe(1);
  });

  it("holds kit and space to the request schema's limits: no negative width, no 5000 cones", async () => {
    const { stepper, next, type, fieldText, problem } = await setUp();
    await next('who');
    expect(stepper().selectedIndex).toBe(1);
    await type('width', '-10');
    await type('cones', '5000');
    await type('balls', '12a');
    await next('kit');
    expect(stepper().selectedIndex).toBe(1);
    expect(fieldText('width')).toContain('Width must be more than 0.');
    expect(fieldText('cones')).toContain('Cones must be at most 1000.');
    expect(fieldText('balls')).toContain('Balls must be a number');
    // Said by the button too, naming the field: the first problem and how many more.
    expect(problem()).toContain('Balls must be a number, written in digits. (and 2 more on this step)');
    await type('width', '30');
    await type('cones', '40');
    await type('balls', '12');
    await next('kit');
    expect(stepper().selectedIndex).toBe(2);
  });

  it('refuses an implausible temperature and adds a safety line for the weather', async () => {
    const { root, stepper, next, type, fieldText } = await setUp();
    await next('who');
    await next('kit');
    await type('temperature', '55');
    await next('time');
    expect(stepper().selectedIndex).toBe(2);
    expect(fieldText('temperature')).toContain('Temperature must be at most 50.');
    await type('temperature', '31');
    await next('time');
    expect(stepper().selectedIndex).toBe(3);
    expect(root.querySelector('[data-testid="weather-note"]')!.textContent).toContain('Safety:');
  });

  it('names a guest by the rules for a player name: not empty, no digits', async () => {
    const { fixture, root, stepper, next } = await setUp();
    Array.from(root.querySelectorAll('button'))
      .find((b) => b.textContent?.includes('Add a guest'))!
      .click();
    await fixture.whenStable();
    const guestName = () => root.querySelector<HTMLInputElement>('.cw-guest input[formcontrolname="name"]')!;
    const guestText = () => guestName().closest('mat-form-field')!.textContent ?? '';
    await next('who');
    expect(stepper().selectedIndex).toBe(0);
    expect(guestText()).toContain('Guest name is needed.');
    guestName().value = 'Pip 2';
    guestName().dispatchEvent(new Event('input'));
    await next('who');
    expect(stepper().selectedIndex).toBe(0);
    expect(guestText()).toContain('Guest name: A first name and initial; no digits');
    guestName().value = 'Pip Q.';
    guestName().dispatchEvent(new Event('input'));
    await next('who');
    expect(stepper().selectedIndex).toBe(1);
  });

  it('opens the step that needs a look when the plan is asked for with a bad answer', async () => {
    const { stepper, type, submit, http, root } = await setUp();
    await type('width', '-10');
    stepper().selectedIndex = 0;
    await submit();
    http.expectNone('/api/plans');
    expect(stepper().selectedIndex).toBe(1);
    expect(root.querySelector('[data-testid="step-problem"]')).not.toBeNull();
  });
});
