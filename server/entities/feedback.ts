import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import type { FeedbackVerdict } from '../../shared/types/api';
import { SessionPlan } from './session-plan';

/** How one station of a plan went. clientId makes a replayed offline action land once. */
@Entity({ name: 'feedback' })
@Index(['planId', 'clientId'], { unique: true, where: '"clientId" IS NOT NULL' })
export class Feedback {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  clubId!: string;

  @Index()
  @Column({ type: 'uuid' })
  teamId!: string;

  @Column({ type: 'uuid' })
  planId!: string;

  @ManyToOne(() => SessionPlan, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'planId' })
  sessionPlan?: SessionPlan;

  @Column({ type: 'varchar', length: 64 })
  stationId!: string;

  @Column({ type: 'integer', default: 0 })
  phaseIndex!: number;

  /** The station's activity kind, copied so the next plan can use it as a fact. */
  @Column({ type: 'varchar', length: 40, nullable: true })
  activityKind!: string | null;

  /** The station's activity, so a verdict steers only that activity next time; null on old rows. */
  @Column({ type: 'varchar', length: 64, nullable: true })
  activityId!: string | null;

  @Column({ type: 'real', nullable: true })
  areaWidth!: number | null;

  @Column({ type: 'real', nullable: true })
  areaLength!: number | null;

  /** Players in the station's group plus a coach who joined it; null on rows from before it was kept. */
  @Column({ type: 'smallint', nullable: true })
  groupSize!: number | null;

  @Column({ type: 'varchar', length: 10 })
  verdict!: FeedbackVerdict;

  @Column({ type: 'text', nullable: true })
  note!: string | null;

  @Column({ type: 'varchar', length: 64, nullable: true })
  clientId!: string | null;

  @Column({ type: 'uuid', nullable: true })
  authorId!: string | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
