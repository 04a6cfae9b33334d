import { TestBed } from '@angular/core/testing';
import {
  provideRouter,
  Router,
  UrlTree,
  type ActivatedRouteSnapshot,
  type CanActivateFn,
  type RouterStateSnapshot,
} from '@angular/router';
import type { Role } from '../../shared/types';
import { NEW_CLUB_UNIT_FIELDS } from '../../shared/units';
import { routes } from './app.routes';
import { AuthStore } from './core/auth/auth-store';
import { routesFor } from './core/routing/early-screen';

/** Runs every guard on the way to `url` as the given person; the first refusal wins. */
function visit(url: string, role: Role | null): string {
  TestBed.configureTestingModule({ providers: [provideRouter([])] });
  const auth = TestBed.inject(AuthStore);
  auth.signOut();
  if (role) {
    auth.signIn({
      token: 't',
      user: {
        id: 'u1',
        name: 'Someone',
        email: 'someone@example.org',
        emailVerified: true,
        clubId: 'c1',
        clubName: 'Club',
        role,
        ...NEW_CLUB_UNIT_FIELDS,
      },
    });
  }
  const router = TestBed.inject(Router);
  for (const route of routesFor(url, routes)) {
    for (const guard of (route.canActivate ?? []) as CanActivateFn[]) {
      const answer = TestBed.runInInjectionContext(() =>
        guard({} as ActivatedRouteSnapshot, { url } as RouterStateSnapshot),
      );
      if (answer instanceof UrlTree) return router.serializeUrl(answer);
      if (answer !== true) throw new Error(`unexpected guard answer for ${url}`);
    }
  }
  return url;
}

describe('the status page route', () => {
  afterEach(() => TestBed.inject(AuthStore).signOut());

  it('opens for the head of coaching', () => {
    expect(visit('/status', 'lead')).toBe('/status');
  });

  it('sends a coach and an assistant home', () => {
    expect(visit('/status', 'coach')).toBe('/');
    TestBed.resetTestingModule();
    expect(visit('/status', 'assistant')).toBe('/');
  });

  it('asks someone signed out to sign in first', () => {
    expect(visit('/status', null)).toBe('/sign-in?returnTo=%2Fstatus');
  });
});
