/**
 * Printing is CPU-heavy (pdfmake lays a card out up to four times to fit one page), so cards are
 * made in a small pool of worker threads (piscina) while the main thread goes on answering
 * requests. CARD_WORKERS sets the pool's size; 0 makes cards on the main thread (the benchmark's
 * "before").
 */
import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import { currentLanguage } from '../i18n/translations';
import type { CardJob } from './card-worker';
import type { CardInput, Paper } from './plan-card';

/** Threads the pool may run: CARD_WORKERS, else one fewer than the CPUs (at least one). */
export function cardWorkerCount(env: NodeJS.ProcessEnv = process.env): number {
  const raw = env['CARD_WORKERS'];
  if (raw !== undefined && /^\d+$/.test(raw)) return Number(raw);
  return Math.max(1, availableParallelism() - 1);
}

let pool: Piscina<CardJob, Uint8Array> | null = null;

function cardPool(threads: number): Piscina<CardJob, Uint8Array> {
  pool ??= new Piscina<CardJob, Uint8Array>({
    filename: new URL('./card-worker.ts', import.meta.url).href,
    minThreads: 0,
    maxThreads: threads,
    // A thread left idle this long ends; the next card starts one again.
    idleTimeout: 60_000,
    // Below the request thread (and PostgreSQL on the same machine) in the CPU's queue: when cards
    // and plans compete, plans go first and cards wait (Linux thread niceness, @napi-rs/nice).
    niceIncrement: 10,
    // The worker is TypeScript, read through tsx as the server is.
    execArgv: ['--import', 'tsx'],
    env: { ...process.env, TSX_TSCONFIG_PATH: process.env['TSX_TSCONFIG_PATH'] ?? 'tsconfig.server.json' },
  });
  return pool;
}

/** The card's PDF bytes, made in the pool (or on this thread when CARD_WORKERS is 0). */
export async function renderCard(input: CardInput, paper: Paper): Promise<Buffer> {
  const threads = cardWorkerCount();
  if (threads === 0) {
    const { renderPlanPdf } = await import('./render-pdf');
    return renderPlanPdf(input, paper);
  }
  const bytes = await cardPool(threads).run({ input, paper, language: currentLanguage() });
  return Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
}

/** Ends the pool's threads (the server stopping); a later card starts a new pool. */
export async function closeCardPool(): Promise<void> {
  const closing = pool;
  pool = null;
  await closing?.destroy();
}
