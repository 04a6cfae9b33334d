import { Column, Entity, PrimaryColumn } from 'typeorm';

/**
 * Wrong passwords for one e-mail address (known or not), counted in PostgreSQL so every
 * instance sees the same count: too many in a window lock that address out for a while.
 */
@Entity({ name: 'sign_in_throttle' })
export class SignInThrottle {
  /** The address as typed, lower-cased. */
  @PrimaryColumn({ type: 'varchar', length: 254, primaryKeyConstraintName: 'PK_sign_in_throttle_email' })
  email!: string;

  @Column({ type: 'integer' })
  failures!: number;

  @Column({ type: 'timestamptz' })
  windowStart!: Date;

  @Column({ type: 'timestamptz', nullable: true })
  lockedUntil!: Date | null;
}
