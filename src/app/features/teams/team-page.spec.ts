import { provideHttpClient } from '@angular/common/http';
import { NEW_CLUB_UNIT_FIELDS } from '../../../../shared/units';
import { HttpTestingController, provideHttpClientTesting, TestRequest } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { provideRouter, Router } from '@angular/router';
import type { MemberDto, PlayerDto, Role, TeamDto } from '../../../../shared/types';
import { AuthStore } from '../../core/auth/auth-store';
import { TeamPage } from './team-page';

const TEAM: TeamDto = {
  id: 't1',
  name: 'U9 Herons',
  ageGroup: 'U9',
  level: 'beginner',
  usualSpace: { width: 30, length: 40 },
  coachIds: ['coach-1'],
  playerCount: 2,
  pinnedActivityIds: [],
};
const PLAYERS: PlayerDto[] = [
  { id: 'p1', teamId: 't1', displayName: 'Ola K.', goalkeeper: true, active: true },
  { id: 'p2', teamId: 't1', displayName: 'Rui M.', goalkeeper: false, active: true },
  { id: 'p3', teamId: 't1', displayName: 'Tam J.', goalkeeper: false, active: false },
];

const MEMBERS: MemberDto[] = [
  { userId: 'lead-1', name: 'Lia Lead', role: 'lead' },
  { userId: 'coach-1', name: 'Cas Coach', role: 'coach' },
  { userId: 'coach-2', name: 'Dov Coach', role: 'coach' },
  { userId: 'helper-1', name: 'Hew Helper', role: 'assistant' },
];

const settle = async (fixture: { whenStable(): Promise<unknown>; detectChanges(): void }) => {
  for (let i = 0; i < 10; i++) await new Promise((resolve) => setTimeout(resolve, 10));
  await fixture.whenStable();
  fixture.detectChanges();
};

/** The open dialog (rendered in the overlay container, outside the page). */
const dialog = () => document.querySelector('mat-dialog-container') as HTMLElement | null;

function button(root: ParentNode, name: string): HTMLButtonElement {
  const found = Array.from(root.querySelectorAll('button')).find(
    (b) => (b.getAttribute('aria-label') ?? b.textContent ?? '').trim() === name,
  );
  if (!found) throw new Error(`no button "${name}"`);
  return found;
}

describe('TeamPage', () => {
  async function setUp(role: Role, userId = 'coach-1', team: TeamDto = TEAM) {
    TestBed.configureTestingModule({
      imports: [TeamPage],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([]),
        provideNoopAnimations(),
      ],
    });
    TestBed.inject(AuthStore).signIn({
      token: 't',
      user: {
        id: userId,
        name: 'Someone',
        email: 'x@example.org',
        emailVerified: true,
        clubId: 'c1',
        clubName: 'Club',
        role,
        ...NEW_CLUB_UNIT_FIELDS,
      },
    });
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigate').mockResolvedValue(true);
    const fixture = TestBed.createComponent(TeamPage);
    fixture.componentRef.setInput('teamId', 't1');
    const http = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
    http.expectOne('/api/teams/t1').flush(team);
    http.expectOne((r) => r.url === '/api/teams/t1/players').flush(PLAYERS);
    http.expectOne('/api/members').flush(MEMBERS);
    http.expectOne('/api/teams/t1/kit').flush({ balls: 10, cones: 20, bibs: 8, goals: 2 });
    await settle(fixture);
    // The schedule section loads its own sessions and calendar link once the team is known.
    http.expectOne((r) => r.url === '/api/teams/t1/schedule').flush([]);
    http.expectOne('/api/teams/t1/calendar').flush({ path: null });
    await settle(fixture);
    return { fixture, http, navigate, root: fixture.nativeElement as HTMLElement };
  }

  const rowNames = (root: HTMLElement) =>
    Array.from(root.querySelectorAll('tbody tr td:first-child')).map((td) => td.textContent?.trim());

  afterEach(() => {
    TestBed.inject(HttpTestingController).verify();
    localStorage.clear();
  });

  it('a coach of the team erases a player after reading what goes and what stays, and the row goes', async () => {
    const { fixture, http, root } = await setUp('coach');
    button(root, 'Erase Rui M. from Conewise').click();
    await settle(fixture);

    const text = dialog()!.textContent!;
    expect(text).toContain('Erase Rui M. from Conewise?');
    expect(text).toContain('their attendance ticks are deleted');
    expect(text).toContain('Old plans stay and still print');
    expect(text).toContain('“Former player” and a number');
    expect(text).toContain('have not gone out yet are not sent');
    expect(text).toContain('Switch off Active instead');
    http.expectNone('/api/players/p2');

    button(dialog()!, 'Erase from Conewise').click();
    const request = http.expectOne('/api/players/p2');
    expect(request.request.method).toBe('DELETE');
    request.flush(null, { status: 204, statusText: 'No Content' });
    await settle(fixture);

    expect(dialog()).toBeNull();
    expect(rowNames(root)).toEqual(['Ola K.', 'Tam J.']);
    expect(root.textContent).toMatch(/1 active player(?!s)/);
    expect(document.activeElement?.textContent?.trim()).toBe('Players');
  });

  it('keeping the player sends nothing and leaves the squad as it was', async () => {
    const { fixture, http, root } = await setUp('lead', 'lead-1');
    button(root, 'Erase Ola K. from Conewise').click();
    await settle(fixture);
    button(dialog()!, 'Keep Ola K.').click();
    await settle(fixture);
    http.expectNone('/api/players/p1');
    expect(dialog()).toBeNull();
    expect(rowNames(root)).toEqual(['Ola K.', 'Rui M.', 'Tam J.']);
  });

  it('a refused erasure is shown in the dialog and the player stays', async () => {
    const { fixture, http, root } = await setUp('coach');
    button(root, 'Erase Tam J. from Conewise').click();
    await settle(fixture);
    // Tam is already inactive: no advice to switch Active off.
    expect(dialog()!.textContent).not.toContain('Switch off Active');
    button(dialog()!, 'Erase from Conewise').click();
    http.expectOne('/api/players/p3').flush(
      {
        type: 'about:blank',
        title: 'Forbidden',
        status: 403,
        detail: 'Only the head of coaching and the team’s coaches can change this team.',
      },
      { status: 403, statusText: 'Forbidden' },
    );
    await settle(fixture);
    expect(dialog()!.querySelector('[role=alert]')?.textContent).toContain('Only the head of coaching');
    expect(button(dialog()!, 'Erase from Conewise').disabled).toBe(false);
    expect(rowNames(root)).toContain('Tam J.');
  });

  /** Every control on the page that changes the team, by what it does; each one the API may refuse. */
  function changeControls(root: HTMLElement): string[] {
    const names = Array.from(root.querySelectorAll('a, button')).map((el) =>
      (el.getAttribute('aria-label') ?? el.textContent ?? '').trim(),
    );
    const has = (test: (name: string) => boolean) => names.some(test);
    return [
      has((n) => n.endsWith('Plan a session')) && 'plan',
      has((n) => n.endsWith('Add a player')) && 'add player',
      has((n) => n === 'Edit Rui M.') && 'edit player',
      has((n) => n === 'Erase Rui M. from Conewise') && 'remove player',
      root.querySelector('mat-checkbox, mat-slide-toggle') && 'player switches',
      root.textContent!.includes('Import players from a CSV file') && 'import',
      has((n) => n === 'Save kit bag') && 'save kit',
      has((n) => n === 'Save team details') && 'save details',
      root.querySelector('cw-kit-bag-form input, cw-team-defaults-form input') && 'form fields',
      root.querySelector('[data-testid=delete-team]') && 'delete team',
    ].filter((found): found is string => typeof found === 'string');
  }

  const ALL_CONTROLS = [
    'plan',
    'add player',
    'edit player',
    'remove player',
    'player switches',
    'import',
    'save kit',
    'save details',
    'form fields',
    'delete team',
  ];
  const readOnlyNote = (root: HTMLElement) =>
    root.querySelector('[data-testid=team-read-only] span')?.textContent?.trim() ?? null;

  it('the lead gets every control, delete included, and no read-only note', async () => {
    const { root } = await setUp('lead', 'lead-1');
    expect(changeControls(root)).toEqual(ALL_CONTROLS);
    expect(readOnlyNote(root)).toBeNull();
    expect(root.querySelector('[data-testid="data-download"]')?.textContent?.trim()).toBe(
      'Download this team’s data',
    );
  });

  it('a coach attached to the team gets every control, delete included, as the API allows', async () => {
    const { root } = await setUp('coach', 'coach-1');
    expect(changeControls(root)).toEqual(ALL_CONTROLS);
    expect(readOnlyNote(root)).toBeNull();
    expect(root.querySelector('[data-testid="data-download"]')?.textContent?.trim()).toBe(
      'Download this team’s data',
    );
  });

  it('a coach of another team sees the team read-only: no changing it, no deleting it', async () => {
    const { root } = await setUp('coach', 'coach-2');
    expect(changeControls(root)).toEqual([]);
    expect(root.querySelector('[data-testid="data-download"]')).toBeNull();
    expect(readOnlyNote(root)).toBe('Only the head of coaching or this team’s coaches can change it.');
    // The same facts, as text: the squad's switches as Yes/No, kit and details under their labels.
    const rows = Array.from(root.querySelectorAll('tbody tr')).map((tr) =>
      Array.from(tr.querySelectorAll('td')).map((td) => td.textContent!.trim()),
    );
    expect(rows).toEqual([
      ['Ola K.', 'Yes', 'Yes'],
      ['Rui M.', 'No', 'Yes'],
      ['Tam J.', 'No', 'No'],
    ]);
    const facts = Array.from(root.querySelectorAll('.cw-facts div')).map(
      (d) => `${d.querySelector('dt')!.textContent!.trim()} ${d.querySelector('dd')!.textContent!.trim()}`,
    );
    expect(facts).toEqual([
      'Balls 10',
      'Cones 20',
      'Bibs 8',
      'Small goals 2',
      'Team name U9 Herons',
      'Age group U9',
      'Level Beginner',
      'Usual space 30 × 40 m',
    ]);
  });

  it('an assistant attached to the team sees it read-only too: helping is not changing', async () => {
    const { root } = await setUp('assistant', 'helper-1', { ...TEAM, coachIds: ['coach-1', 'helper-1'] });
    expect(changeControls(root)).toEqual([]);
    expect(root.querySelector('[data-testid="data-download"]')).toBeNull();
    expect(readOnlyNote(root)).toBe('Only the head of coaching or this team’s coaches can change it.');
    // Reading stays open: past plans and insight.
    expect(root.querySelector('a[href="/teams/t1/plans"]')).not.toBeNull();
    expect(root.querySelector('a[href="/teams/t1/insight"]')).not.toBeNull();
  });

  async function openDeleteTeam(role: Role = 'lead', userId = 'lead-1') {
    const context = await setUp(role, userId);
    (context.root.querySelector('[data-testid=delete-team]') as HTMLButtonElement).click();
    await settle(context.fixture);
    const input = dialog()!.querySelector('[data-testid=delete-team-name]') as HTMLInputElement;
    const type = async (text: string) => {
      input.value = text;
      input.dispatchEvent(new Event('input'));
      await settle(context.fixture);
    };
    const confirm = async () => {
      button(dialog()!, 'Delete team').click();
      await settle(context.fixture);
    };
    return { ...context, input, type, confirm };
  }

  it('the lead deletes the team only after typing its name, then goes back to the team list', async () => {
    const { http, navigate, type, confirm } = await openDeleteTeam();
    const text = dialog()!.textContent!;
    expect(text).toContain('Delete U9 Herons?');
    expect(text).toContain('its 3 players');
    expect(text).toContain('all its plans, with their attendance and station feedback');

    await confirm();
    http.expectNone('/api/teams/t1');
    expect(dialog()!.textContent).toContain('Type U9 Herons to confirm.');

    await type('U9 Heron');
    await confirm();
    http.expectNone('/api/teams/t1');

    await type('  u9 herons ');
    await confirm();
    const request: TestRequest = http.expectOne('/api/teams/t1');
    expect(request.request.method).toBe('DELETE');
    request.flush(null, { status: 204, statusText: 'No Content' });
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(dialog()).toBeNull();
    expect(navigate).toHaveBeenCalledWith(['/teams']);
  });

  it('a failed delete keeps the dialog open with the typed name and says why', async () => {
    const { http, navigate, input, type, confirm } = await openDeleteTeam();
    await type('U9 Herons');
    await confirm();
    http
      .expectOne('/api/teams/t1')
      .flush({ message: 'boom' }, { status: 500, statusText: 'Internal Server Error' });
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(dialog()!.querySelector('[role=alert]')?.textContent).toContain('Nothing you saved was lost');
    expect(input.value).toBe('U9 Herons');
    expect(navigate).not.toHaveBeenCalled();
  });

  it('a coach attached to the team deletes it the same way', async () => {
    const { http, navigate, type, confirm } = await openDeleteTeam('coach', 'coach-1');
    await type('U9 Herons');
    await confirm();
    const request = http.expectOne('/api/teams/t1');
    expect(request.request.method).toBe('DELETE');
    request.flush(null, { status: 204, statusText: 'No Content' });
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(navigate).toHaveBeenCalledWith(['/teams']);
  });

  it('a coach of the team adds an assistant to the staff, and only assistants are offered', async () => {
    const { fixture, http, root } = await setUp('coach');
    const staff = root.querySelector('[data-testid=team-staff]')?.textContent ?? '';
    expect(staff).toContain('Cas Coach');
    // Cas may not take themselves off: no remove button on their own row.
    expect(root.querySelector('[aria-label="Take Cas Coach off this team"]')).toBeNull();
    (root.querySelector('[data-testid=staff-pick] .mat-mdc-select-trigger') as HTMLElement).click();
    await settle(fixture);
    const options = Array.from(document.querySelectorAll('mat-option')).map((o) => o.textContent?.trim());
    expect(options).toEqual(['Hew Helper (Assistant)']);
    (document.querySelector('mat-option') as HTMLElement).click();
    await settle(fixture);
    button(root, 'Add to staff').click();
    const request = http.expectOne('/api/teams/t1/staff/helper-1');
    expect(request.request.method).toBe('PUT');
    request.flush({ ...TEAM, coachIds: ['coach-1', 'helper-1'] });
    await settle(fixture);
    expect(root.querySelector('[data-testid=team-staff]')?.textContent).toContain('Hew Helper');
  });

  it('the lead takes someone off the staff after saying so once more in the row', async () => {
    const { fixture, http, root } = await setUp('lead', 'lead-1', {
      ...TEAM,
      coachIds: ['coach-1', 'helper-1'],
    });
    button(root, 'Take Hew Helper off this team').click();
    await settle(fixture);
    http.expectNone('/api/teams/t1/staff/helper-1');
    expect(root.textContent).toContain('Take Hew Helper off U9 Herons?');
    button(root, 'Take off').click();
    const request = http.expectOne('/api/teams/t1/staff/helper-1');
    expect(request.request.method).toBe('DELETE');
    request.flush({ ...TEAM, coachIds: ['coach-1'] });
    await settle(fixture);
    expect(root.querySelector('[data-testid=team-staff]')?.textContent).not.toContain('Hew Helper');
  });

  it('an assistant sees the staff but cannot change it', async () => {
    const { root } = await setUp('assistant', 'helper-1', { ...TEAM, coachIds: ['coach-1', 'helper-1'] });
    expect(root.querySelector('[data-testid=team-staff]')?.textContent).toContain('Hew Helper');
    expect(root.querySelector('[data-testid=staff-pick]')).toBeNull();
    expect(root.querySelector('[aria-label^="Take "]')).toBeNull();
  });
});
