import '../../shared/i18n/localize';
import { randomUUID } from 'node:crypto';
import type { EntityManager } from 'typeorm';
import type { RuleSetDto } from '../../shared/types/api';
import type { RuleSetDocument } from '../../shared/types/plan-rules';
import type {
  RuleSetChangeDto,
  RuleSetDiffEntry,
  RuleSetReachDto,
  RuleSetSummaryDto,
} from '../../shared/types/rule-set-api';
import { RuleSet } from '../entities/rule-set';
import { RuleSetChange, type RuleSetChangeAction } from '../entities/rule-set-change';
import { User } from '../entities/user';
import { DetailedProblem } from '../http/detailed-problem';
import { badRequest, conflict } from '../http/problem';
import { formerMember } from './account-erasure';
import type { ClubScope } from './club-scope';
import { changeInReaderWords, inReaderWords, inSourceWords } from '../i18n/rule-set-words';
import { defaultRules, jsonDiff, ruleSetErrors } from './engine-port';
import { documentOf } from './rules-resolver';

/** 'default' (the engine's), 'published' (the club's current), or a rule set's id. */
export type RuleSetRefInput = string;

export const DEFAULT_RULE_SET_ID = 'default';
const MAX_CHANGED_PATHS = 200;

/** Which rule set a document is: a version of the club's, or the built-in default. */
interface RuleSetRef {
  id: string;
  name: string;
  version: number;
  status: string;
}

/** A rule-set document with where it came from. */
interface Resolved {
  ref: RuleSetRef;
  body: RuleSetDocument;
  row: RuleSet | null;
}

/**
 * The club's rule sets. Each row is one version: drafts are edited under an optimistic revision,
 * publishing freezes a draft and archives the one before, so old plans keep the version they name.
 */
export class RuleSetService {
  constructor(private readonly scope: ClubScope) {}

  async list(): Promise<RuleSetDto[]> {
    const rows = await this.scope.manager.getRepository(RuleSet).find({
      where: this.scope.where<RuleSet>(),
      relations: { author: true },
      order: { version: 'DESC', createdAt: 'DESC' },
    });
    return rows.map(ruleSetDto);
  }

  async get(id: RuleSetRefInput): Promise<RuleSetDto> {
    const resolved = await this.resolve(id);
    return resolved.row ? ruleSetDto(resolved.row) : defaultDto(resolved.body);
  }

  /** A new draft copied from the published rules (or the default, or a named version). */
  async createDraft(input: { name?: string; from?: RuleSetRefInput }): Promise<RuleSetDto> {
    return this.scope.transaction(async (scope) => {
      const { manager, clubId } = scope;
      await lockClubRuleSets(manager, clubId);
      const base = await new RuleSetService(scope).resolve(input.from ?? 'published');
      const repo = manager.getRepository(RuleSet);
      const draft = repo.create({
        id: randomUUID(),
        clubId,
        name: input.name ?? `${base.body.name ?? 'Club rules'} (draft)`.slice(0, 120),
        version: (await maxVersion(manager, clubId)) + 1,
        status: 'draft',
        body: base.body,
        authorId: scope.auth.userId,
        basedOnId: base.row?.id ?? null,
      });
      draft.body = documentOf(draft);
      const row = await repo.save(draft);
      await recordChange(scope, row, 'create', []);
      return reload(manager, row.id);
    });
  }

  /** Saves a draft when If-Match names its current revision; otherwise 409 with the current one. */
  async update(id: string, input: { name?: string; body?: unknown }, ifMatch: number): Promise<RuleSetDto> {
    if (input.body !== undefined) {
      const errors = ruleSetErrors(input.body);
      if (errors.length) throw badRequest($localize`The rule set is not valid.`, errors);
    }
    return this.scope.transaction(async (scope) => {
      const { manager, auth } = scope;
      const current = await scope.ruleSet(id);
      if (current.status !== 'draft') throw conflict(cannotChange(current));
      const body = input.body === undefined ? current.body : inSourceWords({ ...(input.body as object) });
      const name = input.name ?? current.name;
      const result: { id: string }[] = await manager.query(
        `UPDATE rule_set SET body = $1, name = $2, revision = revision + 1, "updatedAt" = now(), "authorId" = $3
          WHERE id = $4 AND "clubId" = $5 AND revision = $6 AND status = 'draft' RETURNING id`,
        [JSON.stringify(body), name, auth.userId, id, auth.clubId, ifMatch],
      );
      const updated = (Array.isArray(result[0]) ? result[0] : result) as { id: string }[];
      if (!updated.length) {
        const fresh = await reload(manager, id);
        const now = fresh.revision;
        throw new DetailedProblem(
          409,
          $localize`:title of an error answer:Conflict`,
          $localize`Someone saved this draft after revision ${ifMatch}:sentRevision:; it is now at revision ${now}:currentRevision:. Reload it and re-apply your change.`,
          { currentRevision: fresh.revision, current: fresh },
          undefined,
          '/problems/stale-revision',
        );
      }
      const row = await manager.getRepository(RuleSet).findOneByOrFail({ id });
      const changes = jsonDiff(current.body, row.body);
      const paths = changes.map((d) => d.path);
      if (input.name !== undefined && input.name !== current.name) {
        paths.unshift('(name)');
        changes.unshift({ path: '/name', change: 'changed', before: current.name, after: name });
      }
      await recordChange(scope, row, 'update', paths, changes);
      return reload(manager, id);
    });
  }

  /** Makes a draft the club's rules for new plans; the previously published version is archived. */
  async publish(id: string, ifMatch: number | null): Promise<RuleSetDto> {
    return this.scope.transaction(async (scope) => {
      await lockClubRuleSets(scope.manager, scope.clubId);
      const row = await scope.ruleSet(id);
      if (row.status !== 'draft') throw conflict(alreadyDone(row));
      if (ifMatch !== null && ifMatch !== row.revision) {
        const current = await reload(scope.manager, id);
        const now = row.revision;
        throw new DetailedProblem(
          409,
          $localize`:title of an error answer:Conflict`,
          $localize`The draft changed after revision ${ifMatch}:sentRevision:; review revision ${now}:currentRevision: before publishing.`,
          { currentRevision: row.revision, current },
          undefined,
          '/problems/stale-revision',
        );
      }
      const errors = ruleSetErrors(row.body);
      if (errors.length)
        throw badRequest($localize`The draft is not a valid rule set; fix it before publishing.`, errors);
      return makePublished(scope, row, 'publish');
    });
  }

  /** Publishes a copy of an earlier version (or the default) as the newest version. */
  async rollback(to: RuleSetRefInput): Promise<RuleSetDto> {
    return this.scope.transaction(async (scope) => {
      const { manager, clubId } = scope;
      await lockClubRuleSets(manager, clubId);
      const target = await new RuleSetService(scope).resolve(to);
      const repo = manager.getRepository(RuleSet);
      const row = repo.create({
        id: randomUUID(),
        clubId,
        name: target.row ? target.row.name : (target.body.name ?? 'Default rules'),
        version: (await maxVersion(manager, clubId)) + 1,
        status: 'draft',
        body: target.body,
        authorId: scope.auth.userId,
        basedOnId: target.row?.id ?? null,
      });
      return makePublished(scope, row, 'rollback');
    });
  }

  async history(ruleSetId?: string): Promise<RuleSetChangeDto[]> {
    if (ruleSetId) await this.scope.ruleSet(ruleSetId);
    const rows = await this.scope.manager.getRepository(RuleSetChange).find({
      where: this.scope.where<RuleSetChange>(ruleSetId ? { ruleSetId } : {}),
      order: { createdAt: 'DESC' },
      take: 200,
    });
    return rows.map((r) => ({
      id: r.id,
      ruleSetId: r.ruleSetId,
      action: r.action,
      version: r.version,
      revision: r.revision,
      authorId: r.authorId,
      authorName: r.authorId === null ? formerMember() : r.authorName,
      changedPaths: r.changedPaths,
      ...(r.changes ? { changes: (r.changes as RuleSetDiffEntry[]).map(changeInReaderWords) } : {}),
      createdAt: r.createdAt.toISOString(),
    }));
  }

  /**
   * Who plans from the club's published rules: every team of the club (the club's rules are one
   * for all its teams) and the distinct members on their staff. Publishing changes their next plans.
   */
  async reach(): Promise<RuleSetReachDto> {
    const [row] = (await this.scope.manager.query(
      `SELECT (SELECT COUNT(*) FROM team t WHERE t."clubId" = $1)::int AS teams,
              (SELECT COUNT(DISTINCT tc."userId") FROM team_coach tc
                 JOIN team t ON t.id = tc."teamId"
                 JOIN membership m ON m."userId" = tc."userId" AND m."clubId" = t."clubId"
                WHERE t."clubId" = $1)::int AS coaches`,
      [this.scope.clubId],
    )) as { teams: number; coaches: number }[];
    return { teams: Number(row?.teams ?? 0), coaches: Number(row?.coaches ?? 0) };
  }

  /** A version's name, number, state and publishing date, without its document (any member). */
  async summary(id: RuleSetRefInput): Promise<RuleSetSummaryDto> {
    const resolved = await this.resolve(id);
    const row = resolved.row;
    return {
      id: resolved.ref.id,
      name: row?.name ?? $localize`Conewise starting rules`,
      version: resolved.ref.version,
      status: row ? row.status : 'published',
      publishedAt: row?.publishedAt ? row.publishedAt.toISOString() : null,
      builtIn: !row,
    };
  }

  /** Resolves 'default', 'published' or an id of the caller's club (404 otherwise). */
  async resolve(ref: RuleSetRefInput): Promise<Resolved> {
    if (ref === 'published') {
      const row = await this.scope.manager
        .getRepository(RuleSet)
        .findOne({ where: this.scope.where<RuleSet>({ status: 'published' }), order: { version: 'DESC' } });
      if (!row) return this.resolve(DEFAULT_RULE_SET_ID);
      return { row, body: documentOf(row), ref: refOf(row) };
    }
    if (ref === DEFAULT_RULE_SET_ID) {
      const body = defaultRules();
      return {
        row: null,
        body,
        ref: {
          id: DEFAULT_RULE_SET_ID,
          name: body.name ?? $localize`Default rules`,
          version: body.version,
          status: 'built-in',
        },
      };
    }
    const row = await this.scope.ruleSet(ref);
    return { row, body: documentOf(row), ref: refOf(row) };
  }
}

/**
 * Publishes `row` as the club's newest version and archives the one before, inside the caller's
 * transaction (which holds the club's rule-set lock).
 */
async function makePublished(
  scope: ClubScope,
  row: RuleSet,
  action: RuleSetChangeAction,
): Promise<RuleSetDto> {
  const { manager, clubId } = scope;
  const version = Math.max(row.version, (await maxPublishedVersion(manager, clubId)) + 1);
  await manager.query(
    `UPDATE rule_set SET status = 'archived', revision = revision + 1, "updatedAt" = now()
      WHERE "clubId" = $1 AND status = 'published'`,
    [clubId],
  );
  row.version = version;
  row.status = 'published';
  row.publishedAt = new Date();
  row.body = documentOf(row);
  const saved = await manager.getRepository(RuleSet).save(row);
  await recordChange(scope, saved, action, []);
  return reload(manager, saved.id);
}

async function reload(manager: EntityManager, id: string): Promise<RuleSetDto> {
  const row = await manager
    .getRepository(RuleSet)
    .findOneOrFail({ where: { id }, relations: { author: true } });
  return ruleSetDto(row);
}

/** Serialises rule-set writes of one club (version numbers, the single published row). */
async function lockClubRuleSets(manager: EntityManager, clubId: string): Promise<void> {
  await manager.query('SELECT pg_advisory_xact_lock(hashtext($1))', [`rule_set:${clubId}`]);
}

async function maxVersion(manager: EntityManager, clubId: string): Promise<number> {
  const [row] = await manager.query(
    'SELECT COALESCE(MAX(version), 0) AS v FROM rule_set WHERE "clubId" = $1',
    [clubId],
  );
  return Math.max(Number(row?.v ?? 0), defaultRules().version ?? 0);
}

async function maxPublishedVersion(manager: EntityManager, clubId: string): Promise<number> {
  const [row] = await manager.query(
    `SELECT COALESCE(MAX(version), 0) AS v FROM rule_set WHERE "clubId" = $1 AND status <> 'draft'`,
    [clubId],
  );
  return Number(row?.v ?? 0);
}

async function recordChange(
  scope: ClubScope,
  row: RuleSet,
  action: RuleSetChangeAction,
  changedPaths: string[],
  changes: RuleSetDiffEntry[] | null = null,
): Promise<void> {
  const { auth } = scope;
  const repo = scope.manager.getRepository(RuleSetChange);
  await repo.insert({
    clubId: auth.clubId,
    ruleSetId: row.id,
    action,
    version: row.version,
    revision: row.revision,
    authorId: auth.userId,
    authorName: auth.name,
    changedPaths: changedPaths.slice(0, MAX_CHANGED_PATHS),
    changes: changes ? changes.slice(0, MAX_CHANGED_PATHS) : null,
    body: row.body as object,
  });
}

/** Why a version that is not a draft cannot change, a whole sentence for each state. */
function cannotChange(row: Pick<RuleSet, 'version' | 'status'>): string {
  const version = row.version;
  return row.status === 'published'
    ? $localize`Version ${version}:version: is published and cannot change; start a draft from it.`
    : $localize`Version ${version}:version: is archived and cannot change; start a draft from it.`;
}

/** Why a version that is not a draft cannot be published, a whole sentence for each state. */
function alreadyDone(row: Pick<RuleSet, 'version' | 'status'>): string {
  const version = row.version;
  return row.status === 'published'
    ? $localize`Version ${version}:version: is already published.`
    : $localize`Version ${version}:version: is already archived.`;
}

function refOf(row: RuleSet): RuleSetRef {
  return { id: row.id, name: row.name, version: row.version, status: row.status };
}

export function ruleSetDto(row: RuleSet & { author?: User | null }): RuleSetDto {
  return {
    id: row.id,
    name: row.name,
    version: row.version,
    status: row.status,
    body: inReaderWords(row.body as RuleSetDocument),
    authorId: row.authorId ?? '',
    authorName: row.author?.name ?? formerMember(),
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    revision: row.revision,
  };
}

function defaultDto(body: RuleSetDocument): RuleSetDto {
  const epoch = new Date(0).toISOString();
  return {
    id: DEFAULT_RULE_SET_ID,
    name: body.name ?? $localize`Default rules`,
    version: body.version,
    status: 'published',
    body: inReaderWords(body),
    authorId: '',
    authorName: 'Conewise',
    createdAt: epoch,
    updatedAt: epoch,
    revision: 0,
  };
}
