import '../../shared/i18n/localize';
import type { EntityManager } from 'typeorm';
import { badRequest, notFound } from '../http/problem';
import type { ClubScope } from './club-scope';

/** What a deletion statement's $1 is: the club's id, its members' ids or their e-mail addresses. */
type Key = 'club' | 'members' | 'emails';

/**
 * Every table that holds the club's rows, children before parents (the foreign keys in
 * server/migrations), each with the statement that removes the club's rows. A new table with
 * club rows belongs here; the API test (tests/api/delete-account-club.spec.ts) scans every table
 * and fails if one is missed.
 */
const DELETIONS: readonly [Key, string][] = [
  ['club', `DELETE FROM helper_link WHERE "clubId" = $1`],
  ['club', `DELETE FROM attendance WHERE "clubId" = $1`],
  ['club', `DELETE FROM feedback WHERE "clubId" = $1`],
  ['club', `DELETE FROM session_plan WHERE "clubId" = $1`],
  ['club', `DELETE FROM scheduled_session WHERE "clubId" = $1`],
  ['club', `DELETE FROM team_calendar WHERE "clubId" = $1`],
  ['club', `DELETE FROM kit_bag WHERE "clubId" = $1`],
  ['club', `DELETE FROM player WHERE "clubId" = $1`],
  ['club', `DELETE FROM team_coach WHERE "teamId" IN (SELECT id FROM team WHERE "clubId" = $1)`],
  ['members', `DELETE FROM team_coach WHERE "userId" = ANY($1::uuid[])`],
  ['club', `DELETE FROM invitation WHERE "clubId" = $1`],
  ['club', `DELETE FROM rule_set_change WHERE "clubId" = $1`],
  ['club', `DELETE FROM rule_set WHERE "clubId" = $1`],
  ['club', `DELETE FROM team WHERE "clubId" = $1`],
  ['club', `DELETE FROM outbox_message WHERE "clubId" = $1`],
  // Mail to its members alone that belongs to no club (password resets, address confirmations).
  ['emails', `DELETE FROM outbox_message WHERE "clubId" IS NULL AND recipients <@ to_jsonb($1::text[])`],
  ['members', `DELETE FROM idempotency_record WHERE "userId" = ANY($1::uuid[])`],
  ['members', `DELETE FROM password_reset WHERE "userId" = ANY($1::uuid[])`],
  ['members', `DELETE FROM email_verification WHERE "userId" = ANY($1::uuid[])`],
  ['emails', `DELETE FROM sign_in_throttle WHERE email = ANY($1::text[])`],
  ['club', `DELETE FROM membership WHERE "clubId" = $1`],
  // A user belongs to one club; one who somehow belongs to another too keeps their account.
  [
    'members',
    `DELETE FROM app_user u WHERE u.id = ANY($1::uuid[]) AND NOT EXISTS (SELECT 1 FROM membership m WHERE m."userId" = u.id)`,
  ],
  ['club', `DELETE FROM club WHERE id = $1`],
];

const nameDoesNotMatch = (clubName: string) =>
  badRequest($localize`The club’s name was not typed exactly, so nothing was deleted.`, [
    {
      field: 'clubName',
      message: $localize`:field error after the field's name:does not match the club’s name, ${clubName}:clubName:`,
    },
  ]);

/** DELETE /api/club: the head of coaching deletes the whole club, after typing its name. */
export class ClubDeletionService {
  constructor(private readonly scope: ClubScope) {}

  async deleteClub(typedName: string): Promise<void> {
    await this.scope.transaction(async (scope) => {
      // FOR UPDATE waits for member changes (which hold FOR NO KEY UPDATE) and blocks new ones.
      const [club] = (await scope.manager.query(`SELECT name FROM club WHERE id = $1 FOR UPDATE`, [
        scope.clubId,
      ])) as {
        name: string;
      }[];
      if (!club) throw notFound('resource');
      if (typedName.trim() !== club.name.trim()) throw nameDoesNotMatch(club.name);
      await deleteClubRows(scope.manager, scope.clubId);
    });
  }
}

/** Deletes every row of the club in DELETIONS order (inside the caller's transaction). */
export async function deleteClubRows(manager: EntityManager, clubId: string): Promise<void> {
  const members = (await manager.query(
    `SELECT u.id, u.email FROM membership m JOIN app_user u ON u.id = m."userId" WHERE m."clubId" = $1`,
    [clubId],
  )) as { id: string; email: string }[];
  const values: Record<Key, unknown> = {
    club: clubId,
    members: members.map((m) => m.id),
    emails: members.map((m) => m.email),
  };
  for (const [key, statement] of DELETIONS) await manager.query(statement, [values[key]]);
}
