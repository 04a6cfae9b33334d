/**
 * The head of coaching's workspace end to end: edit a rule in the tables, publish it and see it in
 * the next plan; two leads saving the same draft at once, where the second gets a 409 and re-applies.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { AuthResponse, MemberDto, Plan, RuleSetDto } from '../../shared/types';
import { ClubSession, LEAD, U12_COACH } from './support/club-session';
import {
  DESKTOP,
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';

/** Most attackers per defender in any keep-ball station of the plan. */
function keepBallRatio(plan: Plan): number {
  const ratios = plan.phases
    .flatMap((p) => p.stations)
    .filter((s) => s.activityKind === 'keep-ball')
    .map((s) => {
      const defenders = s.roles.defenders?.length ?? 0;
      return (s.playerIds.length + s.coachJoins - defenders) / Math.max(1, defenders);
    });
  if (!ratios.length) throw new Error('the plan has no keep-ball station');
  return Math.max(...ratios);
}

describe('club rules', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;
  let lead: AuthResponse;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
    lead = await club.login(LEAD);
  });
  afterAll(async () => {
    await browser?.close();
    // Leave the club on the starting rules for the suites that follow.
    if (lead) await club.api.post('/api/rule-sets/rollback', { to: 'default' }, { token: lead.token });
  });

  it('a lead changes the keep-ball ratio in the tables, publishes, and the next plan follows it', async () => {
    const coach = await club.login(U12_COACH);
    const { team, players } = await club.team(coach, 'U12 Otters');
    // The intermediate U12s, with a keep-ball activity pinned so the plan has keep-ball to measure
    // whatever else the week's variety picks.
    const withKeepBall = { pinnedActivityIds: ['kb-ten-or-break-out'] };
    const before = await club.plan(coach, team, players, withKeepBall);
    expect(keepBallRatio(before.plan)).toBe(4);

    const page = await browser.newPage(DESKTOP);
    await club.open(page, lead, '/club/rules');
    const start = page.getByRole('button', { name: 'Start editing' });
    await start.waitFor();
    await screenshot(page, 'club-rules-published');
    await start.click();
    await page.getByTestId('draft-state').waitFor();

    const formats = page.locator('input[data-pointer="/parameters/keepBall/intermediate/formats"]');
    await formats.fill('3v1');
    await formats.press('Tab');
    await expect.poll(() => page.getByTestId('draft-state').textContent()).toContain('1 unsaved');
    await page.getByRole('button', { name: 'Save draft' }).click();
    await expect.poll(() => page.getByTestId('draft-state').getAttribute('data-unsaved')).toBe('0');

    // A refused value is marked at its cell with a sentence and listed above the tables.
    await formats.fill('5v1');
    await formats.press('Tab');
    const sentence = 'Keep-ball, Intermediate: 5v1 has more than 4 attackers per defender.';
    await expect.poll(() => formats.getAttribute('aria-invalid')).toBe('true');
    const cellProblem = page.locator(`#${await formats.getAttribute('aria-describedby')}`);
    expect(await cellProblem.textContent()).toContain(sentence);
    const listed = page.getByTestId('problem-list').getByRole('button', { name: sentence });
    await listed.click();
    await expect.poll(() => formats.evaluate((field) => field === document.activeElement)).toBe(true);
    await screenshot(page, 'club-rules-cell-problem');
    expect(await page.locator('cw-club-rules-page').innerText()).not.toMatch(/JSON|\/parameters/);
    await page.getByRole('button', { name: 'Discard' }).click();
    await expect.poll(() => page.getByTestId('draft-state').getAttribute('data-unsaved')).toBe('0');

    // The advanced text view, out of the way below the tabs, pins a refused rule to its line;
    // discarding puts the saved draft back.
    expect(await page.getByRole('tab', { name: /JSON|text/i }).count()).toBe(0);
    await page.getByTestId('advanced-toggle').click();
    const editor = page.locator('#rule-json');
    await editor.waitFor();
    expect(await editor.getAttribute('aria-invalid')).toBe('false');
    // The saved draft, as the editor shows it (it draws only the lines in view, so read it from the API).
    const drafts = (await club.api.get<RuleSetDto[]>('/api/rule-sets', { token: lead.token })).body;
    const draft = drafts.find((r) => r.status === 'draft');
    const edited = structuredClone(draft?.body) as {
      parameters: { keepBall: { intermediate: { formats: unknown } } };
    };
    edited.parameters.keepBall.intermediate.formats = [{ attackers: 5, defenders: 1 }];
    const text = JSON.stringify(edited, null, 2);
    // The whole document at once, as a paste would put it (typing 160 kB key by key is not the point here).
    // (Chromium's renderer gives up on keyboard.insertText of this size, so the paste event is sent.)
    await editor.click();
    await page.keyboard.press('Control+A');
    await editor.evaluate((content, value: string) => {
      const data = new DataTransfer();
      data.setData('text/plain', value);
      content.dispatchEvent(
        new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }),
      );
    }, text);
    const problem = page.getByTestId('json-problems').locator('button').first();
    await problem.waitFor();
    // The array item's opening brace: the line after "formats": [ under keepBall → intermediate.
    const lines = text.split('\n');
    const keepBall = lines.findIndex((l) => l.includes('"keepBall"'));
    const intermediate = lines.findIndex((l, i) => i > keepBall && l.includes('"intermediate"'));
    const formatsLine = lines.findIndex((l, i) => i > intermediate && l.includes('"formats"'));
    const line = formatsLine + 2;
    expect(await problem.textContent()).toContain(sentence);
    expect(await problem.textContent()).toMatch(new RegExp(`Line ${line}(?!\\d)`));
    await problem.click();
    // The list takes the caret to the line, where the editor marks the same problem in the same words.
    await expect.poll(() => page.locator('.cm-activeLineGutter').first().textContent()).toBe(String(line));
    await expect.poll(() => editor.getAttribute('aria-invalid')).toBe('true');
    await page.locator('.cm-lintRange-error').first().hover();
    await expect.poll(() => page.locator('.cm-tooltip-lint').textContent()).toContain(sentence);
    await screenshot(page, 'club-rules-advanced-text');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);
    await page.getByRole('button', { name: 'Discard' }).click();
    await expect.poll(() => page.getByTestId('draft-state').getAttribute('data-unsaved')).toBe('0');

    await page.getByRole('tab', { name: 'Try it' }).click();
    await page.getByTestId('try-run').click();
    await page.getByTestId('try-result').first().waitFor({ timeout: 30_000 });
    expect(await page.getByTestId('try-result').count()).toBeGreaterThanOrEqual(5);
    expect(await page.locator('[data-testid=try-result]', { hasText: 'changed' }).count()).toBeGreaterThan(0);
    await screenshot(page, 'club-rules-try-it');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    // Publishing asks first, saying how many teams it changes (the server counts the club's teams).
    const teams = (await club.api.get<{ teams: number }>('/api/rule-sets/reach', { token: lead.token })).body
      .teams;
    await page.getByRole('button', { name: 'Publish' }).click();
    const reach = page.getByTestId('publish-reach');
    await expect
      .poll(() => reach.textContent())
      .toContain(
        `changes the plans every coach makes from now on for ${teams} team${teams === 1 ? '' : 's'}`,
      );
    expect(await reach.textContent()).toContain('Plans already made keep their rules.');
    await screenshot(page, 'club-rules-publish-confirm');
    await page.getByTestId('confirm-publish').click();
    // Published once the club's published rules hold the change (the heading may say "version"
    // before, when an earlier suite published rules of its own).
    const publishedFormats = async () => {
      const response = await club.api.get<RuleSetDto>('/api/rule-sets/published', { token: lead.token });
      const body = response.body.body as { parameters: { keepBall: { intermediate: { formats: unknown } } } };
      return body.parameters.keepBall.intermediate.formats;
    };
    await expect.poll(publishedFormats).toEqual([{ attackers: 3, defenders: 1 }]);
    const published = await club.api.get<RuleSetDto>('/api/rule-sets/published', { token: lead.token });
    await expect
      .poll(() => page.locator('.cw-rules__sub').textContent())
      .toContain(`version ${published.body.version}`);

    const after = await club.plan(coach, team, players, withKeepBall);
    expect(after.ruleSetVersion).toBe(published.body.version);
    expect(keepBallRatio(after.plan)).toBeLessThanOrEqual(3);

    await page.getByRole('tab', { name: 'History' }).click();
    await page.getByTestId('rule-diff').waitFor();
    expect(await page.getByTestId('rule-diff').textContent()).toContain(
      'Keep-ball ratios › Intermediate › Formats',
    );
    const log = (await page.getByTestId('rule-change-log').textContent()) ?? '';
    expect(log).toContain('Morag Ellison');
    // The saved change as the server diffed it: the first format's attackers, the others gone.
    expect(log).toContain('Keep-ball ratios › Intermediate › Formats › Format 1 › Attackers: 4 → 3');
    expect(log).toMatch(/Keep-ball ratios › Intermediate › Formats › Format 2: removed \(was \d+v\d+\)/);
    expect(log).not.toMatch(/\/parameters|group of settings/);
    const history = await page.getByTestId('rule-history').textContent();
    expect(history).toContain('Published');
    expect(history).not.toMatch(/archived/i);
    await screenshot(page, 'club-rules-history');
    await page.close();
  });

  it('two leads edit the same draft at once: the second gets a 409, reloads and re-applies, and nothing is lost', async () => {
    // A second lead: the U12 coach is made a lead for this test.
    const members = await club.api.get<MemberDto[]>('/api/members', { token: lead.token });
    const ayesha = members.body.find((m) => m.email === U12_COACH)!;
    expect(
      (await club.api.patch(`/api/members/${ayesha.userId}`, { role: 'lead' }, { token: lead.token })).status,
    ).toBe(200);
    const secondLead = await club.login(U12_COACH);
    const draft = await club.api.post<RuleSetDto>(
      '/api/rule-sets',
      { name: 'Winter rules', from: 'published' },
      { token: lead.token },
    );
    expect(draft.status).toBe(201);

    const other = await launchBrowser(baseUrl);
    try {
      const pageA = await browser.newPage(DESKTOP);
      const pageB = await other.newPage(PHONE);
      await club.open(pageA, lead, '/club/rules');
      await club.open(pageB, secondLead, '/club/rules');
      for (const page of [pageA, pageB]) await page.getByTestId('draft-state').waitFor();

      // Both open the cautions table; A saves first.
      for (const page of [pageA, pageB]) await page.getByText('Weather safety').click();
      const heat = pageA.locator('input[data-pointer="/parameters/cautions/heatC"]');
      await heat.fill('30');
      await heat.press('Tab');
      await pageA.getByRole('button', { name: 'Save draft' }).click();
      await expect.poll(() => pageA.getByTestId('draft-state').getAttribute('data-unsaved')).toBe('0');

      const afterA = await club.api.get<RuleSetDto>(`/api/rule-sets/${draft.body.id}`, { token: lead.token });
      expect(
        (afterA.body.body as { parameters: { cautions: { heatC: number } } }).parameters.cautions.heatC,
      ).toBe(30);

      const cold = pageB.locator('input[data-pointer="/parameters/cautions/coldC"]');
      await cold.fill('2');
      await cold.press('Tab');
      await pageB.getByRole('button', { name: 'Save draft' }).click();
      const conflict = pageB.getByTestId('conflict');
      await conflict.waitFor();
      expect(await conflict.textContent()).toContain('nothing of yours is lost');
      await screenshot(pageB, 'club-rules-conflict');
      expect(await seriousAccessibilityViolations(pageB)).toEqual([]);

      await pageB.getByRole('button', { name: /re-apply my changes/ }).click();
      await pageB.getByText('re-applied your 1 change').waitFor();
      expect(await pageB.getByTestId('draft-state').getAttribute('data-unsaved')).toBe('1');
      expect(await pageB.locator('input[data-pointer="/parameters/cautions/heatC"]').inputValue()).toBe('30');
      await pageB.getByRole('button', { name: 'Save draft' }).click();
      await expect.poll(() => pageB.getByTestId('draft-state').getAttribute('data-unsaved')).toBe('0');

      const stored = await club.api.get<RuleSetDto>(`/api/rule-sets/${draft.body.id}`, { token: lead.token });
      expect((stored.body.body as { parameters: { cautions: unknown } }).parameters.cautions).toEqual({
        heatC: 30,
        coldC: 2,
      });
      await pageA.close();
      await pageB.close();
    } finally {
      await other.close();
      await club.api.patch(`/api/members/${ayesha.userId}`, { role: 'coach' }, { token: lead.token });
    }
  });

  it('a lead rolls back to an earlier version from the history, and it is published again', async () => {
    const list = await club.api.get<RuleSetDto[]>('/api/rule-sets', { token: lead.token });
    const draft = list.body.find((v) => v.status === 'draft')!;
    const earlier = list.body.find((v) => v.status === 'published')!;
    const publish = await club.api.post<RuleSetDto>(
      `/api/rule-sets/${draft.id}/publish`,
      {},
      { token: lead.token },
    );
    expect(publish.status).toBe(200);

    const page = await browser.newPage(DESKTOP);
    page.on('dialog', (dialog) => void dialog.accept());
    await club.open(page, lead, '/club/rules');
    await page.getByRole('tab', { name: 'History' }).click();
    await page.getByRole('button', { name: `Publish version ${earlier.version} again` }).click();
    await page.getByText(`version ${earlier.version}'s rules are published again`).waitFor();

    const now = await club.api.get<RuleSetDto>('/api/rule-sets/published', { token: lead.token });
    expect(now.body.version).toBeGreaterThan(publish.body.version);
    const cautions = (body: unknown) => (body as { parameters: { cautions: unknown } }).parameters.cautions;
    expect(cautions(now.body.body)).toEqual(cautions(earlier.body));
    expect(cautions(now.body.body)).not.toEqual(cautions(publish.body.body));
    await page.close();
  });

  it('the members screen lists the club and sends an invitation', async () => {
    for (const viewport of [PHONE, DESKTOP]) {
      const page = await browser.newPage(viewport);
      await club.open(page, lead, '/club/members');
      await page.getByTestId('member-table').waitFor();
      expect(await page.getByTestId('member-table').textContent()).toContain('Tomasz Reid');
      if (viewport === PHONE) {
        await page.getByLabel('E-mail').fill(`helper.${Date.now()}@fernmoor.example.org`);
        await page.getByRole('button', { name: 'Send invitation' }).click();
        await page.getByTestId('pending-invitations').waitFor();
      }
      await screenshot(page, 'members');
      expect(await seriousAccessibilityViolations(page)).toEqual([]);
      await page.close();
    }
  });
});
