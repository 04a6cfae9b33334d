import type { EntityManager } from 'typeorm';
import { OutboxMessage, type OutboxAttachment, type OutboxReplyTo } from '../entities/outbox-message';

/** The outbox kind of a password reset e-mail. */
export const PASSWORD_RESET_MAIL = 'password-reset';
/** The outbox kind of an invitation e-mail. */
export const INVITATION_MAIL = 'invitation';
/** The outbox kind of the e-mail that confirms a new account's address. */
export const EMAIL_VERIFICATION_MAIL = 'email-verification';
/**
 * What a message's body reads once sent. Bodies can hold working links (invitations, resets,
 * confirmations, helper links) and plan cards carry children's first names: after delivery the
 * outbox keeps only who it went to, the subject and how sending went.
 */
export const CLEARED_BODY = '(Cleared once sent: the outbox keeps only recipients, subject and status.)';

/** The outbox's subject column holds this many characters. */
export const SUBJECT_MAX_LENGTH = 200;

/**
 * A subject that fits the outbox: a longer one (a long club and person name) is cut at a whole
 * character, never inside an emoji or accented letter, and ends with "…".
 */
export function fitSubject(subject: string, max = SUBJECT_MAX_LENGTH): string {
  const oneLine = subject.replace(/[\r\n]+/g, ' ');
  // UTF-16 length, never less than PostgreSQL's count of characters: what fits here fits there.
  if (oneLine.length <= max) return oneLine;
  let out = '';
  for (const { segment: character } of new Intl.Segmenter('en', { granularity: 'grapheme' }).segment(
    oneLine,
  )) {
    if (out.length + character.length > max - 1) break;
    out += character;
  }
  return `${out.trimEnd()}…`;
}

/** A message to send later through the outbox. */
export interface QueuedMail {
  clubId: string | null;
  kind: string;
  recipients: string[];
  subject: string;
  /** Where answers go (the sender stays the club's address). */
  replyTo?: OutboxReplyTo;
  text: string;
  html?: string;
  attachments?: OutboxAttachment[];
}

/**
 * The small interface routes use to send e-mail. Messages are queued inside the caller's
 * transaction, so an invitation and its e-mail are stored together or not at all.
 */
export interface MailQueue {
  enqueue(manager: EntityManager, mail: QueuedMail): Promise<string>;
}

/** Writes a pending outbox row; the outbox sender delivers it with retries. */
export const outboxMailQueue: MailQueue = {
  async enqueue(manager, mail) {
    const row = manager.getRepository(OutboxMessage).create({
      clubId: mail.clubId,
      kind: mail.kind,
      recipients: mail.recipients,
      subject: fitSubject(mail.subject),
      replyTo: mail.replyTo ?? null,
      textBody: mail.text,
      htmlBody: mail.html ?? null,
      attachments: mail.attachments ?? [],
      status: 'pending',
      attempts: 0,
      nextAttemptAt: new Date(),
    });
    const saved = await manager.getRepository(OutboxMessage).save(row);
    return saved.id;
  },
};
