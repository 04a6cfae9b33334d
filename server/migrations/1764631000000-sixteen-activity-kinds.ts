import type { MigrationInterface, QueryRunner } from 'typeorm';
import { isFirstFormat, upgradeRuleSet } from '../../engine';

/** Kinds of the first format that now have another name. */
const RENAMED_KINDS: Record<string, string> = { pairs: 'passing-pattern' };
/** What a phase without stations (or without a kind of its own) is taken to be. */
const FALLBACK_KIND = 'ball-mastery';
const BATCH = 200;

type Loose = Record<string, unknown>;

const isObject = (value: unknown): value is Loose =>
  value !== null && typeof value === 'object' && !Array.isArray(value);
const renamed = (kind: unknown): unknown => (typeof kind === 'string' ? (RENAMED_KINDS[kind] ?? kind) : kind);

/**
 * A stored request with the current kind names in its feedback facts. Returns null when nothing
 * changes, so untouched rows are not rewritten.
 */
export function upgradeStoredRequest(request: unknown): Loose | null {
  if (!isObject(request) || !Array.isArray(request['recentFeedback'])) return null;
  let changed = false;
  const recentFeedback = request['recentFeedback'].map((fact: unknown) => {
    if (!isObject(fact) || renamed(fact['activityKind']) === fact['activityKind']) return fact;
    changed = true;
    return { ...fact, activityKind: renamed(fact['activityKind']) };
  });
  return changed ? { ...request, recentFeedback } : null;
}

/**
 * A stored plan in the current shape: `pairs` stations become `passing-pattern`, every phase
 * names its kind (its first station's, else ball mastery), every station lists its start
 * positions (none are known for an old plan: the screens and the card draw what there is).
 * Returns null when the plan is already in the current shape.
 */
export function upgradeStoredPlan(plan: unknown): Loose | null {
  if (!isObject(plan) || !Array.isArray(plan['phases'])) return null;
  let changed = false;
  const phases = plan['phases'].map((phase: unknown) => {
    if (!isObject(phase)) return phase;
    const stations = Array.isArray(phase['stations']) ? phase['stations'] : [];
    const upgradedStations = stations.map((station: unknown) => {
      if (!isObject(station)) return station;
      const kind = renamed(station['activityKind']);
      if (kind === station['activityKind'] && Array.isArray(station['positions'])) return station;
      changed = true;
      return {
        ...station,
        activityKind: kind,
        positions: Array.isArray(station['positions']) ? station['positions'] : [],
      };
    });
    const firstKind = isObject(upgradedStations[0]) ? upgradedStations[0]['activityKind'] : undefined;
    const activityKind =
      phase['activityKind'] === undefined ? (firstKind ?? FALLBACK_KIND) : renamed(phase['activityKind']);
    if (activityKind !== phase['activityKind']) changed = true;
    return { ...phase, activityKind, stations: upgradedStations };
  });
  const request = upgradeStoredRequest(plan['request']);
  const forbidden = Array.isArray(plan['forbiddenActivities'])
    ? plan['forbiddenActivities'].map((f: unknown) => {
        if (!isObject(f) || renamed(f['kind']) === f['kind']) return f;
        changed = true;
        return { ...f, kind: renamed(f['kind']) };
      })
    : undefined;
  if (!changed && !request) return null;
  return {
    ...plan,
    ...(request ? { request } : {}),
    phases,
    ...(forbidden ? { forbiddenActivities: forbidden } : {}),
  };
}

/**
 * Stored data for the engine's sixteen activity kinds:
 * - plans (`session_plan.plan` and its `request` copy) take the current shape (see upgradeStoredPlan);
 * - feedback rows about `pairs` stations are about `passing-pattern` now;
 * - every club rule set still in the first format is replaced by the engine's `upgradeRuleSet`
 *   of it (the club's tuning carried over where it still has a place); its id, version and name
 *   columns stay, its revision moves on so no cache or open editor keeps the old document.
 *
 * `rule_set_change` rows are left as written: they are the history of what the lead did (who,
 * when, which JSON paths), nothing reads their bodies back (a rollback copies a `rule_set` row,
 * which is upgraded here), and rewriting them would make the history say something nobody wrote.
 * Their paths may name first-format places such as `/parameters/phaseTemplates`.
 */
export class SixteenActivityKinds1764631000000 implements MigrationInterface {
  name = 'SixteenActivityKinds1764631000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await this.upgradePlans(queryRunner);
    await queryRunner.query(
      `UPDATE "feedback" SET "activityKind" = 'passing-pattern' WHERE "activityKind" = 'pairs'`,
    );
    await this.upgradeRuleSets(queryRunner);
  }

  /**
   * The first format cannot be brought back: an upgraded rule set has new tables and activities
   * the first engine would refuse, and a plan does not remember which stations were `pairs`.
   * Restore a backup taken before the upgrade instead.
   */
  async down(): Promise<void> {
    throw new Error(
      'SixteenActivityKinds1764631000000 cannot be undone: the first-format rule sets and plans are not kept. ' +
        'Restore a database backup taken before the upgrade.',
    );
  }

  private async upgradePlans(queryRunner: QueryRunner): Promise<void> {
    let after = '00000000-0000-0000-0000-000000000000';
    for (;;) {
      const rows: { id: string; request: unknown; plan: unknown }[] = await queryRunner.query(
        `SELECT id, request, plan FROM "session_plan" WHERE id > $1 ORDER BY id LIMIT ${BATCH}`,
        [after],
      );
      if (!rows.length) return;
      for (const row of rows) {
        const plan = upgradeStoredPlan(row.plan);
        const request = upgradeStoredRequest(row.request);
        if (!plan && !request) continue;
        // "updatedAt" stays: the coach did not change the plan.
        await queryRunner.query(
          `UPDATE "session_plan" SET plan = $2::json, request = $3::json WHERE id = $1`,
          [row.id, JSON.stringify(plan ?? row.plan), JSON.stringify(request ?? row.request)],
        );
      }
      after = rows[rows.length - 1]!.id;
    }
  }

  private async upgradeRuleSets(queryRunner: QueryRunner): Promise<void> {
    const rows: { id: string }[] = await queryRunner.query(`SELECT id FROM "rule_set" ORDER BY id`);
    for (const { id } of rows) {
      // One body at a time: a rule set is about 46 kB.
      const [row] = (await queryRunner.query(`SELECT body FROM "rule_set" WHERE id = $1`, [id])) as {
        body: unknown;
      }[];
      if (!row || !isFirstFormat(row.body)) continue;
      const body = upgradeRuleSet(row.body as Loose);
      await queryRunner.query(
        `UPDATE "rule_set" SET body = $2::json, revision = revision + 1 WHERE id = $1`,
        [id, JSON.stringify(body)],
      );
    }
  }
}
