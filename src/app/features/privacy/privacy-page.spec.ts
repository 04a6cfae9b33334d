import { provideHttpClient } from '@angular/common/http';
import { provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { provideRouter, Router } from '@angular/router';
import { RouterTestingHarness } from '@angular/router/testing';
import { NEW_CLUB_UNIT_FIELDS } from '../../../../shared/units';
import { routes } from '../../app.routes';
import { AuthStore } from '../../core/auth/auth-store';
import { AccountPage } from '../account/account-page';
import { SignInPage } from '../auth/sign-in-page';

describe('PrivacyPage', () => {
  afterEach(() => localStorage.clear());

  it('opens at /privacy without signing in and says what is kept, who sees it, for how long and how to erase it', async () => {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter(routes)],
    });
    const harness = await RouterTestingHarness.create();
    // It opens in the public frame (no sign-in asked for).
    await harness.navigateByUrl('/privacy');
    const page = (harness.fixture.nativeElement as HTMLElement).querySelector<HTMLElement>('cw-privacy-page');
    expect(page).not.toBeNull();
    expect(TestBed.inject(Router).url).toBe('/privacy');
    const text = page!.textContent!.replace(/\s+/g, ' ');
    for (const words of [
      "Children's data in Conewise",
      'First name and initial',
      'Attendance',
      'Estimated touches',
      'Feedback',
      'The head of coaching, for every team in the club.',
      "The team's coaches and assistants, for their own team only.",
      'three seasons',
      'Invitations to join the club are removed 30 days after they expire.',
      'cleared as soon as they are sent',
    ]) {
      expect(text).toContain(words);
    }
    const buttons = Array.from(page!.querySelectorAll('li strong')).map((b) => b.textContent!.trim());
    expect(buttons).toEqual(
      expect.arrayContaining([
        "Download the club's data",
        "Download this team's data",
        'Erase from Conewise',
        'Delete my account',
        'Delete the club',
      ]),
    );
  });

  it('is linked from the sign-in page', () => {
    TestBed.configureTestingModule({
      imports: [SignInPage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
    const fixture = TestBed.createComponent(SignInPage);
    fixture.detectChanges();
    const link = (fixture.nativeElement as HTMLElement).querySelector('[data-testid=sign-in-privacy]');
    expect(link?.getAttribute('href')).toBe('/privacy');
    expect(link?.textContent?.trim()).toBe("Children's data and privacy");
  });

  it('is linked from the account page', () => {
    TestBed.configureTestingModule({
      imports: [AccountPage],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideNoopAnimations(),
        provideRouter([]),
      ],
    });
    TestBed.inject(AuthStore).signIn({
      token: 'the-token',
      user: {
        id: 'u1',
        name: 'Cat Coach',
        email: 'cat@example.org',
        emailVerified: true,
        clubId: 'c1',
        clubName: 'Millbrook Juniors',
        role: 'coach',
        ...NEW_CLUB_UNIT_FIELDS,
      },
    });
    const fixture = TestBed.createComponent(AccountPage);
    fixture.detectChanges();
    const link = (fixture.nativeElement as HTMLElement).querySelector('[data-testid=account-privacy]');
    expect(link?.getAttribute('href')).toBe('/privacy');
  });
});
