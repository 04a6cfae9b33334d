import { Column, CreateDateColumn, Entity, Index, JoinColumn, ManyToOne, PrimaryColumn } from 'typeorm';
import { User } from './user';

/** The headers of a first answer that a replay repeats. */
export interface ReplayedHeaders {
  contentType?: string;
  location?: string;
  etag?: string;
}

/**
 * The first answer to a create sent with an Idempotency-Key, kept so that the same request sent
 * again (a double tap, a retry after a lost answer) gets that answer instead of a second row.
 * One row per member, route and key; `status` is null while the first request is still running.
 */
@Entity({ name: 'idempotency_record' })
@Index('IDX_idempotency_record_expires', ['expiresAt'])
export class IdempotencyRecord {
  @PrimaryColumn({ type: 'uuid' })
  userId!: string;

  @ManyToOne(() => User, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'userId', foreignKeyConstraintName: 'FK_idempotency_record_user' })
  user?: User;

  /** Method and path, e.g. "POST /api/teams/…/players". */
  @PrimaryColumn({ type: 'varchar', length: 200 })
  route!: string;

  @PrimaryColumn({ type: 'varchar', length: 128 })
  key!: string;

  /** SHA-256 of the request body: the same key with another body is refused. */
  @Column({ type: 'varchar', length: 64 })
  requestHash!: string;

  /** The first answer's status, or null while it is being made. */
  @Column({ type: 'smallint', nullable: true })
  status!: number | null;

  @Column({ type: 'json', nullable: true })
  headers!: ReplayedHeaders | null;

  /** The first answer's body as sent. */
  @Column({ type: 'text', nullable: true })
  body!: string | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @Column({ type: 'timestamptz' })
  expiresAt!: Date;
}
