import { provideHttpClient } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import type { TeamDto } from '../../../../../shared/types';
import { NEW_CLUB_UNIT_FIELDS, type Units } from '../../../../../shared/units';
import type { TeamBody } from '../../../core/api/teams-api';
import { AuthStore } from '../../../core/auth/auth-store';
import { TeamDefaultsForm } from './team-defaults-form';

/** A team whose usual space is a US small-sided pitch for U9–U10: 40 × 60 yd, stored in metres. */
const TEAM: TeamDto = {
  id: 't1',
  name: 'U10 Larks',
  ageGroup: 'U10',
  level: 'intermediate',
  usualSpace: { width: 36.58, length: 54.86 },
  coachIds: [],
  playerCount: 12,
  pinnedActivityIds: [],
};

const settle = async (fixture: { whenStable(): Promise<unknown>; detectChanges(): void }) => {
  for (let i = 0; i < 5; i++) await new Promise((resolve) => setTimeout(resolve, 10));
  await fixture.whenStable();
  fixture.detectChanges();
};

describe('TeamDefaultsForm', () => {
  async function setUp(units: Units, editable = true) {
    TestBed.configureTestingModule({
      imports: [TeamDefaultsForm],
      providers: [provideHttpClient(), provideNoopAnimations()],
    });
    TestBed.inject(AuthStore).signIn({
      token: 't',
      user: {
        id: 'u1',
        name: 'Cas Coach',
        email: 'cas@example.org',
        emailVerified: true,
        clubId: 'c1',
        clubName: 'Club',
        role: 'coach',
        ...NEW_CLUB_UNIT_FIELDS,
        units,
      },
    });
    const fixture = TestBed.createComponent(TeamDefaultsForm);
    fixture.componentRef.setInput('team', TEAM);
    fixture.componentRef.setInput('editable', editable);
    const saved: TeamBody[] = [];
    fixture.componentInstance.save.subscribe((body) => saved.push(body));
    await settle(fixture);
    const root = fixture.nativeElement as HTMLElement;
    const input = (name: string) => root.querySelector<HTMLInputElement>(`input[formControlName=${name}]`)!;
    const label = (name: string) =>
      input(name).closest('mat-form-field')!.querySelector('mat-label')!.textContent;
    return { fixture, root, saved, input, label };
  }

  afterEach(() => localStorage.clear());

  it('shows a coach who reads yards the usual space in whole yards and saves it in metres', async () => {
    const { root, saved, input, label } = await setUp({
      distance: 'yards',
      temperature: 'fahrenheit',
    });
    expect(label('width')).toContain('(yd)');
    expect(input('width').value).toBe('40');
    expect(input('length').value).toBe('60');

    input('length').value = '70';
    input('length').dispatchEvent(new Event('input'));
    root.querySelector<HTMLButtonElement>('[data-testid=save-team]')!.click();
    // The schema check before saving loads the schema and its validator first.
    await vi.waitFor(() => expect(saved).toHaveLength(1), { timeout: 10_000 });
    // 40 yd and 70 yd in metres, to the centimetre (shared/units metresFrom).
    expect(saved[0].usualSpace).toEqual({ width: 36.58, length: 64.01 });
  });

  it('holds the schema’s limits in the unit typed: 130 m is 142 yd', async () => {
    const { fixture, root, saved, input } = await setUp({ distance: 'yards', temperature: 'celsius' });
    input('width').value = '150';
    input('width').dispatchEvent(new Event('input'));
    root.querySelector<HTMLButtonElement>('[data-testid=save-team]')!.click();
    await vi.waitFor(
      () => {
        fixture.detectChanges();
        expect(root.querySelector('mat-error')?.textContent).toMatch(/at most 142\b/);
      },
      { timeout: 10_000 },
    );
    expect(saved).toHaveLength(0);
  });

  it('shows the read-only space in metres for a coach who reads metres', async () => {
    const { root } = await setUp({ distance: 'metres', temperature: 'celsius' }, false);
    expect(root.textContent).toContain('37 × 55 m');
  });
});
