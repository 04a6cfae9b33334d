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
 * A request to choose a new password by e-mail. Only a SHA-256 hash of the single-use token is
 * kept; the token travels in the e-mailed link's fragment, which no server ever logs.
 */
@Entity({ name: 'password_reset' })
export class PasswordReset {
  @PrimaryGeneratedColumn('uuid', { primaryKeyConstraintName: 'PK_password_reset_id' })
  id!: string;

  @Index('IDX_password_reset_userId')
  @Column({ type: 'uuid' })
  userId!: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'userId', foreignKeyConstraintName: 'FK_password_reset_userId' })
  user?: User;

  @Index('UQ_password_reset_tokenHash', { unique: true })
  @Column({ type: 'varchar', length: 64 })
  tokenHash!: string;

  @Column({ type: 'timestamptz' })
  expiresAt!: Date;

  /** Set when the link was used, or made useless by a newer password. */
  @Column({ type: 'timestamptz', nullable: true })
  usedAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
