import { HttpInterceptorFn } from '@angular/common/http';
import { inject } from '@angular/core';
import { finalize } from 'rxjs';
import { LoadingState } from './loading-state';

/** Feeds the shell's progress bar. */
export const loadingInterceptor: HttpInterceptorFn = (request, next) => {
  const loading = inject(LoadingState);
  loading.begin();
  return next(request).pipe(finalize(() => loading.end()));
};
