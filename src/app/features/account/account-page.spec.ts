import { provideHttpClient } from '@angular/common/http';
import { NEW_CLUB_UNIT_FIELDS } from '../../../../shared/units';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { provideRouter } from '@angular/router';
import type { Role, UserDto } from '../../../../shared/types';
import { AuthStore } from '../../core/auth/auth-store';
import { AccountPage } from './account-page';

function user(role: Role, name = 'Cat Coach', emailVerified = true): UserDto {
  return {
    id: 'u1',
    name,
    email: 'cat@example.org',
    emailVerified,
    clubId: 'c1',
    clubName: 'Millbrook Juniors',
    role,
    ...NEW_CLUB_UNIT_FIELDS,
  };
}

function open(role: Role = 'coach', emailVerified = true) {
  TestBed.configureTestingModule({
    imports: [AccountPage],
    providers: [provideHttpClient(), provideHttpClientTesting(), provideNoopAnimations(), provideRouter([])],
  });
  const auth = TestBed.inject(AuthStore);
  auth.signIn({ token: 'the-token', user: user(role, 'Cat Coach', emailVerified) });
  const fixture = TestBed.createComponent(AccountPage);
  fixture.detectChanges();
  const el = fixture.nativeElement as HTMLElement;
  const nameInput = el.querySelector<HTMLInputElement>('[data-testid=account-name]')!;
  const typeName = (value: string) => {
    nameInput.value = value;
    nameInput.dispatchEvent(new Event('input'));
    fixture.detectChanges();
  };
  const save = () => {
    el.querySelector<HTMLButtonElement>('[data-testid=save-name]')!.click();
    fixture.detectChanges();
  };
  const text = (id: string) => el.querySelector(`[data-testid=${id}]`)?.textContent?.trim();
  return { fixture, el, auth, nameInput, typeName, save, text, http: TestBed.inject(HttpTestingController) };
}

describe('AccountPage', () => {
  afterEach(() => localStorage.clear());

  it.each([
    ['lead', 'Head of coaching'],
    ['coach', 'Coach'],
    ['assistant', 'Assistant'],
  ] as const)('shows the %s role in words, with the e-mail address and club', (role, words) => {
    const { text, el } = open(role);
    expect(text('account-role')).toBe(words);
    expect(text('account-email')).toBe('cat@example.org');
    expect(text('account-club')).toBe('Millbrook Juniors');
    expect(text('email-state')).toBe('Confirmed');
    expect(el.textContent).not.toMatch(/\b(lead|assistant)\b/);
  });

  it('says when the e-mail address still needs confirming, and how', () => {
    const { text } = open('lead', false);
    expect(text('email-state')).toBe(
      'Not confirmed yet: open the link we e-mailed you (the notice above sends it again).',
    );
  });

  it('sends a new name, keeps the answer in the session and says it is saved', async () => {
    const { auth, typeName, save, http, fixture, text, nameInput } = open();
    expect(nameInput.value).toBe('Cat Coach');
    typeName('  Catriona Coach ');
    save();
    const request = await vi.waitFor(() => http.expectOne('/api/auth/me'));
    expect(request.request.method).toBe('PATCH');
    expect(request.request.body).toEqual({ name: 'Catriona Coach' });
    request.flush(user('coach', 'Catriona Coach'));
    fixture.detectChanges();
    expect(auth.user()?.name).toBe('Catriona Coach');
    // Kept across a reload too.
    expect(JSON.parse(localStorage.getItem('conewise.session')!).user.name).toBe('Catriona Coach');
    expect(text('name-saved')).toContain('Your name is saved.');
    expect(nameInput.value).toBe('Catriona Coach');
    expect(fixture.nativeElement.querySelector('[data-testid=save-name]').disabled).toBe(true);
  });

  it('says a blank name under the field and sends nothing', async () => {
    const { typeName, save, http, fixture, el, auth } = open();
    typeName('   ');
    save();
    await vi.waitFor(() => {
      fixture.detectChanges();
      expect(el.querySelector('mat-error')?.textContent).toContain('Your name is needed.');
    });
    http.expectNone('/api/auth/me');
    expect(auth.user()?.name).toBe('Cat Coach');
  });

  it('puts the server’s refusal under the field and keeps the saved name', async () => {
    const { typeName, save, http, fixture, el, auth } = open();
    typeName('Someone Else');
    save();
    const request = await vi.waitFor(() => http.expectOne('/api/auth/me'));
    request.flush(
      { title: 'Invalid request', status: 400, errors: [{ field: 'name', message: 'is needed' }] },
      { status: 400, statusText: 'Bad Request' },
    );
    fixture.detectChanges();
    expect(el.querySelector('mat-error')?.textContent).toContain('Your name is needed.');
    expect(auth.user()?.name).toBe('Cat Coach');
  });
});
