import { HttpErrorResponse, HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { Router } from '@angular/router';
import { catchError, throwError } from 'rxjs';
import { AuthStore } from './auth-store';

/** Adds the bearer token to API calls; a 401 ends the session and returns to sign-in. */
export const authInterceptor: HttpInterceptorFn = (request, next) => {
  const auth = inject(AuthStore);
  const router = inject(Router);
  const token = auth.token();
  const isApi = request.url.startsWith('/api/');
  const authorised =
    token && isApi ? request.clone({ setHeaders: { Authorization: `Bearer ${token}` } }) : request;
  return next(authorised).pipe(
    catchError((error: unknown) => {
      const isSignInCall =
        request.url.startsWith('/api/auth/login') || request.url.startsWith('/api/auth/register');
      if (error instanceof HttpErrorResponse && error.status === 401 && isApi && !isSignInCall && token) {
        auth.signOut();
        void router.navigate(['/sign-in'], { queryParams: { returnTo: router.url } });
      }
      return throwError(() => error);
    }),
  );
};
