import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import type { Type } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import type { UserDto } from '../../../../shared/types';
import { NEW_CLUB_UNIT_FIELDS } from '../../../../shared/units';
import { AuthStore } from '../../core/auth/auth-store';
import { OwnUnits } from '../../features/account/own-units';
import { ClubUnits } from '../../features/members/components/club-units';

const USER: UserDto = {
  id: 'u1',
  name: 'Cas Coach',
  email: 'cas@example.org',
  emailVerified: true,
  clubId: 'c1',
  clubName: 'Club',
  role: 'lead',
  ...NEW_CLUB_UNIT_FIELDS,
};

const settle = async (fixture: { whenStable(): Promise<unknown>; detectChanges(): void }) => {
  for (let i = 0; i < 5; i++) await new Promise((resolve) => setTimeout(resolve, 10));
  await fixture.whenStable();
  fixture.detectChanges();
};

/** Opens a select by its test id and picks the option with these words. */
async function pick(
  root: HTMLElement,
  fixture: { whenStable(): Promise<unknown>; detectChanges(): void },
  testId: string,
  words: string,
) {
  root.querySelector<HTMLElement>(`[data-testid=${testId}] .mat-mdc-select-trigger`)!.click();
  await settle(fixture);
  const options = Array.from(document.querySelectorAll<HTMLElement>('mat-option'));
  const option = options.find((o) => o.textContent?.trim() === words);
  if (!option)
    throw new Error(`no option "${words}" in ${options.map((o) => o.textContent?.trim()).join(' | ')}`);
  option.click();
  await settle(fixture);
  return options.map((o) => o.textContent?.trim());
}

function setUp<T>(component: Type<T>) {
  TestBed.configureTestingModule({
    imports: [component],
    providers: [provideHttpClient(), provideHttpClientTesting(), provideNoopAnimations()],
  });
  TestBed.inject(AuthStore).signIn({ token: 't', user: USER });
  const fixture = TestBed.createComponent(component);
  return { fixture, root: fixture.nativeElement as HTMLElement, http: TestBed.inject(HttpTestingController) };
}

describe('unit fields', () => {
  afterEach(() => {
    TestBed.inject(HttpTestingController).verify();
    localStorage.clear();
  });

  it('on the account page offers following the club, saves a choice of its own, and goes back to the club', async () => {
    const { fixture, root, http } = setUp(OwnUnits);
    await settle(fixture);
    const offered = await pick(root, fixture, 'own-distance-unit', 'Yards');
    expect(offered).toEqual(['As the club: Metres', 'Metres', 'Yards']);
    const own = http.expectOne('/api/auth/me');
    expect(own.request.method).toBe('PATCH');
    expect(own.request.body).toEqual({ distanceUnit: 'yards' });
    own.flush({
      ...USER,
      units: { distance: 'yards', temperature: 'celsius' },
      ownUnits: { distance: 'yards', temperature: null },
    });
    await settle(fixture);
    expect(root.querySelector('[data-testid=units-saved]')?.textContent).toContain(
      'yards and Degrees Celsius',
    );
    expect(TestBed.inject(AuthStore).user()?.units.distance).toBe('yards');

    await pick(root, fixture, 'own-distance-unit', 'As the club: Metres');
    const back = http.expectOne('/api/auth/me');
    expect(back.request.body).toEqual({ distanceUnit: null });
    back.flush(USER);
    await settle(fixture);
    expect(TestBed.inject(AuthStore).user()?.units.distance).toBe('metres');
  });

  it('on the club page offers no "as the club", saves the club’s unit and reads the person again', async () => {
    const { fixture, root, http } = setUp(ClubUnits);
    http.expectOne('/api/club/units').flush({ distance: 'metres', temperature: 'celsius' });
    await settle(fixture);
    const offered = await pick(root, fixture, 'club-temperature-unit', 'Degrees Fahrenheit (°F)');
    expect(offered).toEqual(['Degrees Celsius (°C)', 'Degrees Fahrenheit (°F)']);
    const put = http.expectOne('/api/club/units');
    expect(put.request.method).toBe('PUT');
    expect(put.request.body).toEqual({ temperature: 'fahrenheit' });
    put.flush({ distance: 'metres', temperature: 'fahrenheit' });
    await settle(fixture);
    http
      .expectOne('/api/auth/me')
      .flush({ ...USER, units: { distance: 'metres', temperature: 'fahrenheit' } });
    expect(root.querySelector('[data-testid=club-units-saved]')?.textContent).toContain('Saved for the club');
    expect(TestBed.inject(AuthStore).user()?.units.temperature).toBe('fahrenheit');
  });

  it('says a refused change in words, naming the field as the select does', async () => {
    const { fixture, root, http } = setUp(ClubUnits);
    http.expectOne('/api/club/units').flush({ distance: 'metres', temperature: 'celsius' });
    await settle(fixture);
    await pick(root, fixture, 'club-distance-unit', 'Yards');
    http.expectOne('/api/club/units').flush(
      {
        title: 'Bad request',
        status: 400,
        detail: 'Check the highlighted fields.',
        errors: [{ field: 'distance', message: 'must be metres or yards' }],
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await settle(fixture);
    expect(root.querySelector('[role=alert]')?.textContent).toContain('Distances must be metres or yards.');
  });
});
