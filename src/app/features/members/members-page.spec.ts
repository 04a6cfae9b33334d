import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { InvitationDto, MemberDto } from '../../../../shared/types';
import { MembersPage } from './members-page';

const members: MemberDto[] = [
  { userId: 'u2', name: 'Piet Vander', email: 'piet@club.test', role: 'coach' },
  { userId: 'u1', name: 'Rhona Lead', email: 'rhona@club.test', role: 'lead' },
];
const later = new Date(Date.now() + 86_400_000).toISOString();
const invitations: InvitationDto[] = [
  { id: 'i1', email: 'new@club.test', role: 'assistant', expiresAt: later, acceptedAt: null },
  { id: 'i2', email: 'done@club.test', role: 'coach', expiresAt: later, acceptedAt: later },
];

describe('MembersPage', () => {
  function setUp() {
    TestBed.configureTestingModule({
      imports: [MembersPage],
      providers: [provideHttpClient(), provideHttpClientTesting()],
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
    await fixture.whenStable();
    const rows = Array.from(el.querySelectorAll('[data-testid=member-table] tbody tr')).map(
      (r) => r.textContent ?? '',
    );
    expect(rows[0]).toContain('Rhona Lead');
    expect(rows[1]).toContain('Piet Vander');
    const pending = el.querySelector('[data-testid=pending-invitations]')?.textContent ?? '';
    expect(pending).toContain('new@club.test');
    expect(pending).not.toContain('done@club.test');
  });

  it('sends an invitation with the chosen role and shows it as pending', async () => {
    const { fixture, http, el } = setUp();
    http.expectOne('/api/members').flush(members);
    http.expectOne('/api/invitations').flush([]);
    await fixture.whenStable();
    const email = el.querySelector('input[type=email]') as HTMLInputElement;
    email.value = '  Sam@Club.Test ';
    email.dispatchEvent(new Event('input'));
    (el.querySelector('form') as HTMLFormElement).dispatchEvent(new Event('submit'));
    const request = http.expectOne('/api/invitations');
    expect(request.request.method).toBe('POST');
    expect(request.request.body).toEqual({ email: 'sam@club.test', role: 'coach' });
    request.flush({ id: 'i9', email: 'sam@club.test', role: 'coach', expiresAt: later, acceptedAt: null });
    await fixture.whenStable();
    expect(el.querySelector('[data-testid=pending-invitations]')?.textContent).toContain('sam@club.test');
    expect(el.textContent).toContain('Invitation sent to sam@club.test as coach');
  });

  it('refuses to send without a valid e-mail', async () => {
    const { fixture, http, el } = setUp();
    http.expectOne('/api/members').flush(members);
    http.expectOne('/api/invitations').flush([]);
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
});
