import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import { Club } from './club';
import { SessionPlan } from './session-plan';

/**
 * A read-only link to one plan for a parent helper without an account. Only a SHA-256 hash of
 * the long random token is kept; the token itself travels in the link's fragment.
 */
@Entity({ name: 'helper_link' })
export class HelperLink {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  planId!: string;

  @ManyToOne(() => SessionPlan, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'planId' })
  plan?: SessionPlan;

  @Column({ type: 'uuid' })
  clubId!: string;

  @ManyToOne(() => Club, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'clubId' })
  club?: Club;

  @Column({ type: 'varchar', length: 64, unique: true })
  tokenHash!: string;

  /** The member who made it; null once they leave. */
  @Column({ type: 'uuid', nullable: true })
  createdBy!: string | null;

  /** How many people the link was e-mailed to with the plan (0 when made to copy). */
  @Column({ type: 'integer', default: 0 })
  emailedTo!: number;

  @Column({ type: 'timestamptz' })
  expiresAt!: Date;

  @Column({ type: 'timestamptz', nullable: true })
  revokedAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
