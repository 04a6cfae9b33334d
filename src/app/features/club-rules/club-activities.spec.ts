import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import defaultRules from '../../../../rules/default-rule-set.json';
import type { ActivityDefinition, RuleSetDocument } from '../../../../shared/types';
import { ClubActivities, type ActivityEdit } from './club-activities';

const rules = () => structuredClone(defaultRules) as unknown as RuleSetDocument;

describe('ClubActivities', () => {
  async function setUp(body: RuleSetDocument, readOnly = false) {
    TestBed.configureTestingModule({ imports: [ClubActivities], providers: [provideNoopAnimations()] });
    const fixture = TestBed.createComponent(ClubActivities);
    fixture.componentRef.setInput('body', body);
    fixture.componentRef.setInput('readOnly', readOnly);
    const edits: ActivityEdit[] = [];
    fixture.componentInstance.edit.subscribe((e) => edits.push(e));
    await fixture.whenStable();
    const el = fixture.nativeElement as HTMLElement;
    const row = (id: string) => el.querySelector<HTMLElement>(`[data-activity="${id}"]`)!;
    const button = (root: HTMLElement, label: string) =>
      Array.from(root.querySelectorAll('button')).find((b) => b.textContent?.includes(label)) as
        | HTMLButtonElement
        | undefined;
    return { fixture, el, edits, row, button };
  }

  it('retires a starting activity into the draft and says so beside it once saved', async () => {
    const body = rules();
    const target = body.parameters.activities.find((a) => a.kind === 'ball-mastery')!;
    const index = body.parameters.activities.indexOf(target);
    const { fixture, edits, row, button } = await setUp(body);
    button(row(target.id), 'Retire')!.click();
    expect(edits).toHaveLength(1);
    expect(edits[0].pointer).toBe(`/parameters/activities/${index}/retired`);
    expect(edits[0].value).toBe(true);
    edits[0].saved();
    await fixture.whenStable();
    expect(row(target.id).textContent).toContain('plans stop choosing it');
  });

  it('refuses to retire the last activity of a kind, beside the button', async () => {
    const body = rules();
    const speed = body.parameters.activities.filter((a) => a.kind === 'speed');
    for (const a of speed.slice(1)) a.retired = true;
    const { fixture, edits, row, button } = await setUp(body);
    button(row(speed[0].id), 'Retire')!.click();
    await fixture.whenStable();
    expect(edits).toEqual([]);
    expect(row(speed[0].id).textContent).toContain('Plans need at least one speed activity');
    // A retired one can be brought back.
    button(row(speed[1].id), 'Bring back')!.click();
    expect(edits[0]).toMatchObject({
      pointer: `/parameters/activities/${body.parameters.activities.indexOf(speed[1])}/retired`,
    });
    expect(edits[0].value).toBeUndefined();
  });

  it('adds a club version of a starting activity at the end, with an id of its own', async () => {
    const body = rules();
    const source = body.parameters.activities[5];
    const { fixture, el, edits, row, button } = await setUp(body);
    button(row(source.id), 'Club version')!.click();
    await fixture.whenStable();
    const title = el.querySelector<HTMLInputElement>('[data-field=title]')!;
    expect(title.value).toBe(`${source.title} (club version)`);
    el.querySelector<HTMLButtonElement>('button[type=submit]')!.click();
    await fixture.whenStable();
    expect(edits).toHaveLength(1);
    expect(edits[0].pointer).toBe(`/parameters/activities/${body.parameters.activities.length}`);
    const added = edits[0].value as ActivityDefinition;
    expect(added).toMatchObject({ origin: 'club', kind: source.kind, coachingPoints: source.coachingPoints });
    expect(added.id).not.toBe(source.id);
    edits[0].saved();
    await fixture.whenStable();
    expect(el.querySelector('[data-testid=activity-form]')).toBeNull();
  });

  it('lists the club’s own activities, and without a draft offers them to view only', async () => {
    const body = rules();
    body.parameters.activities.push({
      ...body.parameters.activities[0],
      id: 'club-fence-rondo',
      title: 'Fence rondo',
      origin: 'club',
    });
    const { el, row, button } = await setUp(body, true);
    expect(el.querySelector('[data-testid=club-activity-list]')?.textContent).toContain('Fence rondo');
    expect(button(el, 'Add a club activity')!.disabled).toBe(true);
    expect(button(row('club-fence-rondo'), 'Retire')).toBeUndefined();
    expect(button(row('club-fence-rondo'), 'View')).toBeDefined();
  });
});
