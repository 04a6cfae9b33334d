import '../../shared/i18n/localize';
import type { DataSource, EntityManager } from 'typeorm';
import type { AppConfig } from '../config';
import { EmailVerification } from '../entities/email-verification';
import type { AuthContext } from '../http/auth-context';
import { HttpError } from '../http/problem';
import { EMAIL_VERIFICATION_MAIL, type MailQueue } from './mail-queue';
import { claimLink, hashLinkToken, linksSentInLastHour, newLinkToken } from './link-token';

/** How long a confirmation link works: two days, for mail read at the weekend's next session. */
export const VERIFICATION_TTL_HOURS = 48;
/** Confirmation e-mails one person can be sent in an hour; asking more often sends nothing more. */
export const VERIFICATIONS_PER_HOUR = 3;

/** The confirmation e-mail. The token is in the link's fragment (after #), never sent to servers. */
export function verificationMail(config: AppConfig, name: string, clubName: string, token: string) {
  const link = `${config.publicUrl.replace(/\/$/, '')}/confirm-email#${token}`;
  const hours = VERIFICATION_TTL_HOURS;
  return {
    subject: $localize`:subject of the e-mail that confirms a new account's address:Confirm your e-mail address for Conewise`,
    text: [
      $localize`:greeting at the top of an e-mail:Hello ${name}:name:,`,
      '',
      $localize`:e-mail that confirms a new account's address:You made ${clubName}:clubName: on Conewise with this address. Open this link to confirm it is yours: ${link}:link:`,
      '',
      // One paragraph, its line broken where the English breaks it.
      $localize`:e-mail that confirms a new account's address, one paragraph with a line break:The link works once and for ${hours}:hours: hours. Until then you can plan, but not invite\npeople or e-mail plans. If you did not make this account, ignore this e-mail.`,
    ].join('\n'),
    link,
  };
}

/** The answer to an unconfirmed person trying to send mail to others through Conewise. */
export function emailNotConfirmed(email: string): HttpError {
  return new HttpError(
    403,
    $localize`:title of an error answer:E-mail address not confirmed`,
    $localize`Confirm your e-mail address first: open the link we sent to ${email}:email:. Your account page can send it again.`,
    undefined,
    '/problems/email-not-confirmed',
  );
}

/** What the person is told after asking for another link. */
export function resendWords(outcome: 'sent' | 'confirmed' | 'wait', email: string): string {
  if (outcome === 'confirmed') return $localize`${email}:email: is confirmed already.`;
  if (outcome === 'wait')
    return $localize`We sent ${VERIFICATIONS_PER_HOUR}:count: links to ${email}:email: in the last hour: open the newest, or ask again later.`;
  return $localize`A new link is on its way to ${email}:email:. It works for ${VERIFICATION_TTL_HOURS}:hours: hours.`;
}

/**
 * Confirming that a new account's owner reads mail at its address (a mailed single-use secret,
 * kept hashed, short-lived), before the account may make Conewise send mail to anyone else
 * (invitations, plans): otherwise anyone could register a stranger's address and use the server
 * to mail whomever they like.
 */
export class EmailVerificationService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly config: AppConfig,
    private readonly mail: MailQueue,
  ) {}

  /** Queues a confirmation e-mail for `user`, inside the caller's transaction. */
  async issue(
    manager: EntityManager,
    user: { id: string; name: string; email: string },
    club: { id: string; name: string },
  ): Promise<void> {
    const token = newLinkToken();
    await manager.getRepository(EmailVerification).save({
      userId: user.id,
      tokenHash: hashLinkToken(token),
      expiresAt: new Date(Date.now() + VERIFICATION_TTL_HOURS * 3600_000),
      usedAt: null,
    });
    const mail = verificationMail(this.config, user.name, club.name, token);
    await this.mail.enqueue(manager, {
      clubId: club.id,
      kind: EMAIL_VERIFICATION_MAIL,
      recipients: [user.email],
      subject: mail.subject,
      text: mail.text,
    });
  }

  /**
   * Sends the link again: 'sent', or 'confirmed' (nothing to do) or 'wait' (VERIFICATIONS_PER_HOUR
   * were sent in the last hour; the newest still works).
   */
  async resend(auth: AuthContext): Promise<'sent' | 'confirmed' | 'wait'> {
    if (auth.emailVerified) return 'confirmed';
    return this.dataSource.transaction(async (manager) => {
      const recent = await linksSentInLastHour(manager, 'email_verification', auth.userId);
      if (recent >= VERIFICATIONS_PER_HOUR) return 'wait';
      await this.issue(
        manager,
        { id: auth.userId, name: auth.name, email: auth.email },
        { id: auth.clubId, name: auth.clubName },
      );
      return 'sent';
    });
  }

  /** Confirms the address the link was sent to; the link and every other one stop working. */
  async confirm(input: { token: string }): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      await markConfirmed(manager, await claimLink(manager, 'email_verification', input.token));
    });
  }
}

/**
 * Records that the person read mail at their address (a confirmation, invitation or password
 * link was opened); their open confirmation links stop working.
 */
export async function markConfirmed(manager: EntityManager, userId: string): Promise<void> {
  await manager.query(
    `UPDATE app_user SET "emailVerifiedAt" = now() WHERE id = $1 AND "emailVerifiedAt" IS NULL`,
    [userId],
  );
  await manager.query(
    `UPDATE email_verification SET "usedAt" = now() WHERE "userId" = $1 AND "usedAt" IS NULL`,
    [userId],
  );
}
