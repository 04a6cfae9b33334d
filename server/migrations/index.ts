import { InitialSchema1764627000000 } from './1764627000000-initial-schema';

/** Migrations in the order they run. Add each new one here (no globs under ESM). */
export const MIGRATIONS = [InitialSchema1764627000000];
