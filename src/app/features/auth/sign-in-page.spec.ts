import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter, Router } from '@angular/router';
import { AuthStore } from '../../core/auth/auth-store';
import { SignInPage } from './sign-in-page';

describe('SignInPage', () => {
  function setUp() {
    TestBed.configureTestingModule({
      imports: [SignInPage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
    const fixture = TestBed.createComponent(SignInPage);
    fixture.detectChanges();
    const root = fixture.nativeElement as HTMLElement;
    const type = (id: string, value: string) => {
      const input = root.querySelector<HTMLInputElement>(`#${id}`)!;
      input.value = value;
      input.dispatchEvent(new Event('input'));
    };
    const submit = async () => {
      root.querySelector<HTMLButtonElement>('button[type="submit"]')!.click();
      await fixture.whenStable();
      fixture.detectChanges();
    };
    return { fixture, root, type, submit, http: TestBed.inject(HttpTestingController) };
  }

  afterEach(() => localStorage.clear());

  it('labels each field, and says what is missing under it without sending anything', async () => {
    const { root, submit, http, type } = setUp();
    expect(root.querySelector('label[for="sign-in-email"]')!.textContent).toBe('E-mail');
    expect(root.querySelector('label[for="sign-in-password"]')!.textContent).toBe('Password');
    await submit();
    expect(root.querySelector('#sign-in-email-error')!.textContent).toBe('E-mail is needed.');
    expect(root.querySelector('#sign-in-password-error')!.textContent).toBe('Password is needed.');
    expect(root.querySelector('#sign-in-email')!.getAttribute('aria-describedby')).toBe(
      'sign-in-email-error',
    );
    expect(document.activeElement?.id).toBe('sign-in-email');
    type('sign-in-email', 'coach.example.org');
    type('sign-in-password', 'x');
    await submit();
    expect(root.querySelector('#sign-in-email-error')!.textContent).toBe(
      'E-mail must be an e-mail address like name@example.org.',
    );
    expect(root.querySelector('#sign-in-password-error')).toBeNull();
    http.expectNone('/api/auth/login');
  });

  it('signs in, keeps the session and goes where the guard asked', async () => {
    const { fixture, type, submit, http } = setUp();
    fixture.componentRef.setInput('returnTo', '/teams');
    const navigate = vi.spyOn(TestBed.inject(Router), 'navigateByUrl').mockResolvedValue(true);
    type('sign-in-email', ' rhea@example.org ');
    type('sign-in-password', 'secret words');
    await submit();
    const request = http.expectOne('/api/auth/login');
    expect(request.request.body).toEqual({ email: 'rhea@example.org', password: 'secret words' });
    // A second tap while the first is on its way sends nothing more.
    await submit();
    http.expectNone('/api/auth/login');
    request.flush({
      token: 't',
      user: {
        id: 'u',
        name: 'Rhea',
        email: 'rhea@example.org',
        clubId: 'c',
        clubName: 'Harbour',
        role: 'coach',
      },
    });
    expect(TestBed.inject(AuthStore).signedIn()).toBe(true);
    expect(navigate).toHaveBeenCalledWith('/teams');
  });

  it("shows the server's refusal above the form and pins field messages under their fields", async () => {
    const { root, type, submit, http, fixture } = setUp();
    type('sign-in-email', 'rhea@example.org');
    type('sign-in-password', 'wrong');
    await submit();
    http
      .expectOne('/api/auth/login')
      .flush(
        { title: 'Not signed in', detail: 'That e-mail and password do not match.', status: 401 },
        { status: 401, statusText: 'Unauthorized' },
      );
    fixture.detectChanges();
    expect(root.querySelector('[role="alert"]')!.textContent).toContain(
      'That e-mail and password do not match.',
    );
    expect(root.querySelector<HTMLButtonElement>('button[type="submit"]')!.disabled).toBe(false);
    await submit();
    http.expectOne('/api/auth/login').flush(
      {
        title: 'Invalid request',
        status: 400,
        errors: [{ field: 'password', message: 'Password is too long.' }],
      },
      { status: 400, statusText: 'Bad Request' },
    );
    fixture.detectChanges();
    expect(root.querySelector('#sign-in-password-error')!.textContent).toBe('Password is too long.');
  });
});
