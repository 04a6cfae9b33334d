/**
 * CSV roster import on a phone: the panel says what a file needs and that names are shortened; a
 * semicolon file with an emoji name is read at its own line numbers; a clash is fixed by typing a
 * name in the preview; the coach fixes the file and chooses the same file name again, which is
 * read again; the players are added with every character of their names.
 */
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { PlayerDto, TeamDto } from '../../shared/types';
import {
  launchBrowser,
  PHONE,
  screenshot,
  seriousAccessibilityViolations,
  type TestBrowser,
} from './support/browser';
import { ClubSession, U8_COACH } from './support/club-session';

describe('roster import', () => {
  const baseUrl = inject('baseUrl');
  const club = new ClubSession(baseUrl);
  let browser: TestBrowser;

  beforeAll(async () => {
    browser = await launchBrowser(baseUrl);
  });
  afterAll(async () => {
    await browser?.close();
  });

  it('a coach imports a semicolon file on a phone, fixes a clash in the preview and re-chooses the fixed file', async () => {
    const coach = await club.login(U8_COACH);
    // A team of our own, so the demo squads other specs use stay as they are.
    const team = (
      await club.api.post<TeamDto>(
        '/api/teams',
        {
          name: `U9 Otters ${Date.now() % 10_000}`,
          ageGroup: 'U9',
          level: 'beginner',
          usualSpace: { width: 30, length: 40 },
        },
        { token: coach.token },
      )
    ).body;
    await club.api.post(`/api/teams/${team.id}/players`, { displayName: 'Ben T.' }, { token: coach.token });
    const page = await club.newPage(browser, coach, PHONE, `/teams/${team.id}`);
    await page.getByText('Import players from a CSV file').click();
    const panel = page.locator('cw-csv-import');
    await panel.getByText('Up to 60 players per file.').waitFor();
    expect(await panel.textContent()).toContain(
      'each name is shortened to the first name and the first letter',
    );
    const input = panel.locator('input[type=file]');

    const first = [
      'Name;Goalkeeper',
      'Kai Müller 🦊;yes',
      'Kai Mason;no',
      'Kai Mason;no',
      'Sam 2014;no',
      '',
    ].join('\r\n');
    await input.setInputFiles({
      name: 'squad.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(first, 'utf8'),
    });
    await panel.getByRole('heading', { name: 'Preview of squad.csv' }).waitFor();
    // The choice is forgotten at once, so the same file name can be chosen again.
    expect(await input.evaluate((el: HTMLInputElement) => el.value)).toBe('');
    const names = () =>
      panel.getByLabel('Name on plans').evaluateAll((els) => els.map((el) => (el as HTMLInputElement).value));
    expect(await names()).toEqual(['Kai M. 🦊', 'Kai Ma.', 'Kai M.']);
    // The bad line once, in words, at the file's own line; the header was never a player.
    expect(await panel.getByText('“Sam 2014” is not just a name').count()).toBe(1);
    await panel.getByText('Line 5: “Sam 2014” is not just a name.').waitFor();
    await panel.getByText('Line 3 has the same name. Type a name the team can tell apart').waitFor();
    const add = panel.getByRole('button', { name: /^Add \d+ players?$/ });
    expect(await add.isDisabled()).toBe(true);
    await screenshot(page, 'roster-import-preview');
    expect(await seriousAccessibilityViolations(page)).toEqual([]);

    // The coach fixes line 5 in the file and chooses squad.csv again: it is read again.
    const fixed = first.replace('Sam 2014', 'Sam Okoro');
    await input.setInputFiles({
      name: 'squad.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(fixed, 'utf8'),
    });
    await panel.getByText('Line 5: “Sam 2014”').waitFor({ state: 'detached' });
    await expect.poll(names).toEqual(['Kai M. 🦊', 'Kai Ma.', 'Kai M.', 'Sam O.']);

    // Line 4 clashes. A name already on the team is refused beside its line, once, on adding…
    const line4 = panel.getByLabel('Name on plans').nth(2);
    await line4.fill('Ben T.');
    await expect.poll(() => add.isDisabled()).toBe(false);
    await add.click();
    await panel.getByRole('alert').getByText('A name is taken. Change it below and add again.').waitFor();
    await panel.getByText('Line 4: there is already a Ben T. on the team').waitFor();
    expect(await panel.getByText('there is already a Ben T.').count()).toBe(1);
    expect(await add.isDisabled()).toBe(true);
    await screenshot(page, 'roster-import-refused');
    // …and the coach types the name the team uses for that child.
    await line4.fill('Kai Mas.');
    await expect.poll(() => add.isDisabled()).toBe(false);
    await panel.getByText('Line 3 has the same name').waitFor({ state: 'detached' });
    await screenshot(page, 'roster-import-fixed');

    await add.click();
    await panel.getByText('4 players added.').waitFor();
    const players = await club.api.get<PlayerDto[]>(`/api/teams/${team.id}/players`, { token: coach.token });
    expect(players.body.map((p) => [p.displayName, p.goalkeeper])).toEqual([
      ['Ben T.', false],
      ['Kai M. 🦊', true],
      ['Kai Ma.', false],
      ['Kai Mas.', false],
      ['Sam O.', false],
    ]);
    await page.getByRole('cell', { name: 'Kai M. 🦊', exact: true }).waitFor();
    await screenshot(page, 'roster-import-done');
    await page.close();
  });
});
