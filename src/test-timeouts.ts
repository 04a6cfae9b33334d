import { vi } from 'vitest';

/**
 * Every client spec gets room for the engine and a full page render on a busy two-core CI machine
 * (vitest's 5 s default failed there); a test is about what the page shows, never how fast.
 */
vi.setConfig({ testTimeout: 30_000, hookTimeout: 60_000 });
