/** API shapes for the club-rules workspace: history, who plans from the rules, summaries, conflicts. */
import type { RuleSetDto } from './api';

export type RuleSetChangeAction = 'create' | 'update' | 'publish' | 'rollback';

/** One line of a club's rule-set history. */
export interface RuleSetChangeDto {
  id: string;
  ruleSetId: string;
  action: RuleSetChangeAction;
  version: number;
  revision: number;
  authorId: string | null;
  authorName: string;
  /** JSON pointers the change touched. */
  changedPaths: string[];
  /** For a save: what each touched place said before and after (absent on older entries). */
  changes?: RuleSetDiffEntry[];
  createdAt: string;
}

/** Answer of GET /api/rule-sets/reach: who plans from the club's published rules. */
export interface RuleSetReachDto {
  /** The club's teams: every one plans from the club's rules. */
  teams: number;
  /** Distinct members on those teams' staff. */
  coaches: number;
}

/** Answer of GET /api/rule-sets/:id/summary: a version without its document. */
export interface RuleSetSummaryDto {
  id: string;
  name: string;
  version: number;
  status: string;
  /** When the version was published (null for a draft and for Conewise's starting rules). */
  publishedAt: string | null;
  /** Conewise's own starting rules rather than a version the club made. */
  builtIn: boolean;
}

/** One difference between two rule-set documents. */
export interface RuleSetDiffEntry {
  /** JSON pointer into the document. */
  path: string;
  change: 'added' | 'removed' | 'changed';
  before?: unknown;
  after?: unknown;
}

/** 409 answer of PUT /api/rule-sets/:id when If-Match is stale. */
export interface RuleSetConflictProblem {
  type: string;
  title: string;
  status: 409;
  detail: string;
  currentRevision: number;
  current: RuleSetDto;
}
