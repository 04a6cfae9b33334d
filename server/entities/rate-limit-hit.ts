import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * Requests from one client to one limited group of routes within the current window, counted in
 * PostgreSQL so that every instance behind a load balancer adds to the same count
 * (see server/db/postgres-rate-limit-store.ts). Rows whose window has passed are deleted in passing.
 */
@Entity({ name: 'rate_limit_hit' })
@Index('IDX_rate_limit_hit_reset_at', ['resetAt'])
export class RateLimitHit {
  /** The limiter's name and the client's key (its address), e.g. "sign-in:203.0.113.7". */
  @PrimaryColumn({ type: 'varchar', length: 200, primaryKeyConstraintName: 'PK_rate_limit_hit_key' })
  key!: string;

  @Column({ type: 'integer' })
  hits!: number;

  /** When the window ends and the count starts again. */
  @Column({ type: 'timestamptz' })
  resetAt!: Date;
}
