import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MatDialogRef } from '@angular/material/dialog';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { MIN_PASSWORD_LENGTH } from '../../../../shared/types/password-rules';
import { AuthStore } from './auth-store';
import { ChangePasswordDialog } from './change-password-dialog';

function open() {
  TestBed.configureTestingModule({
    imports: [ChangePasswordDialog],
    providers: [
      provideHttpClient(),
      provideHttpClientTesting(),
      provideNoopAnimations(),
      { provide: MatDialogRef, useValue: { close: () => undefined } },
    ],
  });
  const auth = TestBed.inject(AuthStore);
  auth.signIn({
    token: 'old-token',
    user: {
      id: 'u1',
      name: 'Cat Coach',
      email: 'cat@example.org',
      clubId: 'c1',
      clubName: 'Club',
      role: 'coach',
    },
  } as never);
  const fixture = TestBed.createComponent(ChangePasswordDialog);
  fixture.detectChanges();
  const el = fixture.nativeElement as HTMLElement;
  const inputs = el.querySelectorAll<HTMLInputElement>('input');
  const type = (current: string, next: string) => {
    inputs[0]!.value = current;
    inputs[0]!.dispatchEvent(new Event('input'));
    inputs[1]!.value = next;
    inputs[1]!.dispatchEvent(new Event('input'));
    el.querySelector<HTMLButtonElement>('[data-testid=change-password]')!.click();
    fixture.detectChanges();
  };
  return { fixture, el, type, auth, http: TestBed.inject(HttpTestingController) };
}

describe('ChangePasswordDialog', () => {
  afterEach(() => localStorage.clear());

  it('checks the fields before sending: a short or unchanged new password is said under its field', () => {
    const { el, type, http } = open();
    // OWASP ASVS 4.0 2.1.1: at least 12 characters; one fewer is refused before anything is sent.
    expect(MIN_PASSWORD_LENGTH).toBe(12);
    expect(el.textContent).toContain('At least 12 characters, and not one of the most common passwords.');
    type('old-secret-1', 'x'.repeat(MIN_PASSWORD_LENGTH - 1));
    expect(el.textContent).toContain('New password needs at least 12 characters.');
    type('old-secret-1', 'old-secret-1');
    expect(el.textContent).toContain('The new password must differ from the current one.');
    http.expectNone('/api/auth/password');
  });

  it('says a wrong current password under its field and keeps the session', () => {
    const { el, type, http, auth, fixture } = open();
    type('not-it', 'a-brand-new-secret');
    http.expectOne('/api/auth/password').flush(
      {
        title: 'Wrong current password',
        errors: [{ field: 'currentPassword', message: 'is not your current password' }],
      },
      { status: 400, statusText: 'Bad Request' },
    );
    fixture.detectChanges();
    expect(el.textContent).toContain('Current password is not your current password.');
    expect(auth.token()).toBe('old-token');
  });

  it('shows the server’s reason for refusing a common password under the new password, as it is', () => {
    const { el, type, http, auth, fixture } = open();
    type('old-secret-1', 'password1234');
    const reason =
      'This password is one of the most commonly used ones, so it is easy to guess. Choose another.';
    http
      .expectOne('/api/auth/password')
      .flush(
        { title: 'Invalid request', errors: [{ field: 'newPassword', message: reason }] },
        { status: 400, statusText: 'Bad Request' },
      );
    fixture.detectChanges();
    const errors = Array.from(el.querySelectorAll('mat-error'), (e) => e.textContent?.trim());
    expect(errors).toContain(reason);
    expect(auth.token()).toBe('old-token');
  });

  it('changes the password, signs this device in again with it, and says the others are signed out', () => {
    const { el, type, http, auth, fixture } = open();
    type('old-secret-1', 'a-brand-new-secret');
    const change = http.expectOne('/api/auth/password');
    expect(change.request.body).toEqual({
      currentPassword: 'old-secret-1',
      newPassword: 'a-brand-new-secret',
    });
    change.flush(null, { status: 204, statusText: 'No Content' });
    const login = http.expectOne('/api/auth/login');
    expect(login.request.body).toEqual({ email: 'cat@example.org', password: 'a-brand-new-secret' });
    login.flush({ token: 'new-token', user: auth.user() });
    fixture.detectChanges();
    expect(auth.token()).toBe('new-token');
    expect(el.querySelector('[data-testid=password-changed]')?.textContent).toContain('now signed out');
  });
});
