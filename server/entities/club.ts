import { Column, CreateDateColumn, Entity, PrimaryGeneratedColumn } from 'typeorm';

/** A club's time zone until it says otherwise (the column's default, and the fallback for unknown zones). */
export const DEFAULT_TIME_ZONE = 'Europe/London';

/** A football club: the boundary of every piece of data. */
@Entity({ name: 'club' })
export class Club {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'varchar', length: 120 })
  name!: string;

  /** IANA time zone of the club's sessions: their days and times are local to it. */
  @Column({ type: 'varchar', length: 64, default: DEFAULT_TIME_ZONE })
  timeZone!: string;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
