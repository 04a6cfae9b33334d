import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { firstValueFrom } from 'rxjs';
import type { AttendanceDto } from '../../../../shared/types';
import { AttendanceApi } from './attendance-api';

describe('AttendanceApi', () => {
  beforeEach(() => {
    TestBed.configureTestingModule({ providers: [provideHttpClient(), provideHttpClientTesting()] });
  });

  it('reads the register and replaces it with the players who came, answering the register as kept', async () => {
    const api = TestBed.inject(AttendanceApi);
    const http = TestBed.inject(HttpTestingController);
    const kept: AttendanceDto = {
      planId: 'p-1',
      playerIds: ['a', 'b'],
      players: [{ playerId: 'a' }, { playerId: 'b', lateMinutes: 10 }],
      recorded: true,
    };

    const read = firstValueFrom(api.get('p-1'));
    http.expectOne({ method: 'GET', url: '/api/plans/p-1/attendance' }).flush({ ...kept, recorded: false });
    expect((await read).recorded).toBe(false);

    const saved = firstValueFrom(api.save('p-1', kept.players));
    const request = http.expectOne({ method: 'PUT', url: '/api/plans/p-1/attendance' });
    expect(request.request.body).toEqual({ players: kept.players });
    request.flush(kept);
    expect(await saved).toEqual(kept);
    http.verify();
  });
});
