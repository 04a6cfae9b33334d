import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import defaultRules from '../../../../rules/default-rule-set.json';
import { kindLayouts } from '../../../../engine/index';
import {
  ACTIVITY_KIND_LABELS,
  type ActivityDefinition,
  type RuleSetDocument,
} from '../../../../shared/types';
import { ActivityForm } from './activity-form';
import { AuthStore } from '../../core/auth/auth-store';
import { METRIC_WORDS, signInReading, YARDS_AND_FAHRENHEIT } from '../../core/units/units.testing';
import { ACTIVITY_LIMITS } from './services/activity-draft';

const rules = () => structuredClone(defaultRules) as unknown as RuleSetDocument;

describe('ActivityForm', () => {
  async function setUp(
    options: { activity?: ActivityDefinition; index?: number; readOnly?: boolean; yards?: boolean } = {},
  ) {
    TestBed.configureTestingModule({ imports: [ActivityForm], providers: [provideNoopAnimations()] });
    if (options.yards) signInReading(TestBed.inject(AuthStore), YARDS_AND_FAHRENHEIT, 'lead');
    const fixture = TestBed.createComponent(ActivityForm);
    const body = rules();
    fixture.componentRef.setInput('ruleSet', body);
    if (options.activity) fixture.componentRef.setInput('activity', options.activity);
    if (options.index !== undefined) fixture.componentRef.setInput('index', options.index);
    if (options.readOnly) fixture.componentRef.setInput('readOnly', true);
    const saved: ActivityDefinition[] = [];
    fixture.componentInstance.save.subscribe((a) => saved.push(a));
    await fixture.whenStable();
    const el = fixture.nativeElement as HTMLElement;
    const field = (name: string) => el.querySelector<HTMLInputElement>(`[data-field="${name}"]`)!;
    const type = async (name: string, value: string | number) => {
      const input = field(name);
      input.value = String(value);
      input.dispatchEvent(new Event('input'));
      input.dispatchEvent(new Event('blur'));
      await fixture.whenStable();
    };
    const line = (key: string) => el.querySelector<HTMLInputElement>(`[data-line="${key}"]`)!;
    const typeLine = async (key: string, value: string) => {
      line(key).value = value;
      line(key).dispatchEvent(new Event('input'));
      line(key).dispatchEvent(new Event('blur'));
      await fixture.whenStable();
    };
    /** The message shown in the form field that holds the named input. */
    const messageAt = (name: string) =>
      field(name)?.closest('mat-form-field')?.querySelector('mat-error')?.textContent?.trim() ?? '';
    const submit = async () => {
      el.querySelector<HTMLButtonElement>('button[type=submit]')!.click();
      await fixture.whenStable();
    };
    const chooseOption = async (name: string, label: string) => {
      field(name).querySelector<HTMLElement>('.mat-mdc-select-trigger')!.click();
      await fixture.whenStable();
      Array.from(document.querySelectorAll<HTMLElement>('mat-option'))
        .find((o) => o.textContent?.trim() === label)!
        .click();
      await fixture.whenStable();
    };
    const diagramLabel = () =>
      el.querySelector('[data-testid=activity-preview] svg[role=img]')?.getAttribute('aria-label') ?? null;
    return { fixture, el, body, saved, field, type, typeLine, messageAt, submit, chooseOption, diagramLabel };
  }

  async function fillValid(t: Awaited<ReturnType<typeof setUp>>) {
    await t.type('title', 'Fence rondo');
    await t.type('summary', 'Keep the ball against the fence line with one defender.');
    await t.type(
      'description',
      'Four on the outside keep the ball from one in the middle; the fence is a team-mate.',
    );
    await t.typeLine('coachingPoints.0', 'Open your body to see two passes');
  }

  it('says what each field needs in a coach’s words once a save is tried, and saves nothing', async () => {
    const t = await setUp();
    expect(t.messageAt('title')).toBe('');
    await t.submit();
    expect(t.saved).toEqual([]);
    expect(t.messageAt('title')).toBe('Name is needed.');
    expect(t.messageAt('summary')).toBe('One-line summary is needed.');
    expect(t.messageAt('description')).toBe('What the players do is needed.');
    expect(t.el.querySelector('[data-list=coachingPoints] .cw-field-error')?.textContent).toContain(
      'Add at least one coaching point.',
    );
    expect(t.el.querySelector('[data-testid=form-problems]')?.textContent).toContain(
      '4 fields need a change',
    );
    expect(t.field('title').getAttribute('aria-invalid')).toBe('true');
  });

  it('maps the engine’s check of the draft back to the fields, and saves once they are fixed', async () => {
    const t = await setUp();
    await fillValid(t);
    await t.type('players.min', 9);
    await t.type('players.max', 3);
    // Only the engine's rule-set check knows min ≤ max; its pointer ends at /players.
    expect(t.messageAt('players.max')).toBe('Most players must be at least the fewest players.');
    await t.submit();
    expect(t.saved).toEqual([]);

    await t.type('players.max', 12);
    expect(t.messageAt('players.max')).toBe('');
    await t.type('title', 'x'.repeat(ACTIVITY_LIMITS.title + 1));
    expect(t.messageAt('title')).toBe(
      `Name: keep it to ${ACTIVITY_LIMITS.title} characters (now ${ACTIVITY_LIMITS.title + 1}).`,
    );
    await t.type('title', rules().parameters.activities[0].title);
    expect(t.messageAt('title')).toContain('Another activity is already called');
    await t.type('title', 'Fence rondo');
    await t.submit();
    expect(t.saved).toHaveLength(1);
    expect(t.saved[0]).toMatchObject({
      id: 'club-fence-rondo',
      origin: 'club',
      title: 'Fence rondo',
      players: { min: 9, max: 12 },
      coachingPoints: ['Open your body to see two passes'],
    });
  });

  it('draws the activity as typed with the engine, following the kind and its set-ups', async () => {
    const t = await setUp();
    expect(t.diagramLabel()).toContain(ACTIVITY_KIND_LABELS['ball-mastery']);
    const ballMasteryLayouts = kindLayouts('ball-mastery');
    expect(t.field('layout').textContent).toContain(ballMasteryLayouts[0].label);

    await t.chooseOption('kind', ACTIVITY_KIND_LABELS['keep-ball']);
    expect(t.diagramLabel()).toContain(ACTIVITY_KIND_LABELS['keep-ball']);
    expect(t.field('layout').textContent).toContain(kindLayouts('keep-ball')[0].label);
    expect(
      t.el.querySelectorAll('[data-testid=activity-preview] [data-role=defender]').length,
    ).toBeGreaterThan(0);

    await t.type('players.min', '');
    expect(t.diagramLabel()).toBeNull();
    expect(t.el.querySelector('[data-testid=activity-preview]')?.textContent).toContain(
      'The diagram appears once the players in a group are set.',
    );
    await t.type('players.min', 3);
    expect(t.diagramLabel()).toContain(ACTIVITY_KIND_LABELS['keep-ball']);
  });

  it('gives the preview’s size in yards to a head of coaching who reads yards', async () => {
    const t = await setUp({ activity: rules().parameters.activities[0], readOnly: true, yards: true });
    const caption = t.el.querySelector('.cw-activity-form__caption')!.textContent!;
    expect(caption).toMatch(/· \d+ × \d+ yd ·/);
    expect(t.diagramLabel()).toMatch(/ in \d+ × \d+ yd/);
    expect(t.el.querySelector('[data-testid=activity-preview]')!.textContent).not.toMatch(METRIC_WORDS);
    localStorage.clear();
  });

  it('shows a starting activity read-only, with its diagram and no save', async () => {
    const starting = rules().parameters.activities[3];
    const t = await setUp({ activity: starting, index: 3, readOnly: true });
    expect(t.field('title').value).toBe(starting.title);
    expect(t.field('title').disabled).toBe(true);
    expect(t.el.querySelector('button[type=submit]')).toBeNull();
    expect(t.diagramLabel()).toContain(ACTIVITY_KIND_LABELS[starting.kind]);
  });

  it('keeps an existing club activity’s id and place when it is changed', async () => {
    const body = rules();
    const club: ActivityDefinition = {
      ...body.parameters.activities[0],
      id: 'club-old-name',
      title: 'Old name',
      origin: 'club',
    };
    const t = await setUp({ activity: club, index: 0 });
    await t.type('title', 'New name');
    await t.submit();
    expect(t.saved[0]).toMatchObject({ id: 'club-old-name', title: 'New name', origin: 'club' });
  });
});
