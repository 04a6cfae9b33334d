import { provideHttpClient } from '@angular/common/http';
import { NEW_CLUB_UNIT_FIELDS } from '../../../../shared/units';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { MemberDto, Role, TeamDto } from '../../../../shared/types';
import { AuthStore } from '../../core/auth/auth-store';
import { NoTeamYet } from './no-team-yet';

const TEAM: TeamDto = {
  id: 't1',
  name: 'U11 Swallows',
  ageGroup: 'U11',
  level: 'beginner',
  usualSpace: { width: 30, length: 40 },
  coachIds: ['coach-1', 'helper-1'],
  playerCount: 10,
  pinnedActivityIds: [],
};
const MEMBERS: MemberDto[] = [
  { userId: 'lead-1', name: 'Rhona Hale', role: 'lead' },
  { userId: 'lead-2', name: 'Tomas Ode', role: 'lead' },
  { userId: 'helper-2', name: 'Ned New', role: 'assistant' },
];

describe('NoTeamYet', () => {
  async function render(role: Role, userId: string, teams: TeamDto[]) {
    TestBed.configureTestingModule({
      imports: [NoTeamYet],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
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
    const fixture = TestBed.createComponent(NoTeamYet);
    fixture.componentRef.setInput('teams', teams);
    fixture.detectChanges();
    await fixture.whenStable();
    return { fixture, http: TestBed.inject(HttpTestingController), el: fixture.nativeElement as HTMLElement };
  }

  afterEach(() => {
    TestBed.inject(HttpTestingController).verify();
    localStorage.clear();
  });

  it('an assistant on no team is told whom to ask, by name, and offered no way to add a team', async () => {
    const { fixture, http, el } = await render('assistant', 'helper-2', [TEAM]);
    http.expectOne('/api/members').flush(MEMBERS);
    fixture.detectChanges();
    await fixture.whenStable();
    const text = el.textContent ?? '';
    expect(text).toContain('You’re not on a team yet.');
    expect(text).toContain('Ask Rhona Hale or Tomas Ode to add you');
    expect(text).not.toContain('start your own team');
    expect(el.querySelector('a')).toBeNull();
  });

  it('a coach on no team may also start their own', async () => {
    const { fixture, http, el } = await render('coach', 'coach-2', [TEAM]);
    http.expectOne('/api/members').flush(MEMBERS);
    fixture.detectChanges();
    await fixture.whenStable();
    expect(el.querySelector('a')?.textContent).toContain('Or start your own team');
  });

  it('shows nothing, and asks nothing, for a member on a team or for the lead', async () => {
    for (const [role, id] of [
      ['assistant', 'helper-1'],
      ['lead', 'lead-1'],
    ] as const) {
      TestBed.resetTestingModule();
      const { http, el } = await render(role, id, role === 'lead' ? [] : [TEAM]);
      http.expectNone('/api/members');
      expect(el.querySelector('[data-testid=no-team-yet]')).toBeNull();
      localStorage.clear();
    }
  });
});
