import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { TeamInsightDto } from '../../../../shared/types/plan-api';
import { TeamInsightPage } from './team-insight-page';

const data: TeamInsightDto = {
  teamId: 't1',
  squadSize: 3,
  sessions: [
    {
      planId: 'p1',
      date: '2026-11-20',
      createdAt: '2026-11-20T10:00:00Z',
      kind: 'training',
      present: 3,
      recorded: true,
      cameLate: 1,
      leftEarly: 0,
      touches: {},
    },
    {
      planId: 'p2',
      date: '2026-11-27',
      createdAt: '2026-11-27T10:00:00Z',
      kind: 'training',
      present: 2,
      recorded: false,
      cameLate: 0,
      leftEarly: 0,
      touches: {},
    },
  ],
  players: [
    {
      playerId: 'a',
      displayName: 'Ada K.',
      active: true,
      sessionsAttended: 2,
      totalTouches: 160,
      averageTouches: 80,
    },
    {
      playerId: 'b',
      displayName: 'Bo L.',
      active: true,
      sessionsAttended: 2,
      totalTouches: 150,
      averageTouches: 75,
    },
    {
      playerId: 'c',
      displayName: 'Cy M.',
      active: true,
      sessionsAttended: 1,
      totalTouches: 40,
      averageTouches: 40,
    },
  ],
  estimateNote: 'Touches are estimates from per-activity rates.',
};

describe('TeamInsightPage', () => {
  it('shows the text summary beside the charts, naming who gets less of the ball', async () => {
    TestBed.configureTestingModule({
      imports: [TeamInsightPage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideRouter([])],
    });
    const fixture = TestBed.createComponent(TeamInsightPage);
    fixture.componentRef.setInput('teamId', 't1');
    fixture.detectChanges();
    const http = TestBed.inject(HttpTestingController);
    http.expectOne('/api/teams/t1/insight').flush(data);
    http.expectOne('/api/teams/t1').flush({ id: 't1', name: 'U8 Hares' });
    await fixture.whenStable();
    const el = fixture.nativeElement as HTMLElement;
    const summary = el.querySelector('[data-testid=insight-summary]')?.textContent ?? '';
    expect(summary).toContain('On average 2.5 of 3 players came to each of 2 sessions.');
    expect(summary).toContain('Every player came to at least half of them.');
    expect(summary).toContain('Counted as came: 1 late arrival.');
    expect(summary).not.toContain('Came least');
    expect(summary).toContain('Getting less of the ball: Cy M. (about 40)');
    expect(el.querySelectorAll('canvas[role=img]').length).toBe(2);
    const rows = Array.from(el.querySelectorAll('[data-testid=touches-table] tbody tr'));
    expect(rows[0].textContent).toContain('Cy M.');
    expect(rows[0].className).toContain('cw-insight__low');
    expect(el.querySelector('h1')?.textContent).toContain('U8 Hares');
  });
});
