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
import type { PlanStatus } from '../../shared/types/api';
import type { Plan } from '../../shared/types/plan';
import type { PlanKind, PlanRequest } from '../../shared/types/plan-request';
import { ScheduledSession } from './scheduled-session';
import { Team } from './team';
import { User } from './user';

/** A generated warm-up or session for a team, with the request and rules it came from. */
@Entity({ name: 'session_plan' })
@Index(['clubId', 'teamId', 'date'])
export class SessionPlan {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  clubId!: string;

  @Column({ type: 'uuid' })
  teamId!: string;

  @ManyToOne(() => Team, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'teamId' })
  team?: Team;

  /** Calendar day of the session (YYYY-MM-DD), if given. */
  @Column({ type: 'date', nullable: true })
  date!: string | null;

  /** Kick-off or start time as HH:MM, if given. */
  @Column({ type: 'varchar', length: 5, nullable: true })
  kickOff!: string | null;

  @Column({ type: 'varchar', length: 20 })
  kind!: PlanKind;

  /** The scheduled session this plan was made for, if any (kept null when that session is deleted). */
  @Index()
  @Column({ type: 'uuid', nullable: true })
  scheduledSessionId!: string | null;

  @ManyToOne(() => ScheduledSession, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'scheduledSessionId' })
  scheduledSession?: ScheduledSession | null;

  @Column({ type: 'integer' })
  minutes!: number;

  @Column({ type: 'integer' })
  playerCount!: number;

  // json, not jsonb: written and read whole, never queried inside (see the DocumentsAsJson migration).
  @Column({ type: 'json' })
  request!: PlanRequest;

  @Column({ type: 'json' })
  plan!: Plan;

  /** The activities its stations use, each once, in plan order (see planActivityIds). */
  @Column({ type: 'varchar', length: 64, array: true, default: () => "'{}'" })
  activityIds!: string[];

  /** Id of the rule set used: a rule_set row's id, or the built-in default's id. */
  @Column({ type: 'varchar', length: 64 })
  ruleSetId!: string;

  @Column({ type: 'integer' })
  ruleSetVersion!: number;

  @Column({ type: 'varchar', length: 64 })
  seed!: string;

  @Column({ type: 'varchar', length: 8, default: 'draft' })
  status!: PlanStatus;

  @Column({ type: 'uuid', nullable: true })
  authorId!: string | null;

  @ManyToOne(() => User, { onDelete: 'SET NULL', nullable: true })
  @JoinColumn({ name: 'authorId' })
  author?: User | null;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;

  /** Optimistic lock for edits. */
  @VersionColumn({ type: 'integer' })
  version!: number;
}
