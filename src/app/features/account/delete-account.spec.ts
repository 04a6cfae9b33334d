import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { MatDialog } from '@angular/material/dialog';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { of } from 'rxjs';
import { SignOut } from '../../core/auth/sign-out';
import { DeleteAccount } from './delete-account';

function open(confirm: boolean) {
  const afterDeletion = vi.fn(() => Promise.resolve());
  const dialogOpen = vi.fn(() => ({ afterClosed: () => of(confirm) }));
  TestBed.configureTestingModule({
    imports: [DeleteAccount],
    providers: [
      provideHttpClient(),
      provideHttpClientTesting(),
      provideNoopAnimations(),
      { provide: SignOut, useValue: { afterDeletion } },
    ],
  });
  TestBed.overrideProvider(MatDialog, { useValue: { open: dialogOpen } });
  const fixture = TestBed.createComponent(DeleteAccount);
  fixture.detectChanges();
  const el = fixture.nativeElement as HTMLElement;
  const type = (value: string) => {
    const input = el.querySelector<HTMLInputElement>('[data-testid=delete-account-password]')!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    fixture.detectChanges();
  };
  const press = () => {
    el.querySelector<HTMLButtonElement>('[data-testid=delete-account]')!.click();
    fixture.detectChanges();
  };
  return { fixture, el, type, press, afterDeletion, dialogOpen, http: TestBed.inject(HttpTestingController) };
}

describe('DeleteAccount', () => {
  it('asks for the password before anything else', () => {
    const { el, press, dialogOpen, http } = open(true);
    press();
    expect(dialogOpen).not.toHaveBeenCalled();
    expect(el.textContent).toContain('Your password is needed.');
    http.verify();
  });

  it('asks once more; saying no sends nothing', () => {
    const { type, press, dialogOpen, http, afterDeletion } = open(false);
    type('my-password-1');
    press();
    expect(dialogOpen).toHaveBeenCalledTimes(1);
    http.verify();
    expect(afterDeletion).not.toHaveBeenCalled();
  });

  it('deletes with the password, then signs this device out', () => {
    const { type, press, http, afterDeletion } = open(true);
    type('my-password-1');
    press();
    const call = http.expectOne('/api/auth/me');
    expect(call.request.method).toBe('DELETE');
    expect(call.request.body).toEqual({ password: 'my-password-1' });
    call.flush(null, { status: 204, statusText: 'No Content' });
    expect(afterDeletion).toHaveBeenCalledTimes(1);
  });

  it('shows a wrong password under the field, and the last head of coaching’s refusal in words', () => {
    const { el, fixture, type, press, http, afterDeletion } = open(true);
    type('not-it');
    press();
    http.expectOne('/api/auth/me').flush(
      {
        type: '/problems/wrong-password',
        title: 'Wrong password',
        status: 400,
        detail: 'Your password is not right, so your account was not deleted.',
        errors: [{ field: 'password', message: 'is not right' }],
      },
      { status: 400, statusText: 'Bad Request' },
    );
    fixture.detectChanges();
    expect(el.textContent).toContain('Your password is not right.');
    type('my-password-1');
    press();
    const detail =
      'Millbrook Juniors needs at least one head of coaching. Make someone else head of coaching on the Members page first, then delete your account (or delete the whole club there).';
    http
      .expectOne('/api/auth/me')
      .flush(
        { type: '/problems/conflict', title: 'Conflict', status: 409, detail },
        { status: 409, statusText: 'Conflict' },
      );
    fixture.detectChanges();
    expect(el.querySelector('[data-testid=delete-account-error]')?.textContent?.trim()).toBe(detail);
    expect(afterDeletion).not.toHaveBeenCalled();
  });
});
