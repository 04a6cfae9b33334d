import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import type { Plan } from '../../../../../shared/types';
import { AuthStore } from '../../../core/auth/auth-store';
import { RegisterPanel } from './register-panel';
import { canTakeRegister, entriesOf, lengthProblem, minutesProblem } from '../services/register-marks';

const squad = ['Ada K.', 'Bo L.', 'Cy M.', 'Di N.'].map((displayName, i) => ({
  id: `p${i + 1}`,
  teamId: 't1',
  displayName,
  goalkeeper: false,
  active: true,
}));

/** Pitch-side left this record: Bo came 6 minutes late, Cy left 20 minutes into a 30-minute session. */
const plan = {
  request: { minutes: 30, players: [{ id: 'p1' }, { id: 'p2' }] },
  rosterChanges: [
    { fromMinute: 6, added: ['p2'], removed: [] },
    { fromMinute: 20, added: [], removed: ['p3'] },
  ],
} as unknown as Plan;

function open(userId: string, role: 'lead' | 'coach' | 'assistant', coachIds: string[]) {
  TestBed.configureTestingModule({
    imports: [RegisterPanel],
    providers: [provideHttpClient(), provideHttpClientTesting(), provideNoopAnimations()],
  });
  TestBed.inject(AuthStore).signIn({
    token: 'x',
    user: { id: userId, name: 'Someone', email: 's@example.org', clubId: 'c1', role },
  } as never);
  const fixture = TestBed.createComponent(RegisterPanel);
  fixture.componentRef.setInput('session', { id: 'plan-1', teamId: 't1' });
  fixture.componentRef.setInput('plan', {
    ...plan,
    request: { ...plan.request, players: [{ id: 'p1' }, { id: 'p2' }] },
  });
  fixture.detectChanges();
  const http = TestBed.inject(HttpTestingController);
  http
    .expectOne('/api/plans/plan-1/attendance')
    .flush({ planId: 'plan-1', playerIds: [], players: [], recorded: false });
  http.expectOne('/api/teams/t1/players?includeInactive=true').flush(squad);
  http.expectOne('/api/teams/t1').flush({ id: 't1', coachIds });
  fixture.detectChanges();
  const el = fixture.nativeElement as HTMLElement;
  // The rows are drawn when the coach opens the panel.
  expect(el.querySelector('[data-testid=register-row]')).toBeNull();
  el.querySelector<HTMLElement>('mat-expansion-panel-header')!.click();
  fixture.detectChanges();
  return { fixture, http, el };
}

const rowOf = (el: HTMLElement, name: string) =>
  Array.from(el.querySelectorAll<HTMLElement>('[data-testid=register-row]')).find((r) =>
    r.textContent?.includes(name),
  )!;

describe('RegisterPanel', () => {
  it('is filled in from pitch-side, takes "All here" and saves late and early as came', () => {
    const { fixture, http, el } = open('u-asst', 'assistant', ['u-asst']);
    expect(rowOf(el, 'Bo L.').textContent).toContain('came 6 min late');
    expect(rowOf(el, 'Cy M.').textContent).toContain('left 10 min early');
    expect(rowOf(el, 'Di N.').textContent).toContain('didn’t come');
    (el.querySelector('[data-testid=register-all-here]') as HTMLButtonElement).click();
    fixture.detectChanges();
    expect(rowOf(el, 'Di N.').querySelector('[role=switch]')?.getAttribute('aria-checked')).toBe('true');
    (el.querySelector('[data-testid=register-save]') as HTMLButtonElement).click();
    const put = http.expectOne({ method: 'PUT', url: '/api/plans/plan-1/attendance' });
    expect(put.request.body.players).toEqual([
      { playerId: 'p1' },
      { playerId: 'p2', lateMinutes: 6 },
      { playerId: 'p3', leftEarlyMinutes: 10 },
      { playerId: 'p4' },
    ]);
    http.verify();
  });

  it('refuses text in a minutes field with a message under it, and keeps Save off until it is fixed', () => {
    const { fixture, el } = open('u-lead', 'lead', []);
    const late = rowOf(el, 'Ada K.').querySelector('[aria-label="Ada K. came late"]') as HTMLButtonElement;
    late.click();
    fixture.detectChanges();
    const input = rowOf(el, 'Ada K.').querySelector('input') as HTMLInputElement;
    input.value = 'ten';
    input.dispatchEvent(new Event('input'));
    fixture.detectChanges();
    expect(rowOf(el, 'Ada K.').textContent).toContain('Minutes late: type a whole number, such as 10.');
    expect((el.querySelector('[data-testid=register-save]') as HTMLButtonElement).disabled).toBe(true);
  });

  it('shows a coach of another team the register without the controls', () => {
    const { el } = open('u-other', 'coach', ['u-coach']);
    expect(el.querySelector('[data-testid=register-save]')).toBeNull();
    expect(el.querySelector('[role=switch]')?.hasAttribute('disabled')).toBe(true);
  });
});

describe('register marks', () => {
  it('checks minutes in a coach’s words and sends only whole minutes', () => {
    expect(minutesProblem('12', 'late')).toBeNull();
    expect(minutesProblem('0', 'left early')).toBe('Minutes left early: from 1 to 240.');
    expect(minutesProblem('', 'late')).toBe('Minutes late: type a whole number, such as 10.');
    expect(
      entriesOf({ a: { came: true, late: '5', early: null }, b: { came: false, late: null, early: null } }, [
        'b',
        'a',
      ]),
    ).toEqual([{ playerId: 'a', lateMinutes: 5 }]);
    expect(lengthProblem({ came: true, late: '200', early: null }, 30)).toBe(
      'Late and early together leave no time in the 30-minute session.',
    );
    expect(lengthProblem({ came: true, late: '10', early: '15' }, 30)).toBeNull();
    expect(canTakeRegister({ id: 'x', role: 'assistant' }, { coachIds: ['x'] })).toBe(true);
    expect(canTakeRegister({ id: 'x', role: 'coach' }, { coachIds: ['y'] })).toBe(false);
  });
});
