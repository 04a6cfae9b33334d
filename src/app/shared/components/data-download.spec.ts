import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { DataDownload } from './data-download';

describe('DataDownload', () => {
  let saved: { href: string; download: string }[];

  beforeEach(() => {
    saved = [];
    // jsdom has no object URLs and no navigation; what the component asks and saves is tested.
    Object.assign(URL, { createObjectURL: vi.fn(() => 'blob:export'), revokeObjectURL: vi.fn() });
    vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
      saved.push({ href: this.href, download: this.download });
    });
  });
  afterEach(() => vi.restoreAllMocks());

  async function render(teamId: string | null) {
    TestBed.configureTestingModule({
      imports: [DataDownload],
      providers: [provideHttpClient(), provideHttpClientTesting()],
    });
    const fixture = TestBed.createComponent(DataDownload);
    fixture.componentRef.setInput('teamId', teamId);
    fixture.detectChanges();
    await fixture.whenStable();
    const el = fixture.nativeElement as HTMLElement;
    const button = () => el.querySelector<HTMLButtonElement>('[data-testid="data-download"]')!;
    const settle = async () => {
      fixture.detectChanges();
      await fixture.whenStable();
      fixture.detectChanges();
    };
    return { el, button, settle, http: TestBed.inject(HttpTestingController) };
  }

  it('downloads the club’s ZIP and saves it under the name the server gave', async () => {
    const { el, button, settle, http } = await render(null);
    expect(button().textContent).toContain('Download the club’s data');
    expect(el.textContent).toContain('club rules with their history');
    button().click();
    await settle();
    expect(button().disabled).toBe(true);
    expect(button().textContent).toContain('Preparing the download…');
    const request = http.expectOne('/api/club/export');
    expect(request.request.responseType).toBe('blob');
    request.flush(new Blob(['PK'], { type: 'application/zip' }), {
      headers: { 'Content-Disposition': 'attachment; filename="conewise-hill-fc-2026-12-03.zip"' },
    });
    await settle();
    expect(saved).toEqual([{ href: 'blob:export', download: 'conewise-hill-fc-2026-12-03.zip' }]);
    expect(button().disabled).toBe(false);
    http.verify();
  });

  it('downloads one team’s part from its own address', async () => {
    const { button, settle, http } = await render('team-7');
    expect(button().textContent).toContain('Download this team’s data');
    button().click();
    await settle();
    http.expectOne('/api/teams/team-7/export').flush(new Blob(['PK']), {
      headers: { 'Content-Disposition': 'attachment; filename="conewise-hill-fc-u9-owls-2026-12-03.zip"' },
    });
    await settle();
    expect(saved.map((s) => s.download)).toEqual(['conewise-hill-fc-u9-owls-2026-12-03.zip']);
    http.verify();
  });

  it('shows the server’s own words when it refuses, and saves nothing', async () => {
    const { el, button, settle, http } = await render('team-7');
    button().click();
    await settle();
    const problem = {
      type: '/problems/forbidden',
      title: 'Forbidden',
      status: 403,
      detail: 'Only the head of coaching and the team’s coaches can download its data.',
    };
    http
      .expectOne('/api/teams/team-7/export')
      .flush(new Blob([JSON.stringify(problem)], { type: 'application/problem+json' }), {
        status: 403,
        statusText: 'Forbidden',
      });
    await settle();
    await expect
      .poll(() => {
        return el.querySelector('[role="alert"]')?.textContent?.trim();
      })
      .toBe('Only the head of coaching and the team’s coaches can download its data.');
    expect(saved).toEqual([]);
    expect(button().disabled).toBe(false);
  });
});
