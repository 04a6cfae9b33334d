import '../../shared/i18n/localize';
import bcrypt from 'bcryptjs';
import type { EntityManager } from 'typeorm';
import { conflict, HttpError, unauthorized } from '../http/problem';
import type { ClubScope } from './club-scope';

/**
 * What is stored in place of a deleted person's name where the club keeps something they made
 * (rule_set_change.authorName). Readers see formerMember() in their own language instead.
 */
export const FORMER_MEMBER_STORED = 'Former member';

/** The neutral label shown where a deleted person's name used to be. */
export function formerMember(): string {
  return $localize`:shown instead of the name of someone whose account was deleted:Former member`;
}

/**
 * Removes one person's account inside the caller's transaction. What was only theirs goes (the
 * user row, memberships, team staff places, password resets, address confirmations, sign-in
 * throttles, replayable answers, e-mails addressed to them alone); what the club keeps (plans,
 * rule sets and their history, feedback, registers, helper links, invitations) stays, with the
 * reference to them cleared and their stored name replaced by FORMER_MEMBER_STORED. Their tokens
 * stop working at once: every request re-reads the user and membership rows.
 */
export async function eraseAccount(manager: EntityManager, userId: string): Promise<void> {
  const [user] = (await manager.query(`SELECT email FROM app_user WHERE id = $1`, [userId])) as {
    email: string;
  }[];
  if (!user) return;
  // What the club keeps: the author is no longer named.
  await manager.query(
    `UPDATE rule_set_change SET "authorId" = NULL, "authorName" = $2 WHERE "authorId" = $1`,
    [userId, FORMER_MEMBER_STORED],
  );
  await manager.query(`UPDATE rule_set SET "authorId" = NULL WHERE "authorId" = $1`, [userId]);
  await manager.query(`UPDATE session_plan SET "authorId" = NULL WHERE "authorId" = $1`, [userId]);
  await manager.query(`UPDATE feedback SET "authorId" = NULL WHERE "authorId" = $1`, [userId]);
  await manager.query(`UPDATE attendance SET "recordedById" = NULL WHERE "recordedById" = $1`, [userId]);
  await manager.query(`UPDATE helper_link SET "createdBy" = NULL WHERE "createdBy" = $1`, [userId]);
  await manager.query(`UPDATE invitation SET "invitedById" = NULL WHERE "invitedById" = $1`, [userId]);
  // Mail that is still to go keeps going, but answers no longer go to the deleted address.
  await manager.query(`UPDATE outbox_message SET "replyTo" = NULL WHERE "replyTo"->>'address' = $1`, [
    user.email,
  ]);
  // What was only theirs.
  await manager.query(`DELETE FROM outbox_message WHERE recipients = jsonb_build_array($1::text)`, [
    user.email,
  ]);
  await manager.query(`DELETE FROM sign_in_throttle WHERE email = $1`, [user.email]);
  await manager.query(`DELETE FROM idempotency_record WHERE "userId" = $1`, [userId]);
  await manager.query(`DELETE FROM password_reset WHERE "userId" = $1`, [userId]);
  await manager.query(`DELETE FROM email_verification WHERE "userId" = $1`, [userId]);
  await manager.query(`DELETE FROM team_coach WHERE "userId" = $1`, [userId]);
  await manager.query(`DELETE FROM membership WHERE "userId" = $1`, [userId]);
  await manager.query(`DELETE FROM app_user WHERE id = $1`, [userId]);
}

const wrongPassword = () =>
  new HttpError(
    400,
    $localize`:title of an error answer:Wrong password`,
    $localize`Your password is not right, so your account was not deleted.`,
    [{ field: 'password', message: $localize`:field error after the field's name:is not right` }],
    '/problems/wrong-password',
  );

/** DELETE /api/auth/me: anyone deletes their own account, given their password. */
export class AccountDeletionService {
  constructor(private readonly scope: ClubScope) {}

  async deleteOwn(password: string): Promise<void> {
    const { auth } = this.scope;
    const [user] = (await this.scope.manager.query(`SELECT "passwordHash" FROM app_user WHERE id = $1`, [
      auth.userId,
    ])) as { passwordHash: string }[];
    if (!user) throw unauthorized();
    if (!(await bcrypt.compare(password, user.passwordHash))) throw wrongPassword();
    await this.scope.transaction(async (scope) => {
      // The same lock as member changes (MemberService), so two leads deleting themselves at
      // once, or a lead demoting the other, take turns and the club keeps a head of coaching.
      await scope.manager.query('SELECT id FROM club WHERE id = $1 FOR NO KEY UPDATE', [auth.clubId]);
      const [membership] = (await scope.manager.query(
        `SELECT role FROM membership WHERE "userId" = $1 AND "clubId" = $2`,
        [auth.userId, auth.clubId],
      )) as { role: string }[];
      if (!membership) throw unauthorized();
      if (membership.role === 'lead') {
        const [{ leads }] = (await scope.manager.query(
          `SELECT count(*)::int AS leads FROM membership WHERE "clubId" = $1 AND role = 'lead'`,
          [auth.clubId],
        )) as { leads: number }[];
        if (leads <= 1) {
          const club = auth.clubName;
          throw conflict(
            $localize`${club}:clubName: needs at least one head of coaching. Make someone else head of coaching on the Members page first, then delete your account (or delete the whole club there).`,
          );
        }
      }
      await eraseAccount(scope.manager, auth.userId);
    });
  }
}
