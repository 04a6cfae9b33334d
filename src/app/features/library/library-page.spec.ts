import { provideHttpClient } from '@angular/common/http';
import { NEW_CLUB_UNIT_FIELDS } from '../../../../shared/units';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import defaultRules from '../../../../rules/default-rule-set.json';
import {
  AGE_GROUPS,
  ACTIVITY_KIND_LABELS,
  type ActivityDefinition,
  type RuleSetDocument,
  type RuleSetDto,
  type TeamDto,
  type UserDto,
} from '../../../../shared/types';
import { AuthStore } from '../../core/auth/auth-store';
import { LibraryPage, MAX_PINS } from './library-page';
import { METRIC_WORDS, YARDS_AND_FAHRENHEIT } from '../../core/units/units.testing';

const coach: UserDto = {
  id: 'u-coach',
  name: 'Ines Coach',
  email: 'ines@example.org',
  clubId: 'c1',
  clubName: 'Test Club',
  emailVerified: true,
  role: 'coach',
  ...NEW_CLUB_UNIT_FIELDS,
};
const team = (over: Partial<TeamDto>): TeamDto => ({
  id: 't12',
  name: 'Riverside U12',
  ageGroup: 'U12',
  level: 'intermediate',
  usualSpace: { width: 40, length: 50 },
  coachIds: [coach.id],
  playerCount: 12,
  pinnedActivityIds: [],
  ...over,
});
const otherTeam = team({ id: 't8', name: 'Riverside U8', ageGroup: 'U8', coachIds: ['u-other'] });
const rules = () => structuredClone(defaultRules) as unknown as RuleSetDocument;
const published = (body: RuleSetDocument): RuleSetDto => ({
  id: 'r1',
  name: 'Club rules',
  version: 2,
  status: 'published',
  body,
  authorId: 'u-lead',
  authorName: 'Lead',
  createdAt: '2026-11-01T10:00:00Z',
  updatedAt: '2026-11-01T10:00:00Z',
  revision: 1,
});
const ageIndex = (age: string) => AGE_GROUPS.indexOf(age as (typeof AGE_GROUPS)[number]);

describe('LibraryPage', () => {
  async function setUp(options: { user?: UserDto; teams?: TeamDto[]; body?: RuleSetDocument } = {}) {
    TestBed.configureTestingModule({
      imports: [LibraryPage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideNoopAnimations()],
    });
    TestBed.inject(AuthStore).signIn({ token: 'token', user: options.user ?? coach });
    const fixture = TestBed.createComponent(LibraryPage);
    const http = TestBed.inject(HttpTestingController);
    const body = options.body ?? rules();
    http.expectOne('/api/rule-sets/published').flush(published(body));
    http.expectOne('/api/teams').flush(options.teams ?? [team({}), otherTeam]);
    await fixture.whenStable();
    const el = fixture.nativeElement as HTMLElement;
    const cards = () => Array.from(el.querySelectorAll<HTMLElement>('cw-activity-card article'));
    const shownIds = () => cards().map((c) => c.dataset['activity']!);
    const card = (id: string) => el.querySelector<HTMLElement>(`article[data-activity="${id}"]`)!;
    const button = (root: HTMLElement, label: string) =>
      Array.from(root.querySelectorAll('button')).find((b) =>
        b.textContent?.includes(label),
      ) as HTMLButtonElement;
    /** Picks an option of one of the filter selects through its overlay. */
    const choose = async (testId: string, label: string) => {
      el.querySelector<HTMLElement>(`[data-testid=${testId}] .mat-mdc-select-trigger`)!.click();
      await fixture.whenStable();
      const option = Array.from(document.querySelectorAll<HTMLElement>('mat-option')).find(
        (o) => o.textContent?.trim() === label,
      )!;
      option.click();
      await fixture.whenStable();
    };
    return { fixture, http, el, body, cards, shownIds, card, button, choose };
  }

  it('starts at the coach’s first team’s age group and narrows by kind, focus and words', async () => {
    const { fixture, el, body, shownIds, choose, button } = await setUp();
    const live = body.parameters.activities.filter((a) => !a.retired);
    const forU12 = live.filter(
      (a) => ageIndex(a.ages.from) <= ageIndex('U12') && ageIndex(a.ages.to) >= ageIndex('U12'),
    );
    expect(forU12.length).toBeLessThan(live.length);
    expect(shownIds().sort()).toEqual(forU12.map((a) => a.id).sort());
    expect(el.querySelector('[data-testid=library-count]')?.textContent).toContain(
      `${forU12.length} of ${live.length} activities`,
    );

    await choose('filter-kind', ACTIVITY_KIND_LABELS['keep-ball']);
    const keepBall = forU12.filter((a) => a.kind === 'keep-ball');
    expect(keepBall.length).toBeGreaterThan(0);
    expect(shownIds().sort()).toEqual(keepBall.map((a) => a.id).sort());

    await choose('filter-focus', 'Pressing');
    const pressing = keepBall.filter((a) => a.focus.includes('pressing'));
    expect(shownIds().sort()).toEqual(pressing.map((a) => a.id).sort());

    const search = el.querySelector<HTMLInputElement>('input[type=search]')!;
    search.value = 'no activity says this';
    search.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    expect(shownIds()).toEqual([]);
    expect(el.textContent).toContain('No activity matches all of these filters.');

    button(el, 'Show all activities').click();
    await fixture.whenStable();
    expect(shownIds()).toHaveLength(live.length);
  });

  it('draws each activity from the engine’s preview and opens its coaching points and steps', async () => {
    const { fixture, card, button } = await setUp();
    const activity = rules().parameters.activities.find((a) => a.id === 'kb-ten-or-break-out')!;
    const article = card(activity.id);
    const drawing = article.querySelector('svg[role=img]')!;
    expect(drawing.getAttribute('aria-label')).toContain(ACTIVITY_KIND_LABELS['keep-ball']);
    expect(article.querySelectorAll('[data-role=defender]').length).toBeGreaterThan(0);
    expect(article.querySelector('[data-testid=activity-details]')).toBeNull();

    button(article, 'Details').click();
    await fixture.whenStable();
    const details = article.querySelector('[data-testid=activity-details]')!;
    expect(details.textContent).toContain(activity.description);
    for (const point of activity.coachingPoints) expect(details.textContent).toContain(point);
    for (const step of [...activity.easier, ...activity.harder]) expect(details.textContent).toContain(step);
  });

  it('shows a coach who reads yards every drawn size and step in yards', async () => {
    const { fixture, el, body, card, button } = await setUp({
      user: { ...coach, units: YARDS_AND_FAHRENHEIT },
    });
    // Each drawn set-up is metric inside; the cards read it in yards.
    const own = body.parameters.activities.find((a) => a.kind === 'keep-ball')!;
    expect(own).toBeDefined();
    const setups = Array.from(el.querySelectorAll('.cw-activity__setup')).map((p) => p.textContent!);
    expect(setups.length).toBeGreaterThan(0);
    for (const text of setups) expect(text).toMatch(/· \d+ × \d+ yd$/);
    for (const svg of Array.from(el.querySelectorAll('cw-station-diagram svg[role=img]')))
      expect(svg.getAttribute('aria-label')).toMatch(/ in \d+ × \d+ yd/);
    const article = card(own.id);
    button(article, 'Details').click();
    await fixture.whenStable();
    // The engine's steps for the drawn group ("Area 12 m → 14 m") in yards.
    expect(article.querySelector('[data-testid=activity-details]')!.textContent).toMatch(/Area \d+[^→]*yd →/);
    expect(el.textContent).not.toMatch(METRIC_WORDS);
  });

  it('marks the club’s own activities and never offers a retired one', async () => {
    const body = rules();
    const retired = body.parameters.activities.find((a) => a.kind === 'keep-ball' && a.ages.from === 'U9')!;
    retired.retired = true;
    const club: ActivityDefinition = {
      ...retired,
      id: 'club-fence-rondo',
      title: 'Fence rondo',
      retired: undefined,
      origin: 'club',
    };
    delete club.retired;
    body.parameters.activities.push(club);
    const { shownIds, card } = await setUp({ body });
    expect(shownIds()[0]).toBe('club-fence-rondo');
    expect(card('club-fence-rondo').querySelector('[data-testid=club-mark]')?.textContent).toContain(
      'Our club',
    );
    expect(shownIds()).not.toContain(retired.id);
    const plain = shownIds().find((id) => id !== 'club-fence-rondo')!;
    expect(card(plain).querySelector('[data-testid=club-mark]')).toBeNull();
  });

  it('pins an activity for the coach’s team on top of its pins, says so on the card, and unpins it', async () => {
    const { fixture, http, card, button } = await setUp({
      teams: [team({ pinnedActivityIds: ['bm-turn-and-go'] }), otherTeam],
    });
    const article = card('kb-ten-or-break-out');
    button(article, 'Pin for next plan').click();
    const put = http.expectOne('/api/teams/t12/pinned-activities');
    expect(put.request.method).toBe('PUT');
    expect(put.request.body).toEqual({ activityIds: ['bm-turn-and-go', 'kb-ten-or-break-out'] });
    put.flush({ activityIds: ['bm-turn-and-go', 'kb-ten-or-break-out'] });
    await fixture.whenStable();
    expect(article.querySelector('[data-testid=pinned-by]')?.textContent).toContain('Riverside U12');
    expect(article.querySelector('.cw-activity__message')?.textContent).toContain('Pinned for Riverside U12');

    button(article, 'Unpin').click();
    const unpin = http.expectOne('/api/teams/t12/pinned-activities');
    expect(unpin.request.body).toEqual({ activityIds: ['bm-turn-and-go'] });
    unpin.flush({ activityIds: ['bm-turn-and-go'] });
    await fixture.whenStable();
    expect(article.querySelector('[data-testid=pinned-by]')).toBeNull();
    expect(article.querySelector('.cw-activity__message')?.textContent).toContain(
      'Unpinned from Riverside U12',
    );
  });

  it('drops a pin the club has since retired when the coach pins another', async () => {
    const body = rules();
    const retired = body.parameters.activities.find((a) => a.id !== 'kb-ten-or-break-out')!;
    retired.retired = true;
    const { http, card, button, el } = await setUp({
      body,
      teams: [team({ pinnedActivityIds: [retired.id] })],
    });
    expect(el.querySelector('[data-testid=pin-summary]')?.textContent).toContain(
      'An activity no longer offered',
    );
    button(card('kb-ten-or-break-out'), 'Pin for next plan').click();
    const put = http.expectOne('/api/teams/t12/pinned-activities');
    expect(put.request.body).toEqual({ activityIds: ['kb-ten-or-break-out'] });
  });

  it('refuses a pin beyond the limit beside the button, without asking the server', async () => {
    const full = rules()
      .parameters.activities.filter((a) => a.id !== 'kb-ten-or-break-out')
      .slice(0, MAX_PINS)
      .map((a) => a.id);
    const { fixture, http, card, button } = await setUp({
      teams: [team({ pinnedActivityIds: full })],
    });
    const article = card('kb-ten-or-break-out');
    button(article, 'Pin for next plan').click();
    await fixture.whenStable();
    http.expectNone('/api/teams/t12/pinned-activities');
    const message = article.querySelector('.cw-activity__message')!;
    expect(message.textContent).toContain(`already has ${MAX_PINS} pinned activities`);
    expect(message.classList).toContain('cw-activity__message--error');
  });

  it('lets the lead pin for any team from a menu that shows which teams have it', async () => {
    const lead: UserDto = { ...coach, id: 'u-lead', role: 'lead' };
    const { fixture, http, el, card, button } = await setUp({
      user: lead,
      teams: [team({ pinnedActivityIds: ['kb-ten-or-break-out'] }), otherTeam],
    });
    // The lead staffs no team: every age is shown.
    expect(el.querySelector('[data-testid=library-count]')?.textContent).not.toContain(' for ');
    const article = card('kb-ten-or-break-out');
    button(article, 'Pin for a team').click();
    await fixture.whenStable();
    const items = Array.from(document.querySelectorAll<HTMLElement>('[role=menuitemcheckbox]'));
    expect(
      items.map((i) => [
        i.querySelector('.mat-mdc-menu-item-text')?.textContent?.trim(),
        i.getAttribute('aria-checked'),
      ]),
    ).toEqual([
      ['Riverside U12', 'true'],
      ['Riverside U8', 'false'],
    ]);
    items[1].click();
    const put = http.expectOne('/api/teams/t8/pinned-activities');
    expect(put.request.body).toEqual({ activityIds: ['kb-ten-or-break-out'] });
    put.flush({ activityIds: ['kb-ten-or-break-out'] });
    await fixture.whenStable();
    expect(article.querySelector('[data-testid=pinned-by]')?.textContent).toContain(
      'Riverside U12, Riverside U8',
    );
  });

  it('shows everyone which teams pinned an activity, but offers an assistant no pin button', async () => {
    const assistant: UserDto = { ...coach, id: 'u-assistant', role: 'assistant' };
    const { card, el } = await setUp({
      user: assistant,
      teams: [team({ coachIds: [coach.id, assistant.id], pinnedActivityIds: ['kb-ten-or-break-out'] })],
    });
    expect(card('kb-ten-or-break-out').querySelector('[data-testid=pinned-by]')?.textContent).toContain(
      'Riverside U12',
    );
    expect(el.querySelector('.cw-activity__pin')).toBeNull();
  });
});
