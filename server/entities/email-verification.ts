import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import { User } from './user';

/**
 * A link that confirms a new account's e-mail address. Only a SHA-256 hash of the single-use
 * token is kept; the token travels in the e-mailed link's fragment, which no server ever logs.
 */
@Entity({ name: 'email_verification' })
export class EmailVerification {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'PK_email_verification_id' })
  id!: string;

  @Index('IDX_email_verification_userId')
  @Column({ type: 'uuid' })
  userId!: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'userId', foreignKeyConstraintName: 'FK_email_verification_userId' })
  user?: User;

  @Index('UQ_email_verification_tokenHash', { unique: true })
  @Column({ type: 'varchar', length: 64 })
  tokenHash!: string;

  @Column({ type: 'timestamptz' })
  expiresAt!: Date;

  /** Set when the link was used, or made useless once the address was confirmed. */
  @Column({ type: 'timestamptz', nullable: true })
  usedAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
