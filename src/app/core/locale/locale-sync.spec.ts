import { ApplicationRef, PendingTasks } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { NEW_CLUB_UNIT_FIELDS } from '../../../../shared/units';
import { AuthStore } from '../auth/auth-store';
import { browserLocale } from './locale-format';
import { LocaleSync } from './locale-sync';

describe('LocaleSync', () => {
  beforeEach(() => {
    sessionStorage.clear();
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
    TestBed.inject(AuthStore).signIn({
      token: 't',
      user: {
        id: 'u1',
        name: 'Rhea Coach',
        email: 'rhea@example.org',
        clubId: 'c1',
        clubName: 'Harbour',
        emailVerified: true,
        role: 'coach',
        ...NEW_CLUB_UNIT_FIELDS,
      },
    });
  });

  afterEach(() => sessionStorage.clear());

  it('sends the browser locale once the screen has settled, not while it is still loading', async () => {
    const http = TestBed.inject(HttpTestingController);
    // The screen's first read, still on its way.
    const loading = TestBed.inject(PendingTasks).add();
    TestBed.runInInjectionContext(() => TestBed.inject(LocaleSync).start());
    TestBed.tick();
    await Promise.resolve();
    http.expectNone('/api/auth/me');

    loading();
    await TestBed.inject(ApplicationRef).whenStable();
    const sent = http.expectOne({ method: 'PATCH', url: '/api/auth/me' });
    expect(sent.request.body).toEqual({ locale: browserLocale() });
    sent.flush({});
    http.verify();
  });

  it('does not send again in the same browser session', async () => {
    const http = TestBed.inject(HttpTestingController);
    sessionStorage.setItem('conewise.locale-sent', `u1|${browserLocale()}`);
    TestBed.runInInjectionContext(() => TestBed.inject(LocaleSync).start());
    TestBed.tick();
    await TestBed.inject(ApplicationRef).whenStable();
    http.expectNone('/api/auth/me');
    http.verify();
  });
});
