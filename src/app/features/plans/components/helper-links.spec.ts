import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import type { CreatedHelperLinkDto, HelperLinkDto } from '../../../../../shared/types';
import { HelperLinks } from './helper-links';

const LIST = '/api/plans/plan-1/helper-links';

function link(id: string, over: Partial<HelperLinkDto> = {}): HelperLinkDto {
  return {
    id,
    planId: 'plan-1',
    createdAt: '2026-12-02T16:00:00.000Z',
    expiresAt: '2026-12-09T23:00:00.000Z',
    createdByName: 'Rhea Coach',
    emailedTo: 0,
    ...over,
  };
}

const settle = async (fixture: { whenStable(): Promise<unknown>; detectChanges(): void }) => {
  await fixture.whenStable();
  fixture.detectChanges();
};

describe('HelperLinks', () => {
  function setUp() {
    TestBed.configureTestingModule({
      imports: [HelperLinks],
      providers: [provideHttpClient(), provideHttpClientTesting()],
    });
    const fixture = TestBed.createComponent(HelperLinks);
    fixture.componentRef.setInput('planId', 'plan-1');
    fixture.detectChanges();
    return {
      fixture,
      http: TestBed.inject(HttpTestingController),
      root: fixture.nativeElement as HTMLElement,
    };
  }

  const items = (root: HTMLElement) =>
    Array.from(root.querySelectorAll('[data-testid="helper-link-item"]')).map((li) => li.textContent ?? '');

  it('lists the live links with who made them and how many they were e-mailed to', async () => {
    const { fixture, http, root } = setUp();
    http.expectOne(LIST).flush([link('a', { emailedTo: 2 }), link('b', { createdByName: null })]);
    await settle(fixture);
    const [first, second] = items(root);
    expect(first).toContain('by Rhea Coach');
    expect(first).toContain('e-mailed to 2 people');
    expect(second).not.toContain(' by ');
  });

  it('shows a new link to copy, and a list answer that left before it was made does not hide it', async () => {
    const { fixture, http, root } = setUp();
    const first = http.expectOne(LIST);
    root.querySelector<HTMLButtonElement>('[data-testid="helper-link-make"]')!.click();
    const made: CreatedHelperLinkDto = { ...link('new'), url: 'http://club.test/helper#' + 'x'.repeat(43) };
    http.expectOne({ method: 'POST', url: LIST }).flush(made);
    // The list asked for before the link existed answers last, and empty.
    first.flush([]);
    await settle(fixture);
    expect(root.querySelector<HTMLInputElement>('[data-testid="helper-link-url"]')!.value).toBe(made.url);
    expect(items(root)).toHaveLength(1);
    http.expectOne({ method: 'GET', url: LIST }).flush([made]);
    await settle(fixture);
    expect(items(root)).toHaveLength(1);
  });

  it('stops a link: it leaves the list and its address is no longer offered', async () => {
    const { fixture, http, root } = setUp();
    http.expectOne(LIST).flush([link('a'), link('b')]);
    await settle(fixture);
    root.querySelector<HTMLButtonElement>('[data-testid="helper-link-revoke"]')!.click();
    const stop = http.expectOne({ method: 'DELETE', url: `${LIST}/a` });
    stop.flush(null, { status: 204, statusText: 'No Content' });
    await settle(fixture);
    expect(items(root)).toHaveLength(1);
    http.expectOne({ method: 'GET', url: LIST }).flush([link('b')]);
    await settle(fixture);
    expect(items(root)).toHaveLength(1);
  });

  it('says why a link cannot be made, in the server’s words', async () => {
    const { fixture, http, root } = setUp();
    http.expectOne(LIST).flush([]);
    root.querySelector<HTMLButtonElement>('[data-testid="helper-link-make"]')!.click();
    http.expectOne({ method: 'POST', url: LIST }).flush(
      {
        type: '/problems/conflict',
        title: 'Conflict',
        status: 409,
        detail:
          'This session is more than a day ago, and a helper link only works until the end of the day after the session.',
      },
      { status: 409, statusText: 'Conflict' },
    );
    await settle(fixture);
    expect(root.querySelector('[role="alert"]')!.textContent).toContain('more than a day ago');
  });
});
