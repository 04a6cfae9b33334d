import { inject } from '@angular/core';
import { CanActivateFn, Router } from '@angular/router';
import type { Role } from '../../../../shared/types';
import { AuthStore } from './auth-store';

/** Lets signed-in users through; others go to sign-in and come back afterwards. */
export const signedInGuard: CanActivateFn = (_route, state) => {
  const auth = inject(AuthStore);
  return (
    auth.signedIn() || inject(Router).createUrlTree(['/sign-in'], { queryParams: { returnTo: state.url } })
  );
};

/** Lets through only the given roles; others go home. */
export function roleGuard(...roles: Role[]): CanActivateFn {
  return (_route, state) => {
    const auth = inject(AuthStore);
    if (!auth.signedIn()) {
      return inject(Router).createUrlTree(['/sign-in'], { queryParams: { returnTo: state.url } });
    }
    return auth.hasRole(...roles) || inject(Router).createUrlTree(['/']);
  };
}

/** Keeps signed-in users away from the sign-in and create-club pages. */
export const signedOutGuard: CanActivateFn = () =>
  !inject(AuthStore).signedIn() || inject(Router).createUrlTree(['/']);
