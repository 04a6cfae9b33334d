import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import { provideRouter } from '@angular/router';
import type { ScheduledSessionDto } from '../../../../../shared/types';
import { TeamSchedule } from './team-schedule';

const SESSION: ScheduledSessionDto = {
  id: 's1',
  teamId: 't1',
  teamName: 'U9 Herons',
  date: '2031-05-06',
  startTime: '18:30',
  kind: 'training',
  minutes: 60,
  place: 'Meadow Lane',
  timeZone: 'Europe/London',
  planId: null,
};

const settle = async (fixture: { whenStable(): Promise<unknown>; detectChanges(): void }) => {
  for (let i = 0; i < 5; i++) await new Promise((resolve) => setTimeout(resolve, 10));
  await fixture.whenStable();
  fixture.detectChanges();
};

/** A control's name as a screen reader says it: its label, else its text (icons are SVG and add none). */
function nameOf(element: Element): string {
  const label = element.getAttribute('aria-label');
  if (label) return label.trim();
  return (element.textContent ?? '').trim();
}

const buttons = (root: HTMLElement) => Array.from(root.querySelectorAll('button, a')).map(nameOf);

function button(root: HTMLElement, name: string): HTMLElement {
  const found = Array.from(root.querySelectorAll<HTMLElement>('button')).find((b) => nameOf(b) === name);
  if (!found) throw new Error(`no button "${name}" in ${buttons(root).join(' | ')}`);
  return found;
}

describe('TeamSchedule', () => {
  async function setUp(
    editable: boolean,
    canPlan: boolean,
    path: string | null = null,
    sessions: ScheduledSessionDto[] = [SESSION, { ...SESSION, id: 's2', planId: 'p9' }],
  ) {
    TestBed.configureTestingModule({
      imports: [TeamSchedule],
      providers: [
        provideHttpClient(),
        provideHttpClientTesting(),
        provideRouter([]),
        provideNoopAnimations(),
      ],
    });
    const fixture = TestBed.createComponent(TeamSchedule);
    fixture.componentRef.setInput('teamId', 't1');
    fixture.componentRef.setInput('editable', editable);
    fixture.componentRef.setInput('canPlan', canPlan);
    const http = TestBed.inject(HttpTestingController);
    fixture.detectChanges();
    http.expectOne((r) => r.url === '/api/teams/t1/schedule').flush(sessions);
    http.expectOne('/api/teams/t1/calendar').flush({ path });
    await settle(fixture);
    return { fixture, http, root: fixture.nativeElement as HTMLElement };
  }

  afterEach(() => TestBed.inject(HttpTestingController).verify());

  it('gives the team’s staff add, change and delete; a planned session links its plan, the other offers Plan it', async () => {
    const { root } = await setUp(true, true);
    const names = buttons(root);
    expect(names).toEqual(expect.arrayContaining(['Add one', 'Add weekly', 'Make a calendar link']));
    expect(names.filter((n) => n.startsWith('Delete Training'))).toHaveLength(2);
    const links = Array.from(root.querySelectorAll('a')).map((a) => [
      a.textContent?.trim(),
      a.getAttribute('href'),
    ]);
    expect(links).toContainEqual(['Plan it', '/plan/new?session=s1']);
    expect(links).toContainEqual(['Its plan', '/plans/p9']);
  });

  it('shows others the sessions and the calendar link to copy, and nothing to change', async () => {
    const { root } = await setUp(false, false, '/api/calendar/abcdefghijklmnopqrstuvwxyz.ics');
    const names = buttons(root);
    expect(names).not.toContain('Add one');
    expect(names.some((n) => n.startsWith('Delete') || n.startsWith('Change'))).toBe(false);
    expect(names).not.toContain('Plan it');
    expect(names).toContain('Copy link');
    const link = root.querySelector<HTMLInputElement>('[data-testid="calendar-link"]')!;
    expect(link.value).toBe(`${location.origin}/api/calendar/abcdefghijklmnopqrstuvwxyz.ics`);
  });

  it('lists the next five of a long term and the rest behind "Show all"', async () => {
    const term = Array.from({ length: 12 }, (_, i) => ({
      ...SESSION,
      id: `w${i}`,
      date: `2031-05-${String(6 + i).padStart(2, '0')}`,
    }));
    const { fixture, root } = await setUp(true, true, null, term);
    expect(root.querySelectorAll('[data-testid="team-schedule"] li')).toHaveLength(5);
    button(root, 'Show all 12 sessions').click();
    await settle(fixture);
    expect(root.querySelectorAll('[data-testid="team-schedule"] li')).toHaveLength(12);
    expect(buttons(root)).not.toContain('Show all 12 sessions');
  });

  it('deletes a session only on the second tap', async () => {
    const { fixture, http, root } = await setUp(true, true);
    button(
      root,
      `Delete Training on ${root.querySelector('.cw-when')!.textContent!.split(' · ')[0]}`,
    ).click();
    await settle(fixture);
    http.expectNone((r) => r.method === 'DELETE');
    expect(root.textContent).toContain('Delete this session?');
    button(root, 'Delete').click();
    const request = http.expectOne('/api/teams/t1/schedule/s1');
    expect(request.request.method).toBe('DELETE');
    request.flush(null, { status: 204, statusText: 'No Content' });
    await settle(fixture);
    expect(root.querySelectorAll('li')).toHaveLength(1);
  });
});
