import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { StatusPage } from './status-page';

describe('StatusPage', () => {
  function setUp() {
    TestBed.configureTestingModule({
      imports: [StatusPage],
      providers: [provideHttpClient(), provideHttpClientTesting()],
    });
    const fixture = TestBed.createComponent(StatusPage);
    const http = TestBed.inject(HttpTestingController);
    return { fixture, http, text: () => (fixture.nativeElement as HTMLElement).textContent ?? '' };
  }

  it('shows the server and database as up when health answers ok', async () => {
    const { fixture, http, text } = setUp();
    http.expectOne('/api/health').flush({ status: 'ok', db: 'up', version: '1.2.3' });
    await fixture.whenStable();
    expect(text()).toContain('Conewise is working normally.');
    expect(text()).toContain('Conewise 1.2.3');
    expect(text()).not.toMatch(/database|Server ok/);
  });

  it('shows the database as down from the body of a 503', async () => {
    const { fixture, http, text } = setUp();
    http
      .expectOne('/api/health')
      .flush(
        { status: 'degraded', db: 'down', version: '1.2.3' },
        { status: 503, statusText: 'Unavailable' },
      );
    await fixture.whenStable();
    expect(text()).toContain('Conewise cannot reach its stored plans and teams just now.');
    expect(text()).not.toContain('working normally');
  });

  it('says the server does not answer when the request fails outright', async () => {
    const { fixture, http, text } = setUp();
    http.expectOne('/api/health').error(new ProgressEvent('error'));
    await fixture.whenStable();
    expect(text()).toContain('Conewise cannot be reached.');
  });
});
