import type { EntityManager } from 'typeorm';
import type { RuleSetDocument } from '../../shared/types/plan-rules';
import { RuleSet } from '../entities/rule-set';
import { inReaderWords } from '../i18n/rule-set-words';
import { defaultRules } from './engine-port';
import { isUuid } from '../../shared/types/uuid';

// A row's document never changes without its revision changing, so (id, revision) names one
// document on every instance; keeping the same object lets the engine reuse its compiled rules.
const documents = new Map<string, RuleSetDocument>();
const MAX_CACHED = 200;

/** What names one stored document: a rule set row's id, revision and version. */
export type RuleSetRevision = Pick<RuleSet, 'id' | 'revision' | 'version'>;

const keyOf = (row: RuleSetRevision) => `${row.id}#${row.revision}#${row.version}`;

/** The document of this revision if this instance has already read it. */
export function cachedDocument(revision: RuleSetRevision): RuleSetDocument | undefined {
  return documents.get(keyOf(revision));
}

/** A stored rule set as the engine reads it: the row's id and version written into the document. */
export function documentOf(row: RuleSet): RuleSetDocument {
  const key = keyOf(row);
  const hit = documents.get(key);
  if (hit && row.revision !== undefined) return hit;
  const doc = { ...(row.body as RuleSetDocument), id: row.id, version: row.version, name: row.name };
  if (row.revision !== undefined) {
    if (documents.size >= MAX_CACHED) documents.delete(documents.keys().next().value!);
    documents.set(key, doc);
  }
  return doc;
}

/** The club's published rules, or the engine's default when it has published none, in the reader's words. */
export async function publishedRules(manager: EntityManager, clubId: string): Promise<RuleSetDocument> {
  const row = await manager
    .getRepository(RuleSet)
    .findOne({ where: { clubId, status: 'published' }, order: { version: 'DESC' } });
  return inReaderWords(row ? documentOf(row) : defaultRules());
}

/** The rules a stored plan was made with (its id and version), so old plans keep their rules. */
export async function rulesOfPlan(
  manager: EntityManager,
  clubId: string,
  ruleSetId: string,
): Promise<RuleSetDocument> {
  if (isUuid(ruleSetId)) {
    const row = await manager.getRepository(RuleSet).findOne({ where: { id: ruleSetId, clubId } });
    if (row) return inReaderWords(documentOf(row));
  }
  return inReaderWords(defaultRules());
}
