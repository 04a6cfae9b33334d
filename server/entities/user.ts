import { Check, Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { DistanceUnit, TemperatureUnit } from '../../shared/units';

/** A person who signs in. The e-mail is stored lower-cased and is unique. */
@Entity({ name: 'app_user' })
@Check('CHK_app_user_distanceUnit', `"distanceUnit" IN ('metres', 'yards')`)
@Check('CHK_app_user_temperatureUnit', `"temperatureUnit" IN ('celsius', 'fahrenheit')`)
export class User {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'varchar', length: 254, unique: true })
  email!: string;

  @Column({ type: 'varchar', length: 120 })
  name!: string;

  /** bcrypt hash (bcryptjs). */
  @Column({ type: 'varchar', length: 100 })
  passwordHash!: string;

  /**
   * Raised to end every session of this person at once (sign out everywhere, a new password):
   * a token carries the version it was signed with and is refused once it is behind.
   */
  @Column({ type: 'integer', default: 0 })
  tokenVersion!: number;

  /**
   * When the person showed they read mail at this address (a mailed link opened); null until
   * then. Unconfirmed accounts cannot send invitations or plans to others.
   */
  @Column({ type: 'timestamptz', nullable: true })
  emailVerifiedAt!: Date | null;

  /** The person's own distance unit; null follows the club's. */
  @Column({ type: 'varchar', length: 10, nullable: true })
  distanceUnit!: DistanceUnit | null;

  /** The person's own temperature unit; null follows the club's. */
  @Column({ type: 'varchar', length: 10, nullable: true })
  temperatureUnit!: TemperatureUnit | null;

  /**
   * The person's locale as their browser reports it (BCP 47, e.g. en-US), for dates and clock
   * times on the cards and e-mails they send; null until a browser sends one (CLUB_LOCALE then).
   */
  @Column({ type: 'varchar', length: 35, nullable: true })
  locale!: string | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
