import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
  VersionColumn,
} from 'typeorm';
import type { RuleSetStatus } from '../../shared/types/api';
import { Club } from './club';
import { User } from './user';

/** A club's rule set document. Published versions are kept so old plans can name theirs. */
@Entity({ name: 'rule_set' })
@Index(['clubId', 'status'])
export class RuleSet {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  clubId!: string;

  @ManyToOne(() => Club, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'clubId' })
  club?: Club;

  @Column({ type: 'varchar', length: 120 })
  name!: string;

  /** Document version: increments on each publish. */
  @Column({ type: 'integer', default: 1 })
  version!: number;

  @Column({ type: 'varchar', length: 16, default: 'draft' })
  status!: RuleSetStatus;

  // json keeps the author's key order (see the DocumentsAsJson migration).
  @Column({ type: 'json' })
  body!: unknown;

  @Column({ type: 'uuid', nullable: true })
  authorId!: string | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'authorId' })
  author?: User | null;

  /** The rule set this draft was copied from, if any. */
  @Column({ type: 'uuid', nullable: true })
  basedOnId!: string | null;

  @Column({ type: 'timestamptz', nullable: true })
  publishedAt!: Date | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;

  /** Optimistic lock: a stale If-Match answers 409. */
  @VersionColumn({ type: 'integer' })
  revision!: number;
}
