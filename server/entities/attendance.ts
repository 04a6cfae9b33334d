import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import { Player } from './player';
import { SessionPlan } from './session-plan';

/** One player who came to one planned session (late or leaving early still counts as came). */
@Entity({ name: 'attendance' })
@Index(['planId', 'playerId'], { unique: true })
export class Attendance {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  clubId!: string;

  @Column({ type: 'uuid' })
  planId!: string;

  @ManyToOne(() => SessionPlan, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'planId' })
  sessionPlan?: SessionPlan;

  @Index()
  @Column({ type: 'uuid' })
  playerId!: string;

  @ManyToOne(() => Player, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'playerId' })
  player?: Player;

  /** Minutes late; null when on time (and on rows from before it was kept). */
  @Column({ type: 'smallint', nullable: true })
  lateMinutes!: number | null;

  /** Minutes before the end the player left; null when they stayed. */
  @Column({ type: 'smallint', nullable: true })
  leftEarlyMinutes!: number | null;

  @Column({ type: 'uuid', nullable: true })
  recordedById!: string | null;

  @CreateDateColumn({ type: 'timestamptz' })
  recordedAt!: Date;
}
