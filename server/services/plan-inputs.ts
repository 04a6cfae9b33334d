import type { EntityManager } from 'typeorm';
import type { FeedbackFact } from '../../shared/types/plan-request';
import type { RuleSetDocument } from '../../shared/types/plan-rules';
import { preparedQuery } from '../db/prepared-query';
import { RuleSet } from '../entities/rule-set';
import { Team } from '../entities/team';
import { notFound } from '../http/problem';
import type { ClubScope } from './club-scope';
import { inReaderWords } from '../i18n/rule-set-words';
import { defaultRules } from './engine-port';
import { cachedDocument, documentOf, type RuleSetRevision } from './rules-resolver';
import { isUuid } from '../../shared/types/uuid';

/** A roster entry as a plan request needs it. */
export interface RosterEntry {
  id: string;
  displayName: string;
  goalkeeper: boolean;
}

/** Everything a new plan reads from the database, already checked against the caller's access. */
export interface PlanInputs {
  team: Team;
  roster: RosterEntry[];
  recentFeedback: FeedbackFact[];
  /** Activities of the team's latest plans, newest plan first, each once (no drinks breaks). */
  recentActivityIds: string[];
  /** What the team's staff pinned for this plan. */
  pinnedActivityIds: string[];
  rules: RuleSetDocument;
}

interface InputsRow {
  team: { id: string; clubId: string; name: string; pinnedActivityIds: string[] } | null;
  attached: boolean;
  roster: RosterEntry[];
  feedback: {
    activityKind: string | null;
    activityId: string | null;
    verdict: FeedbackFact['verdict'];
    areaWidth: number | null;
    areaLength: number | null;
    groupSize: number | null;
  }[];
  recentActivityIds: string[];
  rules: RuleSetRevision | null;
}

/** How many of the team's latest plans count as "lately" for variety. */
export const RECENT_PLANS_FOR_VARIETY = 3;
/** The plan-request schema's limit on recentActivityIds. */
const MAX_RECENT_ACTIVITY_IDS = 60;

// One round trip instead of six: every part is limited to the caller's club (the feedback and
// plans by a team that must be the club's), and nothing is returned until the access check has
// passed. The recent activities come from the team's last plans' activityIds, newest plan first,
// each kept at its first place.
const PLAN_INPUTS_SQL = `
SELECT
  (SELECT json_build_object('id', t.id, 'clubId', t."clubId", 'name', t.name,
                            'pinnedActivityIds', t."pinnedActivityIds")
     FROM team t WHERE t.id = $1 AND t."clubId" = $2) AS team,
  EXISTS (SELECT 1 FROM team_coach tc WHERE tc."teamId" = $1 AND tc."userId" = $3) AS attached,
  (SELECT coalesce(json_agg(json_build_object('id', p.id, 'displayName', p."displayName",
                                              'goalkeeper', p.goalkeeper)), '[]'::json)
     FROM player p WHERE p."teamId" = $1 AND p."clubId" = $2) AS roster,
  (SELECT coalesce(json_agg(json_build_object('activityKind', f."activityKind", 'activityId', f."activityId",
                                              'verdict', f.verdict,
                                              'areaWidth', f."areaWidth", 'areaLength', f."areaLength",
                                              'groupSize', f."groupSize")
                            ORDER BY f."createdAt" DESC), '[]'::json)
     FROM (SELECT * FROM feedback
            WHERE "teamId" = $1 AND "clubId" = $2
            ORDER BY "createdAt" DESC LIMIT $4) f) AS feedback,
  (SELECT coalesce(json_agg(a.id ORDER BY a.at), '[]'::json)
     FROM (SELECT u.id, min(ARRAY[p.n, u.i]) AS at
             FROM (SELECT sp."activityIds", row_number() OVER (ORDER BY sp."createdAt" DESC, sp.id) AS n
                     FROM session_plan sp
                    WHERE sp."teamId" = $1 AND sp."clubId" = $2
                    ORDER BY sp."createdAt" DESC, sp.id LIMIT $5) p
            CROSS JOIN LATERAL unnest(p."activityIds") WITH ORDINALITY AS u(id, i)
            GROUP BY u.id) a) AS "recentActivityIds",
  (SELECT json_build_object('id', r.id, 'version', r.version, 'revision', r.revision)
     FROM rule_set r WHERE r."clubId" = $2 AND r.status = 'published'
     ORDER BY r.version DESC LIMIT 1) AS rules`;

/**
 * The team (404 outside the club, 403 when the caller may not plan for it), its roster, its
 * latest station verdicts, the activities of its latest plans, its pins and the club's published
 * rules (the engine's default when none).
 */
export async function loadPlanInputs(
  manager: EntityManager,
  scope: ClubScope,
  teamId: string,
  feedbackLimit: number,
  recentPlans = RECENT_PLANS_FOR_VARIETY,
): Promise<PlanInputs> {
  if (!isUuid(teamId)) throw notFound('team');
  const rows = await preparedQuery<InputsRow>(manager, 'plan-inputs', PLAN_INPUTS_SQL, [
    teamId,
    scope.clubId,
    scope.auth.userId,
    feedbackLimit,
    recentPlans,
  ]);
  const row = rows[0]!;
  const team = scope.assertManageable(row.team ? Object.assign(new Team(), row.team) : null, row.attached);
  const recentActivityIds = row.recentActivityIds
    .filter((id) => /^[a-z0-9][a-z0-9-]*$/.test(id) && id.length <= 64)
    .slice(0, MAX_RECENT_ACTIVITY_IDS);
  const recentFeedback: FeedbackFact[] = row.feedback
    .filter((f) => f.activityKind)
    .map((f) => ({
      activityKind: f.activityKind as string,
      ...(f.activityId && /^[a-z0-9][a-z0-9-]*$/.test(f.activityId) ? { activityId: f.activityId } : {}),
      verdict: f.verdict,
      ...(f.areaWidth !== null ? { areaWidth: f.areaWidth } : {}),
      ...(f.areaLength !== null ? { areaLength: f.areaLength } : {}),
      ...(f.groupSize !== null ? { groupSize: f.groupSize } : {}),
    }));
  const rules = inReaderWords(
    row.rules ? await publishedDocument(manager, scope.clubId, row.rules) : defaultRules(),
  );
  return {
    team,
    roster: row.roster,
    recentFeedback,
    recentActivityIds,
    pinnedActivityIds: team.pinnedActivityIds ?? [],
    rules,
  };
}

/** The published rules: from the cache when this revision is known, else read (about 46 kB) once. */
async function publishedDocument(
  manager: EntityManager,
  clubId: string,
  revision: RuleSetRevision,
): Promise<RuleSetDocument> {
  const cached = cachedDocument(revision);
  if (cached) return cached;
  const row = await manager.getRepository(RuleSet).findOneBy({ id: revision.id, clubId });
  return row ? documentOf(row) : defaultRules();
}
