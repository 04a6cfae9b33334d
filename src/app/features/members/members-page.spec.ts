import { provideHttpClient } from '@angular/common/http';
import { NEW_CLUB_UNIT_FIELDS } from '../../../../shared/units';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { provideRouter } from '@angular/router';
import type { InvitationDto, MemberDto, TeamDto } from '../../../../shared/types';
import { AuthStore } from '../../core/auth/auth-store';
import { MembersPage } from './members-page';

const members: MemberDto[] = [
  { userId: 'u2', name: 'Piet Vander', email: 'piet@club.test', role: 'coach' },
  { userId: 'u1', name: 'Rhona Lead', email: 'rhona@club.test', role: 'lead' },
];
const later = new Date(Date.now() + 86_400_000).toISOString();
const invitations: InvitationDto[] = [
  {
    id: 'i1',
    email: 'new@club.test',
    role: 'assistant',
    expiresAt: later,
    acceptedAt: null,
    teamId: 't1',
    teamName: 'U10 Larks',
  },
  {
    id: 'i2',
    email: 'done@club.test',
    role: 'coach',
    expiresAt: later,
    acceptedAt: later,
    teamId: null,
    teamName: null,
  },
];

const teams: TeamDto[] = [
  {
    id: 't1',
    name: 'U10 Larks',
    ageGroup: 'U10',
    level: 'beginner',
    usualSpace: { width: 30, length: 40 },
    coachIds: ['u2'],
    playerCount: 9,
    pinnedActivityIds: [],
  },
];

const settle = async (fixture: { whenStable(): Promise<unknown>; detectChanges(): void }) => {
  for (let i = 0; i < 10; i++) await new Promise((resolve) => setTimeout(resolve, 10));
  await fixture.whenStable();
  fixture.detectChanges();
};

function button(root: ParentNode, label: string): HTMLButtonElement {
  const found = Array.from(root.querySelectorAll('button')).find(
    (b) => (b.getAttribute('aria-label') ?? b.textContent ?? '').trim() === label,
  );
  if (!found) throw new Error(`no button "${label}"`);
  return found;
}

describe('MembersPage', () => {
  function setUp() {
    TestBed.configureTestingModule({
      imports: [MembersPage],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideNoopAnimations(),
        provideRouter([]),
      ],
    });
    TestBed.inject(AuthStore).signIn({
      token: 't',
      user: {
        id: 'u1',
        name: 'Rhona Lead',
        email: 'rhona@club.test',
        clubId: 'c1',
        clubName: 'Heath Rovers',
        emailVerified: true,
        role: 'lead',
        ...NEW_CLUB_UNIT_FIELDS,
      },
    });
    const fixture = TestBed.createComponent(MembersPage);
    const http = TestBed.inject(HttpTestingController);
    const el = fixture.nativeElement as HTMLElement;
    return { fixture, http, el };
  }

  it('lists members by role and only the invitations not yet accepted', async () => {
    const { fixture, http, el } = setUp();
    http.expectOne('/api/members').flush(members);
    http.expectOne('/api/invitations').flush(invitations);
    http.expectOne('/api/teams').flush(teams);
    await fixture.whenStable();
    const rows = Array.from(el.querySelectorAll('[data-testid=member-table] li')).map(
      (r) => r.textContent ?? '',
    );
    expect(rows[0]).toContain('Rhona Lead');
    expect(rows[1]).toContain('Piet Vander');
    expect(rows[1]).toContain('U10 Larks');
    expect(rows[0]).toContain('Not on a team');
    const pending = el.querySelector('[data-testid=pending-invitations]')?.textContent ?? '';
    expect(pending).toContain('new@club.test');
    expect(pending).toContain('for U10 Larks');
    expect(pending).not.toContain('done@club.test');
  });

  it('writes invitation dates in the browser’s locale, not a fixed pattern', async () => {
    // Midday UTC: the same calendar day in every time zone the test may run in.
    const open: InvitationDto = { ...invitations[0], id: 'i3', expiresAt: '2099-03-07T12:00:00.000Z' };
    const gone: InvitationDto = {
      ...invitations[0],
      id: 'i4',
      email: 'late@club.test',
      expiresAt: '2020-11-24T12:00:00.000Z',
    };
    const read = async (language: string) => {
      const spy = vi.spyOn(navigator, 'language', 'get').mockReturnValue(language);
      const { fixture, http, el } = setUp();
      http.expectOne('/api/members').flush(members);
      http.expectOne('/api/invitations').flush([open, gone]);
      http.expectOne('/api/teams').flush(teams);
      await fixture.whenStable();
      const lines = Array.from(el.querySelectorAll('[data-testid=pending-invitations] li')).map((li) =>
        (li.textContent ?? '').replace(/\s+/g, ' '),
      );
      spy.mockRestore();
      TestBed.resetTestingModule();
      return lines;
    };
    const [goneUs, openUs] = await read('en-US');
    expect(openUs).toMatch(/link valid until Sat, Mar 7, \d{1,2}:\d{2} (AM|PM)/);
    expect(goneUs).toContain('expired Tue, Nov 24');
    const [goneGb, openGb] = await read('en-GB');
    expect(openGb).toMatch(/link valid until Sat 7 Mar, \d{2}:\d{2}/);
    expect(goneGb).toContain('expired Tue 24 Nov');
  });

  it('sends an invitation with the chosen role and shows it as pending', async () => {
    const { fixture, http, el } = setUp();
    http.expectOne('/api/members').flush(members);
    http.expectOne('/api/invitations').flush([]);
    http.expectOne('/api/teams').flush(teams);
    await fixture.whenStable();
    const email = el.querySelector('input[type=email]') as HTMLInputElement;
    email.value = '  Sam@Club.Test ';
    email.dispatchEvent(new Event('input'));
    (el.querySelector('form') as HTMLFormElement).dispatchEvent(new Event('submit'));
    const request = http.expectOne('/api/invitations');
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toEqual({ email: 'sam@club.test', role: 'coach' });
    request.flush({
      id: 'i9',
      email: 'sam@club.test',
      role: 'coach',
      expiresAt: later,
      acceptedAt: null,
      teamId: null,
      teamName: null,
    });
    await fixture.whenStable();
    expect(el.querySelector('[data-testid=pending-invitations]')?.textContent).toContain('sam@club.test');
    expect(el.textContent).toContain('Invitation sent to sam@club.test as a coach');
  });

  it('refuses to send without a valid e-mail', async () => {
    const { fixture, http, el } = setUp();
    http.expectOne('/api/members').flush(members);
    http.expectOne('/api/invitations').flush([]);
    http.expectOne('/api/teams').flush(teams);
    await fixture.whenStable();
    const email = el.querySelector('input[type=email]') as HTMLInputElement;
    email.value = 'not-an-address';
    email.dispatchEvent(new Event('input'));
    (el.querySelector('form') as HTMLFormElement).dispatchEvent(new Event('submit'));
    http.expectNone('/api/invitations');
    await fixture.whenStable();
    expect(el.textContent).toContain('does not look like an e-mail address');
  });

  it('shows the server reason when an invitation is refused', async () => {
    const { fixture, http, el } = setUp();
    http.expectOne('/api/members').flush(members);
    http.expectOne('/api/invitations').flush([]);
    http.expectOne('/api/teams').flush(teams);
    await fixture.whenStable();
    const email = el.querySelector('input[type=email]') as HTMLInputElement;
    email.value = 'piet@club.test';
    email.dispatchEvent(new Event('input'));
    (el.querySelector('form') as HTMLFormElement).dispatchEvent(new Event('submit'));
    http.expectOne('/api/invitations').flush(
      {
        type: 'about:blank',
        title: 'Conflict',
        status: 409,
        detail: 'piet@club.test is already a member.',
      },
      { status: 409, statusText: 'Conflict' },
    );
    await fixture.whenStable();
    expect(el.querySelector('[role=alert]')?.textContent).toContain('already a member');
  });

  it('a refused role change says why in plain words and keeps the role', async () => {
    const { fixture, http, el } = setUp();
    http.expectOne('/api/members').flush(members);
    http.expectOne('/api/invitations').flush([]);
    http.expectOne('/api/teams').flush(teams);
    await settle(fixture);
    // The lead has no Remove button on their own row.
    expect(el.querySelector('[aria-label="Remove Rhona Lead from the club"]')).toBeNull();
    button(el, 'Change Rhona Lead’s role').click();
    await settle(fixture);
    const dialog = document.querySelector('mat-dialog-container') as HTMLElement;
    (dialog.querySelector('mat-radio-button[data-role=coach] input') as HTMLInputElement).click();
    await settle(fixture);
    expect(dialog.textContent).toContain('You will no longer see this page');
    (dialog.querySelector('[data-testid=confirm-role]') as HTMLButtonElement).click();
    const request = http.expectOne('/api/members/u1');
    expect(request.request.body).toEqual({ role: 'coach' });
    request.flush(
      {
        title: 'Conflict',
        status: 409,
        detail:
          'Heath Rovers needs at least one head of coaching. Make someone else head of coaching first, then change this role.',
      },
      { status: 409, statusText: 'Conflict' },
    );
    await settle(fixture);
    expect(dialog.querySelector('[role=alert]')?.textContent).toContain(
      'Make someone else head of coaching first',
    );
    button(dialog, 'Keep as head of coaching').click();
    await settle(fixture);
    expect(el.querySelector('[data-member="Rhona Lead"] cw-role-chip')?.textContent).toBe('Head of coaching');
  });

  it('invites an assistant to a team, nudging until a team is picked', async () => {
    const { fixture, http, el } = setUp();
    http.expectOne('/api/members').flush(members);
    http.expectOne('/api/invitations').flush([]);
    http.expectOne('/api/teams').flush(teams);
    await settle(fixture);
    const page = fixture.componentInstance as unknown as { form: { patchValue(v: object): void } };
    page.form.patchValue({ role: 'assistant' });
    await settle(fixture);
    expect(el.textContent).toContain('pick one so they land on it');
    page.form.patchValue({ email: 'ash@club.test', teamId: 't1' });
    await settle(fixture);
    expect(el.textContent).not.toContain('pick one so they land on it');
    (el.querySelector('form') as HTMLFormElement).dispatchEvent(new Event('submit'));
    const request = http.expectOne('/api/invitations');
    expect(request.request.body).toEqual({ email: 'ash@club.test', role: 'assistant', teamId: 't1' });
  });

  it('ticks and unticks a member’s teams, saving each at once', async () => {
    const { fixture, http, el } = setUp();
    http.expectOne('/api/members').flush(members);
    http.expectOne('/api/invitations').flush([]);
    http.expectOne('/api/teams').flush(teams);
    await settle(fixture);
    button(el, 'Choose Rhona Lead’s teams').click();
    await settle(fixture);
    const box = document.querySelector('mat-dialog-container input[type=checkbox]') as HTMLInputElement;
    expect(box.checked).toBe(false);
    box.click();
    const request = http.expectOne('/api/teams/t1/staff/u1');
    expect(request.request.method).toBe('PUT');
    request.flush({ ...teams[0], coachIds: ['u2', 'u1'] });
    await settle(fixture);
    button(document.querySelector('mat-dialog-container')!, 'Done').click();
    await settle(fixture);
    const row = el.querySelector('[data-member="Rhona Lead"]')?.textContent ?? '';
    expect(row).toContain('U10 Larks');
    expect(row).not.toContain('Not on a team');
  });
});
