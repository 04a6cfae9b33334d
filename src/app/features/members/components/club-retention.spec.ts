import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { provideRouter } from '@angular/router';
import { ClubRetention } from './club-retention';

const settle = async (fixture: { whenStable(): Promise<unknown>; detectChanges(): void }) => {
  for (let i = 0; i < 5; i++) await new Promise((resolve) => setTimeout(resolve, 10));
  await fixture.whenStable();
  fixture.detectChanges();
};

describe('ClubRetention', () => {
  function open() {
    TestBed.configureTestingModule({
      imports: [ClubRetention],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideNoopAnimations(),
        provideRouter([]),
      ],
    });
    const fixture = TestBed.createComponent(ClubRetention);
    fixture.detectChanges();
    return {
      fixture,
      root: fixture.nativeElement as HTMLElement,
      http: TestBed.inject(HttpTestingController),
    };
  }

  it("shows the club's setting, saves a new one at once and says so", async () => {
    const { fixture, root, http } = open();
    http.expectOne('/api/club/retention').flush({ seasons: 3 });
    await settle(fixture);
    const select = root.querySelector<HTMLElement>('[data-testid=club-retention-seasons]')!;
    expect(select.textContent).toContain('3 seasons');
    expect(root.querySelector('a[href="/privacy"]')).not.toBeNull();

    select.querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
    await settle(fixture);
    const options = Array.from(document.querySelectorAll<HTMLElement>('mat-option'));
    expect(options.map((o) => o.textContent!.trim())).toEqual([
      '1 season',
      '2 seasons',
      '3 seasons',
      '4 seasons',
      '5 seasons',
      '6 seasons',
      '7 seasons',
      '8 seasons',
      '9 seasons',
      '10 seasons',
    ]);
    options[0].click();
    await settle(fixture);
    const put = http.expectOne('/api/club/retention');
    expect(put.request.method).toBe('PUT');
    expect(put.request.body).toEqual({ seasons: 1 });
    put.flush({ seasons: 1 });
    await settle(fixture);
    expect(root.querySelector('[data-testid=club-retention-saved]')?.textContent).toContain(
      'Saved for the club.',
    );
    http.verify();
  });

  it('says in words when the change is refused', () => {
    const { fixture, root, http } = open();
    http
      .expectOne('/api/club/retention')
      .flush(
        { title: 'Your role in the club does not allow this.' },
        { status: 403, statusText: 'Forbidden' },
      );
    fixture.detectChanges();
    expect(root.querySelector('[role=alert]')?.textContent).toContain('does not allow this');
  });
});
