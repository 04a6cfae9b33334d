import { Check, Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';
import type { DistanceUnit, TemperatureUnit } from '../../shared/units';

/** A club's time zone until it says otherwise (the column's default, and the fallback for unknown zones). */
export const DEFAULT_TIME_ZONE = 'Europe/London';

/** Seasons a club keeps plans, attendance and feedback until it says otherwise. */
export const DEFAULT_KEEP_SEASONS = 3;

/** A football club: the boundary of every piece of data. */
@Entity({ name: 'club' })
@Check('CHK_club_distanceUnit', `"distanceUnit" IN ('metres', 'yards')`)
@Check('CHK_club_temperatureUnit', `"temperatureUnit" IN ('celsius', 'fahrenheit')`)
@Check('CHK_club_keepSeasons', `"keepSeasons" BETWEEN 1 AND 10`)
export class Club {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'varchar', length: 120 })
  name!: string;

  /** IANA time zone of the club's sessions: their days and times are local to it. */
  @Column({ type: 'varchar', length: 64, default: DEFAULT_TIME_ZONE })
  timeZone!: string;

  /** The units the club reads distances in (plans stay in metres): "metres" or "yards". */
  @Column({ type: 'varchar', length: 10, default: 'metres' })
  distanceUnit!: DistanceUnit;

  /** The units the club reads temperatures in (requests stay in °C): "celsius" or "fahrenheit". */
  @Column({ type: 'varchar', length: 10, default: 'celsius' })
  temperatureUnit!: TemperatureUnit;

  /** Seasons (365 days each) the club keeps plans, attendance and feedback: 1 to 10. */
  @Column({ type: 'smallint', default: DEFAULT_KEEP_SEASONS })
  keepSeasons!: number;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
