import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

export type OutboxStatus = 'pending' | 'sent' | 'failed';

/** An attachment kept with a queued message; content is base64. */
export interface OutboxAttachment {
  filename: string;
  contentType: string;
  contentBase64: string;
}

/** Where answers go when it is not the sending address (a name and an address). */
export interface OutboxReplyTo {
  name: string;
  address: string;
}

/**
 * An e-mail waiting to be sent. Every send goes through this table so a mail server that is
 * down loses nothing; senders claim rows with FOR UPDATE SKIP LOCKED.
 */
@Entity({ name: 'outbox_message' })
@Index(['status', 'nextAttemptAt'])
export class OutboxMessage {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid', nullable: true })
  clubId!: string | null;

  /** What the message is about, e.g. 'invitation' or 'plan-share'. */
  @Column({ type: 'varchar', length: 32 })
  kind!: string;

  @Column({ type: 'jsonb' })
  recipients!: string[];

  @Column({ type: 'varchar', length: 200 })
  subject!: string;

  /** Reply-To: answers go to this person; From stays the club's sending address. */
  @Column({ type: 'jsonb', nullable: true })
  replyTo!: OutboxReplyTo | null;

  @Column({ type: 'text' })
  textBody!: string;

  @Column({ type: 'text', nullable: true })
  htmlBody!: string | null;

  @Column({ type: 'jsonb', default: () => "'[]'" })
  attachments!: OutboxAttachment[];

  @Column({ type: 'varchar', length: 10, default: 'pending' })
  status!: OutboxStatus;

  @Column({ type: 'integer', default: 0 })
  attempts!: number;

  @Column({ type: 'timestamptz', default: () => 'now()' })
  nextAttemptAt!: Date;

  @Column({ type: 'text', nullable: true })
  lastError!: string | null;

  @Column({ type: 'timestamptz', nullable: true })
  sentAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
