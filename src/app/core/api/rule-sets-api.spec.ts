import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { firstValueFrom } from 'rxjs';
import type { RuleSetSummaryDto } from '../../../../shared/types';
import { RuleSetsApi } from './rule-sets-api';

describe('RuleSetsApi', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
  });

  it('reads a rule set and its summary by id, the id written safely into the path', async () => {
    const api = TestBed.inject(RuleSetsApi);
    const http = TestBed.inject(HttpTestingController);
    const summary: RuleSetSummaryDto = {
      id: 'rs/1',
      name: 'Fernmoor rules',
      version: 4,
      status: 'published',
      publishedAt: '2026-11-03T18:00:00.000Z',
      builtIn: false,
    };

    const read = firstValueFrom(api.summary('rs/1'));
    const request = http.expectOne('/api/rule-sets/rs%2F1/summary');
    expect(request.request.method).toBe('GET');
    request.flush(summary);
    expect(await read).toEqual(summary);

    const rules = firstValueFrom(api.get('default'));
    http.expectOne({ method: 'GET', url: '/api/rule-sets/default' }).flush({ id: 'default', version: 1 });
    expect(await rules).toEqual({ id: 'default', version: 1 });
    http.verify();
  });
});
