import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { NEW_CLUB_UNIT_FIELDS } from '../../../../../shared/units';
import { AuthStore } from '../../../core/auth/auth-store';
import { SignOut } from '../../../core/auth/sign-out';
import { DeleteClub } from './delete-club';

function open() {
  const afterDeletion = vi.fn(() => Promise.resolve());
  TestBed.configureTestingModule({
    imports: [DeleteClub],
    providers: [
      provideHttpClient(),
      provideHttpClientTesting(),
      provideNoopAnimations(),
      { provide: SignOut, useValue: { afterDeletion } },
    ],
  });
  TestBed.inject(AuthStore).signIn({
    token: 'the-token',
    user: {
      id: 'u1',
      name: 'Lena Lead',
      email: 'lena@example.org',
      emailVerified: true,
      clubId: 'c1',
      clubName: 'Millbrook Juniors',
      role: 'lead',
      ...NEW_CLUB_UNIT_FIELDS,
    },
  });
  const fixture = TestBed.createComponent(DeleteClub);
  fixture.detectChanges();
  const el = fixture.nativeElement as HTMLElement;
  const button = () => el.querySelector<HTMLButtonElement>('[data-testid=delete-club]')!;
  const type = (value: string) => {
    const input = el.querySelector<HTMLInputElement>('[data-testid=delete-club-name]')!;
    input.value = value;
    input.dispatchEvent(new Event('input'));
    fixture.detectChanges();
  };
  return { fixture, el, button, type, afterDeletion, http: TestBed.inject(HttpTestingController) };
}

describe('DeleteClub', () => {
  afterEach(() => localStorage.clear());

  it('wakes the button only once the club’s name is typed exactly', () => {
    const { button, type, http } = open();
    expect(button().disabled).toBe(true);
    type('millbrook juniors');
    expect(button().disabled).toBe(true);
    type('Millbrook Juniors');
    expect(button().disabled).toBe(false);
    http.verify();
  });

  it('deletes the club with its typed name, then signs this device out', () => {
    const { button, type, http, afterDeletion, fixture } = open();
    type('Millbrook Juniors');
    button().click();
    fixture.detectChanges();
    const call = http.expectOne('/api/club');
    expect(call.request.method).toBe('DELETE');
    expect(call.request.body).toEqual({ clubName: 'Millbrook Juniors' });
    call.flush(null, { status: 204, statusText: 'No Content' });
    expect(afterDeletion).toHaveBeenCalledTimes(1);
  });
});
