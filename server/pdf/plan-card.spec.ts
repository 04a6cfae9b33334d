import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { generatePlan } from '../../engine';
import type { Phase, Plan, PlanRequest } from '../../shared/types';
import { inLanguage } from '../i18n/translations';
import { ACTIVITY_KIND_LABELS, POSITION_STYLE } from '../../shared/types/activity-words';
import { changeoverText, groupList, legendKeys } from './plan-card';
import { MISSING_MARK, cardRuns, printableContent } from './printable';
import { renderPlanPdf } from './render-pdf';
import { diagramMarks, positionLabel } from './station-diagram';
import { SQUAD_NAMES } from '../../tests/support/squad-names';

function request(players: number, over: Partial<PlanRequest> = {}): PlanRequest {
  return {
    ageGroup: 'U12',
    level: 'intermediate',
    players: SQUAD_NAMES.slice(0, players).map((name, i) => ({ id: `p${i + 1}`, name, goalkeeper: i < 2 })),
    coaches: 3,
    equipment: { balls: 24, cones: 60, bibs: 14, goals: 4 },
    space: { width: 50, length: 70 },
    minutes: 60,
    kind: 'training',
    seed: 'card-spec',
    ...over,
  };
}

const scratch = mkdtempSync(join(tmpdir(), 'conewise-card-spec-'));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

/** poppler's view of a PDF: its page count and its text in reading order, on one line. */
function read(pdf: Buffer): { pages: number; text: string } {
  const file = join(scratch, 'card.pdf');
  writeFileSync(file, pdf);
  const info = execFileSync('pdfinfo', [file], { encoding: 'utf8' });
  return {
    pages: Number(/Pages:\s+(\d+)/.exec(info)?.[1]),
    text: execFileSync('pdftotext', ['-raw', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' '),
  };
}

describe('the printed card of a full squad’s hour with drinks breaks', () => {
  let plan: Plan;
  let a4: { pages: number; text: string };
  let letter: { pages: number; text: string };

  beforeAll(async () => {
    plan = await generatePlan(request(24));
    const input = { plan, teamName: 'U12 Larks', date: '2026-12-05', kickOff: '18:00' };
    a4 = read(await renderPlanPdf(input, 'a4'));
    letter = read(await renderPlanPdf(input, 'letter'));
  });

  it('is a plan with drinks breaks (the case this card must keep on one page)', () => {
    expect(plan.phases.some((p) => p.activityKind === 'break' && p.stations.length === 0)).toBe(true);
  });

  it('fits one A4 page and one Letter page', () => {
    expect(a4.pages).toBe(1);
    expect(letter.pages).toBe(1);
  });

  it('comes out the same when printed again (laid out straight at the size it fitted at)', async () => {
    const input = { plan, teamName: 'U12 Larks', date: '2026-12-05', kickOff: '18:00' };
    expect(read(await renderPlanPdf(input, 'a4'))).toEqual(a4);
    expect(read(await renderPlanPdf(input, 'letter'))).toEqual(letter);
  });

  it('prints each drinks break as a row of its own, the set-up work, formats and kind labels', () => {
    const breaks = plan.phases.filter((p) => p.activityKind === 'break');
    expect(a4.text.split('Drinks break').length - 1).toBeGreaterThanOrEqual(breaks.length);
    for (const [i, phase] of plan.phases.entries()) {
      const setUp = changeoverText(phase.changeover, plan.phases[i - 1]);
      if (setUp) expect(a4.text).toContain(setUp);
      if (phase.activityKind !== 'break') expect(a4.text).toContain(ACTIVITY_KIND_LABELS[phase.activityKind]);
    }
    for (const station of plan.phases.flatMap((p) => p.stations))
      if (station.format) expect(a4.text).toContain(station.format);
  });

  it('keys exactly the roles and markers its diagrams draw, in their words', () => {
    const drawn = new Set(plan.phases.flatMap((p) => p.stations.flatMap((s) => [...diagramMarks(s)])));
    expect(new Set(legendKeys(plan))).toEqual(drawn);
    for (const role of Object.keys(POSITION_STYLE) as (keyof typeof POSITION_STYLE)[]) {
      if (drawn.has(role)) expect(a4.text).toContain(POSITION_STYLE[role].label);
    }
    if (!drawn.has('neutral')) expect(a4.text).not.toContain(POSITION_STYLE.neutral.label);
    if (!drawn.has('server')) expect(a4.text).not.toContain(POSITION_STYLE.server.label);
  });

  it('names every player under the number their circle shows', () => {
    for (const station of plan.phases.flatMap((p) => p.stations)) {
      const list = groupList(station, (id) => plan.request.players.find((p) => p.id === id)!.name!).join(
        ' · ',
      );
      for (const position of station.positions.filter((p) => p.role !== 'coach')) {
        const name = plan.request.players.find((p) => p.id === position.id)!.name!;
        expect(list).toContain(`${positionLabel(station, position)} ${name}`);
      }
    }
    for (const name of SQUAD_NAMES) expect(a4.text).toContain(name);
  });
});

describe('names on the printed card', () => {
  // Invented names in several scripts, with emoji as coaches type them.
  const names = [
    'Kai M. 🦊',
    'Łucja Ś.',
    'Zoë K.',
    'Ζωή Π.',
    'Аня И.',
    'Nguyễn T.',
    'Ines ⚽ R.',
    'Noa 👍🏽 B.',
  ];
  let text: string;

  beforeAll(async () => {
    const players = names.map((name, i) => ({ id: `n${i + 1}`, name, goalkeeper: i === 0 }));
    const plan = await generatePlan(request(8, { players, seed: 'card-names' }));
    text = read(
      await renderPlanPdf({ plan, teamName: 'U10 Füchse 🦊', date: '2026-12-05', kickOff: '17:30' }),
    ).text;
  });

  it('prints every name whole, emoji and letters of other scripts included, never as “?”', () => {
    expect(text).toContain('U10 Füchse 🦊');
    for (const name of names.slice(0, -1)) expect(text).toContain(name);
    // A black-and-white face draws a skin tone as the plain sign: the tone is the only thing left out.
    expect(text).toContain('Noa 👍 B.');
    expect(text).not.toContain('?');
  });

  it('cuts text into runs of one face each, and marks a character no face has', () => {
    expect(cardRuns('Maya O.')).toEqual([{ text: 'Maya O.' }]);
    expect(cardRuns('Kai M. 🦊')).toEqual([{ text: 'Kai M. ' }, { text: '🦊', font: 'NotoEmoji' }]);
    expect(cardRuns('Łucja')).toEqual([{ text: 'Ł', font: 'RobotoCondensed-latin-ext' }, { text: 'ucja' }]);
    expect(cardRuns('Area 14 m → 16 m')).toEqual([{ text: 'Area 14 m to 16 m' }]);
    expect(cardRuns('雪 A.')).toEqual([{ text: MISSING_MARK, font: 'NotoEmoji' }, { text: ' A.' }]);
  });

  it('keeps the style of a styled piece on each of its runs', () => {
    expect(printableContent({ stack: [{ text: ['1 ', { text: 'Kai 🦊', bold: true }] }] })).toEqual({
      stack: [
        {
          text: [{ text: '1 ' }, { text: 'Kai ', bold: true }, { text: '🦊', bold: true, font: 'NotoEmoji' }],
        },
      ],
    });
  });
});

describe('set-up words', () => {
  const phase = (over: Partial<Phase>): Phase => ({
    name: 'Part',
    activityId: 'a',
    activityKind: 'keep-ball',
    startMinute: 0,
    endMinute: 10,
    stations: [],
    ...over,
  });

  it('counts cones and goals and says when the work is done', () => {
    const work = { conesPlaced: 12, conesLifted: 0, goalsMoved: 1, minutes: 1 };
    expect(changeoverText(work, phase({}))).toBe('Set up: 12 cones, move 1 goal — 1 min');
    expect(changeoverText({ ...work, minutes: 0 }, undefined)).toBe(
      'Set up: 12 cones, move 1 goal — before the start',
    );
    expect(changeoverText({ ...work, minutes: 0 }, phase({ activityKind: 'break' }))).toBe(
      'Set up: 12 cones, move 1 goal — during the drinks break',
    );
    expect(changeoverText({ conesPlaced: 0, conesLifted: 8, goalsMoved: 2, minutes: 2 }, phase({}))).toBe(
      'Set up: lift 8, move 2 goals — 2 min',
    );
  });

  it('says nothing when there is nothing to put out, lift or move', () => {
    expect(
      changeoverText({ conesPlaced: 0, conesLifted: 0, goalsMoved: 0, minutes: 0 }, phase({})),
    ).toBeNull();
    expect(changeoverText(undefined, phase({}))).toBeNull();
  });
});

describe('the card’s language', () => {
  it('tells screen readers the language its words are in: the reader’s', async () => {
    const plan = await generatePlan(request(8, { seed: 'card-language' }));
    const input = { plan, teamName: 'U12 Larks' };
    // The document catalogue's /Lang entry (ISO 32000-1 14.9.2), written uncompressed.
    const lang = (pdf: Buffer) => /\/Lang \(([^)]*)\)/.exec(pdf.toString('latin1'))?.[1];
    expect(lang(await renderPlanPdf(input))).toBe('en-GB');
    expect(lang(await inLanguage('es', () => renderPlanPdf(input)))).toBe('es');
  });
});
