import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { ActivatedRouteSnapshot, convertToParamMap, RouterStateSnapshot } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { PlanHandover } from './plan-handover';
import { prefetchPlan, PlanPrefetch } from './plan-prefetch';

describe('PlanPrefetch', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
  });

  const resolve = (planId: string) =>
    TestBed.runInInjectionContext(() =>
      prefetchPlan(
        { paramMap: convertToParamMap({ planId }) } as ActivatedRouteSnapshot,
        {} as RouterStateSnapshot,
      ),
    );

  it('sends the read when the route resolves and hands its answer to the page once', async () => {
    const http = TestBed.inject(HttpTestingController);
    expect(resolve('p-1')).toBe(true);
    // Sent before any page asked for it.
    const request = http.expectOne('/api/plans/p-1');
    const prefetch = TestBed.inject(PlanPrefetch);
    const taken = prefetch.take('p-1')!;
    request.flush({ id: 'p-1', version: 3 });
    expect(await firstValueFrom(taken)).toEqual({ id: 'p-1', version: 3 });
    expect(prefetch.take('p-1')).toBeNull();
    http.verify();
  });

  it('gives nothing for another plan, and reads nothing for a plan the wizard handed over', () => {
    const http = TestBed.inject(HttpTestingController);
    TestBed.inject(PlanHandover).give({ id: 'p-2' } as never);
    resolve('p-2');
    http.expectNone('/api/plans/p-2');
    resolve('p-3');
    http.expectOne('/api/plans/p-3').flush({ id: 'p-3' });
    expect(TestBed.inject(PlanPrefetch).take('p-4')).toBeNull();
  });
});
