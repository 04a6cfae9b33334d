import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideNoopAnimations } from '@angular/platform-browser/animations';
import type { RuleSetDto } from '../../../../shared/types';
import defaultRules from '../../../../rules/default-rule-set.json';
import { ClubRulesPage } from './club-rules-page';
import { measureIn } from '../../../../shared/units';
import { AuthStore } from '../../core/auth/auth-store';
import { signInReading, YARDS_AND_FAHRENHEIT } from '../../core/units/units.testing';

const body = () =>
  structuredClone(defaultRules) as unknown as { parameters: { cautions: { heatC: number; coldC: number } } };
const ruleSet = (over: Partial<RuleSetDto>): RuleSetDto => ({
  id: 'r1',
  name: 'Club rules',
  version: 1,
  status: 'published',
  body: body(),
  authorId: 'u1',
  authorName: 'Rhona Lead',
  createdAt: '2026-11-01T10:00:00Z',
  updatedAt: '2026-11-01T10:00:00Z',
  revision: 1,
  ...over,
});

describe('ClubRulesPage', () => {
  async function setUp(versions: RuleSetDto[], units = false) {
    TestBed.configureTestingModule({
      imports: [ClubRulesPage],
      providers: [provideHttpClient(), provideHttpClientTesting(), provideNoopAnimations()],
    });
    if (units) signInReading(TestBed.inject(AuthStore), YARDS_AND_FAHRENHEIT, 'lead');
    // The activities tab is loaded on demand (@defer): its parts are resolved first.
    await TestBed.compileComponents();
    const fixture = TestBed.createComponent(ClubRulesPage);
    const http = TestBed.inject(HttpTestingController);
    http.expectOne('/api/rule-sets').flush(versions);
    const el = fixture.nativeElement as HTMLElement;
    const button = (label: string) =>
      Array.from(el.querySelectorAll('button')).find((b) =>
        b.textContent?.includes(label),
      ) as HTMLButtonElement;
    const input = (pointer: string) =>
      el.querySelector(`input[data-pointer="${pointer}"]`) as HTMLInputElement;
    return { fixture, http, el, button, input };
  }

  it('shows the published version read-only until the lead starts a draft', async () => {
    const { fixture, http, el, button, input } = await setUp([ruleSet({})]);
    await fixture.whenStable();
    expect(el.textContent).toContain('version 1');
    expect(input('/parameters/keepBall/beginner/maxAttackersPerDefender').readOnly).toBe(true);
    button('Start editing').click();
    const create = http.expectOne('/api/rule-sets');
    expect(create.request.method).toBe('POST');
    expect(create.request.body).toEqual({ name: 'Club rules', from: 'r1' });
    create.flush(ruleSet({ id: 'd2', version: 2, status: 'draft', revision: 1 }));
    await fixture.whenStable();
    expect(input('/parameters/keepBall/beginner/maxAttackersPerDefender').readOnly).toBe(false);
    expect(el.querySelector('[data-testid=draft-state]')?.textContent).toContain('Draft (version 2)');
  });

  it('with nothing published, shows the starting rules read-only and lets the lead try them', async () => {
    const { fixture, http, el, input } = await setUp([]);
    http
      .expectOne('/api/rule-sets/default')
      .flush(ruleSet({ id: 'default', authorName: 'Conewise', revision: 0 }));
    await fixture.whenStable();
    expect(el.textContent).toContain("The club uses Conewise's starting rules until you publish your own.");
    const ratio = input('/parameters/keepBall/beginner/maxAttackersPerDefender');
    expect(ratio.readOnly).toBe(true);
    expect(Number(ratio.value)).toBe(
      (defaultRules as { parameters: { keepBall: { beginner: { maxAttackersPerDefender: number } } } })
        .parameters.keepBall.beginner.maxAttackersPerDefender,
    );
    const tryIt = Array.from(el.querySelectorAll<HTMLElement>('[role=tab]')).find(
      (t) => t.textContent?.trim() === 'Try it',
    )!;
    tryIt.click();
    fixture.detectChanges();
    await fixture.whenStable();
    expect(el.textContent).toContain('No draft yet: both columns show the rules in use.');
  });

  it('on a 409 keeps the edit, then reloads the other save and re-applies it on top', async () => {
    const { fixture, http, el, button, input } = await setUp([
      ruleSet({ id: 'd2', version: 2, status: 'draft', revision: 3 }),
      ruleSet({}),
    ]);
    await fixture.whenStable();
    const cold = input('/parameters/cautions/coldC');
    cold.value = '2';
    cold.dispatchEvent(new Event('change'));
    await fixture.whenStable();
    expect(el.querySelector('[data-testid=draft-state]')?.textContent).toContain('1 unsaved');

    button('Save draft').click();
    const stale = http.expectOne('/api/rule-sets/d2');
    expect(stale.request.method).toBe('PUT');
    expect(stale.request.headers.get('If-Match')).toBe('"3"');
    stale.flush(
      {
        type: '/problems/stale-revision',
        title: 'Conflict',
        status: 409,
        detail: 'Someone saved this draft.',
        currentRevision: 4,
      },
      { status: 409, statusText: 'Conflict' },
    );
    await fixture.whenStable();
    expect(el.querySelector('[data-testid=conflict]')?.textContent).toContain('nothing of yours is lost');
    expect(el.querySelector('[data-testid=conflict] h2')?.textContent).toContain(
      'Someone else saved these rules while you were editing',
    );

    button('re-apply my changes').click();
    const theirs = body();
    theirs.parameters.cautions.heatC = 30;
    http.expectOne('/api/rule-sets/d2').flush(
      ruleSet({
        id: 'd2',
        version: 2,
        status: 'draft',
        revision: 4,
        body: theirs,
        authorName: 'Other Lead',
      }),
    );
    await fixture.whenStable();
    expect(el.querySelector('[data-testid=conflict]')).toBeNull();
    expect(el.textContent).toContain("Loaded Other Lead's save and re-applied your 1 change");

    button('Save draft').click();
    const retry = http.expectOne('/api/rule-sets/d2');
    expect(retry.request.headers.get('If-Match')).toBe('"4"');
    const sent = retry.request.body as {
      body: { parameters: { cautions: { heatC: number; coldC: number } } };
    };
    expect(sent.body.parameters.cautions).toEqual({ heatC: 30, coldC: 2 });
  });

  it('pins a rule problem found by the engine in the browser', async () => {
    const { fixture, el, input } = await setUp([
      ruleSet({ id: 'd2', version: 2, status: 'draft', revision: 1 }),
    ]);
    await fixture.whenStable();
    const formats = input('/parameters/keepBall/beginner/formats');
    formats.value = '5v1';
    formats.dispatchEvent(new Event('change'));
    await expect
      .poll(async () => {
        await fixture.whenStable();
        return el.querySelector('[data-testid=problem-count]')?.textContent ?? '';
      })
      .toContain('1 problem');
  });

  it('saves a retired activity into the draft at once, with If-Match, and says so beside it', async () => {
    const { fixture, http, el } = await setUp([
      ruleSet({ id: 'd2', version: 2, status: 'draft', revision: 5 }),
    ]);
    await fixture.whenStable();
    Array.from(el.querySelectorAll<HTMLElement>('[role=tab]'))
      .find((t) => t.textContent?.trim() === 'Our activities')!
      .click();
    await expect
      .poll(async () => {
        await fixture.whenStable();
        return el.querySelectorAll('cw-club-activities [data-activity]').length;
      })
      .toBeGreaterThan(0);
    const activities = (defaultRules as unknown as { parameters: { activities: { id: string }[] } })
      .parameters.activities;
    const row = el.querySelector<HTMLElement>(`cw-club-activities [data-activity="${activities[0].id}"]`)!;
    Array.from(row.querySelectorAll('button'))
      .find((b) => b.textContent?.includes('Retire'))!
      .click();
    const put = http.expectOne('/api/rule-sets/d2');
    expect(put.request.method).toBe('PUT');
    expect(put.request.headers.get('If-Match')).toBe('"5"');
    const sent = put.request.body as { body: { parameters: { activities: { retired?: boolean }[] } } };
    expect(sent.body.parameters.activities[0].retired).toBe(true);
    expect(sent.body.parameters.activities.filter((a) => a.retired)).toHaveLength(1);
    put.flush(ruleSet({ id: 'd2', version: 2, status: 'draft', revision: 6, body: sent.body }));
    await fixture.whenStable();
    expect(row.textContent).toContain('Retired in the draft');
    expect(el.querySelector('[data-testid=draft-state]')?.getAttribute('data-unsaved')).toBe('0');
  });

  it('shows and takes yards, square yards and °F for a head of coaching who reads them, and saves metres and °C', async () => {
    const { fixture, http, el, button, input } = await setUp(
      [ruleSet({ id: 'd2', version: 2, status: 'draft', revision: 3 })],
      true,
    );
    await fixture.whenStable();
    const rules = defaultRules as unknown as {
      parameters: {
        keepBallLimits: { minM2PerPlayer: number; minSideM: number };
        cautions: { heatC: number; coldC: number };
        areas: Record<string, Record<string, { width: number; forPlayers: number }>>;
      };
    };
    const p = rules.parameters;
    const width = '/parameters/areas/keep-ball/U6-U8/width';
    // Shown in the reader's units, to a tenth: metres × 1.094, square metres × 1.196, °C × 9/5 + 32.
    expect(Number(input(width).value)).toBe(
      measureIn('distance', YARDS_AND_FAHRENHEIT, p.areas['keep-ball']!['U6-U8']!.width),
    );
    expect(Number(input('/parameters/areas/keep-ball/U6-U8/forPlayers').value)).toBe(
      p.areas['keep-ball']!['U6-U8']!.forPlayers,
    );
    expect(Number(input('/parameters/keepBallLimits/minM2PerPlayer').value)).toBe(
      measureIn('area', YARDS_AND_FAHRENHEIT, p.keepBallLimits.minM2PerPlayer),
    );
    expect(Number(input('/parameters/cautions/heatC').value)).toBe(
      measureIn('temperature', YARDS_AND_FAHRENHEIT, p.cautions.heatC),
    );
    // The words say which units.
    expect(el.querySelector('[data-testid=area-units]')!.textContent).toContain('yards');
    expect(el.textContent).toContain('Keep-ball room a player (yd²)');
    expect(el.textContent).toContain('Keep-ball shortest side (yd)');
    expect(el.textContent).toContain('Heat caution from (°F)');
    expect(el.textContent).not.toMatch(/\((m|m²|°C)\)/);

    const type = async (pointer: string, value: string) => {
      const field = input(pointer);
      field.value = value;
      field.dispatchEvent(new Event('change'));
      await fixture.whenStable();
    };
    await type(width, '20');
    await type('/parameters/keepBallLimits/minM2PerPlayer', '5.5');
    await type('/parameters/keepBallLimits/minSideM', '10');
    await type('/parameters/cautions/heatC', '85');
    await type('/parameters/cautions/coldC', '35.6');
    // What was typed shows again as typed.
    expect(input(width).value).toBe('20');
    expect(input('/parameters/keepBallLimits/minM2PerPlayer').value).toBe('5.5');
    expect(input('/parameters/cautions/coldC').value).toBe('35.6');

    button('Save draft').click();
    const save = http.expectOne('/api/rule-sets/d2');
    const sent = save.request.body as { body: typeof rules };
    // Stored metric: 20 yd = 18.29 m, 5.5 yd² = 4.6 m², 10 yd = 9.14 m, 85 °F = 29.44 °C, 35.6 °F = 2 °C.
    expect(sent.body.parameters.areas['keep-ball']!['U6-U8']!.width).toBe(18.29);
    expect(sent.body.parameters.keepBallLimits).toMatchObject({ minM2PerPlayer: 4.6, minSideM: 9.14 });
    expect(sent.body.parameters.cautions).toEqual({ heatC: 29.44, coldC: 2 });
    localStorage.clear();
  });

  it('shows time in play as a percentage and saves it as a share', async () => {
    const { fixture, http, el, button, input } = await setUp([
      ruleSet({ id: 'd2', version: 2, status: 'draft', revision: 3 }),
    ]);
    await fixture.whenStable();
    const rates = (
      defaultRules as unknown as { parameters: { touchRates: Record<string, { activeShare: number }> } }
    ).parameters.touchRates;
    const pointer = '/parameters/touchRates/keep-ball/activeShare';
    expect(Number(input(pointer).value)).toBe(Math.round(rates['keep-ball']!.activeShare * 1000) / 10);
    expect(el.textContent).toContain('Time in play (%)');
    expect(el.textContent).not.toContain('(0–1)');
    expect(input(pointer).getAttribute('aria-label')).toBe('Keep-ball, time in play (%)');
    input(pointer).value = '72.5';
    input(pointer).dispatchEvent(new Event('change'));
    await fixture.whenStable();
    expect(input(pointer).value).toBe('72.5');
    button('Save draft').click();
    const save = http.expectOne('/api/rule-sets/d2');
    const sent = save.request.body as {
      body: { parameters: { touchRates: Record<string, { activeShare: number }> } };
    };
    expect(sent.body.parameters.touchRates['keep-ball']!.activeShare).toBe(0.725);
  });

  it('marks the cell of a problem with a sentence, lists it, and takes the lead there', async () => {
    const { fixture, el, input } = await setUp([
      ruleSet({ id: 'd2', version: 2, status: 'draft', revision: 1 }),
    ]);
    await fixture.whenStable();
    const set = (pointer: string, value: number) => {
      const field = input(pointer);
      field.value = String(value);
      field.dispatchEvent(new Event('change'));
    };
    set('/parameters/groupSizes/keep-ball/beginner/min', 5);
    set('/parameters/groupSizes/keep-ball/beginner/preferred', 5);
    set('/parameters/groupSizes/keep-ball/beginner/max', 4);
    const most = input('/parameters/groupSizes/keep-ball/beginner/max');
    await expect
      .poll(async () => {
        await fixture.whenStable();
        return most.getAttribute('aria-invalid');
      })
      .toBe('true');
    const sentence = 'Keep-ball, Beginner: the most players in a group (4) is below the fewest (5).';
    expect(document.getElementById(most.getAttribute('aria-describedby')!)?.textContent).toBe(sentence);
    expect(input('/parameters/groupSizes/keep-ball/beginner/min').getAttribute('aria-invalid')).toBe('false');
    expect(el.textContent).not.toContain('JSON');

    const listed = Array.from(el.querySelectorAll<HTMLButtonElement>('[data-testid=problem-list] button'));
    expect(listed.map((b) => b.textContent?.trim())).toEqual([sentence]);
    listed[0].click();
    await expect
      .poll(async () => {
        await fixture.whenStable();
        return document.activeElement;
      })
      .toBe(most);
  });

  it('shows the server’s refusal of a save at the cells it names', async () => {
    const { fixture, http, el, button, input } = await setUp([
      ruleSet({ id: 'd2', version: 2, status: 'draft', revision: 1 }),
    ]);
    await fixture.whenStable();
    const cold = input('/parameters/cautions/coldC');
    cold.value = '1';
    cold.dispatchEvent(new Event('change'));
    await fixture.whenStable();
    button('Save draft').click();
    http.expectOne('/api/rule-sets/d2').flush(
      {
        type: '/problems/validation',
        title: 'Invalid request',
        status: 400,
        detail: 'The rule set is not valid.',
        errors: [
          {
            field: 'body/parameters/cautions/coldC',
            message: 'Safety › Cold weather below: must be at most 0.',
          },
        ],
      },
      { status: 400, statusText: 'Bad Request' },
    );
    await fixture.whenStable();
    expect(cold.getAttribute('aria-invalid')).toBe('true');
    expect(document.getElementById(cold.getAttribute('aria-describedby')!)?.textContent).toBe(
      'Safety › Cold weather below: must be at most 0.',
    );
    expect(el.querySelector('[role=alert]')?.textContent).toContain('The rule set is not valid.');
    expect(el.querySelector('[role=alert]')?.textContent).not.toContain('body/');
  });

  it('asks before publishing, saying how many teams and coaches the server counts', async () => {
    const { fixture, http, button } = await setUp([
      ruleSet({ id: 'd2', version: 2, status: 'draft', revision: 1 }),
    ]);
    await fixture.whenStable();
    const dialogButton = (label: string) =>
      Array.from(document.querySelectorAll<HTMLButtonElement>('mat-dialog-container button')).find((b) =>
        b.textContent?.includes(label),
      )!;

    button('Publish').click();
    await fixture.whenStable();
    http.expectOne('/api/rule-sets/reach').flush({ teams: 7, coaches: 12 });
    await fixture.whenStable();
    const reach = document.querySelector('[data-testid=publish-reach]')!.textContent!;
    expect(reach).toContain(
      'Publishing changes the plans every coach makes from now on for 7 teams (12 coaches on their staff).',
    );
    expect(reach).toContain('Plans already made keep their rules.');
    dialogButton('Not yet').click();
    await fixture.whenStable();
    http.expectNone('/api/rule-sets/d2/publish');

    button('Publish').click();
    await fixture.whenStable();
    http.expectOne('/api/rule-sets/reach').flush({ teams: 1, coaches: 1 });
    await fixture.whenStable();
    expect(document.querySelector('[data-testid=publish-reach]')!.textContent).toContain(
      'for 1 team (1 coach on their staff).',
    );
    dialogButton('Publish').click();
    await fixture.whenStable();
    const publish = http.expectOne('/api/rule-sets/d2/publish');
    expect(publish.request.method).toBe('POST');
  });
});
