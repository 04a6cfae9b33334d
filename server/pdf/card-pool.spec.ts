import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { generatePlan } from '../../engine';
import { SQUAD_NAMES } from '../../tests/support/squad-names';
import { inLanguage, installTranslations } from '../i18n/translations';
import { cardWorkerCount, closeCardPool, renderCard } from './card-pool';
import { renderPlanPdf } from './render-pdf';

installTranslations();
const scratch = mkdtempSync(join(tmpdir(), 'conewise-card-pool-'));
afterAll(async () => {
  await closeCardPool();
  rmSync(scratch, { recursive: true, force: true });
});

/** poppler's reading of a PDF's text, on one line. */
function text(pdf: Buffer): string {
  const file = join(scratch, 'card.pdf');
  writeFileSync(file, pdf);
  return execFileSync('pdftotext', ['-raw', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
}

async function input() {
  const plan = await generatePlan({
    ageGroup: 'U10',
    level: 'beginner',
    players: SQUAD_NAMES.slice(0, 10).map((name, i) => ({ id: `p${i + 1}`, name })),
    coaches: 2,
    equipment: { balls: 12, cones: 30, bibs: 10, goals: 2 },
    space: { width: 30, length: 40 },
    minutes: 20,
    kind: 'match-warm-up',
    seed: 'card-pool',
  });
  return { plan, teamName: 'U10 Kestrels', date: '2026-12-05', kickOff: '10:30' };
}

describe('the card pool', () => {
  it('sizes itself from CARD_WORKERS, else one thread fewer than the CPUs (at least one)', () => {
    expect(cardWorkerCount({ CARD_WORKERS: '3' })).toBe(3);
    expect(cardWorkerCount({ CARD_WORKERS: '0' })).toBe(0);
    expect(cardWorkerCount({ CARD_WORKERS: 'many' })).toBeGreaterThanOrEqual(1);
    expect(cardWorkerCount({})).toBeGreaterThanOrEqual(1);
  });

  it('prints in a worker thread the same card the main thread prints', async () => {
    const card = await input();
    const pooled = await renderCard(card, 'a4');
    expect(pooled.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(text(pooled)).toBe(text(await renderPlanPdf(card, 'a4')));
    expect(text(pooled)).toContain('U10 Kestrels');
  });

  it('prints in the language of the request that asked, although the worker has none of its own', async () => {
    const card = await input();
    const spanish = text(await inLanguage('es', () => renderCard(card, 'a4')));
    const english = text(await renderCard(card, 'a4'));
    expect(spanish).toBe(text(await inLanguage('es', () => renderPlanPdf(card, 'a4'))));
    expect(spanish).not.toBe(english);
    expect(spanish).toContain('Lista de material');
  });
});
