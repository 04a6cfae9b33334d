import '../../shared/i18n/localize';
import type { DataSource } from 'typeorm';
import type { AppConfig } from '../config';
import { Membership } from '../entities/membership';
import { PasswordReset } from '../entities/password-reset';
import { User } from '../entities/user';
import { hashPassword, normaliseEmail } from './auth-service';
import { markConfirmed } from './email-verification-service';
import { PASSWORD_RESET_MAIL, type MailQueue } from './mail-queue';
import { clearFailures } from './sign-in-throttle';
import { claimLink, hashLinkToken, linksSentInLastHour, newLinkToken } from './link-token';

/** How long a reset link works. */
export const RESET_TTL_MINUTES = 30;
/** Reset e-mails one address can be sent in an hour; asking more often sends nothing more. */
export const RESETS_PER_HOUR = 3;

/**
 * The same answer whether or not an account uses the address, so it tells no one who has one.
 * A getter, so each request reads it in its own language (and JSON still writes `message`).
 */
export const RESET_REQUESTED = {
  get message(): string {
    return $localize`If an account uses this address, an e-mail with a link to choose a new password is on its way. The link works once, for ${RESET_TTL_MINUTES}:minutes: minutes.`;
  },
};

/** The reset e-mail. The token is in the link's fragment (after #), which browsers never send. */
export function passwordResetMail(config: AppConfig, name: string, token: string) {
  const link = `${config.publicUrl.replace(/\/$/, '')}/reset-password#${token}`;
  return {
    subject: $localize`:subject of the password reset e-mail:Choose a new Conewise password`,
    text: [
      $localize`:greeting at the top of an e-mail:Hello ${name}:name:,`,
      '',
      $localize`:password reset e-mail:Someone (we hope you) asked to choose a new password for this address on Conewise: ${link}:link:`,
      '',
      $localize`:password reset e-mail:The link works once and for ${RESET_TTL_MINUTES}:minutes: minutes. Using it signs you out everywhere.`,
      $localize`:password reset e-mail:If you did not ask, ignore this e-mail: your password stays as it is.`,
    ].join('\n'),
    link,
  };
}

/** Choosing a new password by e-mail: ask for a link, then use it once. */
export class PasswordResetService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly config: AppConfig,
    private readonly mail: MailQueue,
  ) {}

  /** Queues a reset e-mail when an account uses the address (at most RESETS_PER_HOUR an hour). */
  async request(input: { email: string }): Promise<void> {
    const email = normaliseEmail(input.email);
    await this.dataSource.transaction(async (manager) => {
      const user = await manager.getRepository(User).findOneBy({ email });
      if (!user) return;
      if ((await linksSentInLastHour(manager, 'password_reset', user.id)) >= RESETS_PER_HOUR) return;
      const token = newLinkToken();
      await manager.getRepository(PasswordReset).save({
        userId: user.id,
        tokenHash: hashLinkToken(token),
        expiresAt: new Date(Date.now() + RESET_TTL_MINUTES * 60_000),
        usedAt: null,
      });
      const membership = await manager.getRepository(Membership).findOneBy({ userId: user.id });
      const mail = passwordResetMail(this.config, user.name, token);
      await this.mail.enqueue(manager, {
        clubId: membership?.clubId ?? null,
        kind: PASSWORD_RESET_MAIL,
        recipients: [user.email],
        subject: mail.subject,
        text: mail.text,
      });
    });
  }

  /**
   * Sets the new password if the link is unused and in date; the link and every other open link
   * of the person stop working, and every session ends.
   */
  async confirm(input: { token: string; password: string }): Promise<void> {
    const passwordHash = await hashPassword(input.password);
    await this.dataSource.transaction(async (manager) => {
      const userId = await claimLink(manager, 'password_reset', input.token);
      const [updated] = (await manager.query(
        `UPDATE app_user SET "passwordHash" = $2, "tokenVersion" = "tokenVersion" + 1 WHERE id = $1 RETURNING email`,
        [userId, passwordHash],
      )) as [{ email: string }[], number];
      // Whoever was guessing the old password no longer keeps the owner locked out.
      if (updated[0]) await clearFailures(manager, updated[0].email);
      // The link reached the address and was opened: the address is confirmed too.
      await markConfirmed(manager, userId);
      await manager.query(
        `UPDATE password_reset SET "usedAt" = now() WHERE "userId" = $1 AND "usedAt" IS NULL`,
        [userId],
      );
    });
  }
}
