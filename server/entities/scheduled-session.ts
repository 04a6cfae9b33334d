import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { ScheduleKind } from '../../shared/types/schedule';
import { Team } from './team';

/**
 * A training night or match on a team's schedule. The day and time are the club's local ones
 * (club.timeZone), so a weekly 18:00 stays 18:00 across a clock change.
 */
@Entity({ name: 'scheduled_session' })
@Index(['clubId', 'teamId', 'date'])
export class ScheduledSession {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  clubId!: string;

  @Column({ type: 'uuid' })
  teamId!: string;

  @ManyToOne(() => Team, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'teamId' })
  team?: Team;

  /** Local calendar day (YYYY-MM-DD). */
  @Column({ type: 'date' })
  date!: string;

  /** Local kick-off or start time, HH:MM. */
  @Column({ type: 'varchar', length: 5 })
  startTime!: string;

  @Column({ type: 'varchar', length: 16 })
  kind!: ScheduleKind;

  /** Minutes the plan fills. */
  @Column({ type: 'integer' })
  minutes!: number;

  @Column({ type: 'varchar', length: 120, default: '' })
  place!: string;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
