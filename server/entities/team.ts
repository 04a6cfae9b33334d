import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  JoinTable,
  ManyToMany,
  ManyToOne,
  PrimaryGeneratedColumn,
  UpdateDateColumn,
} from 'typeorm';
import type { AgeGroup, Level } from '../../shared/types/plan-request';
import { Club } from './club';
import { User } from './user';

/** A squad: its age group, level, usual space and the staff attached to it. */
@Entity({ name: 'team' })
export class Team {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  clubId!: string;

  @ManyToOne(() => Club, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'clubId' })
  club?: Club;

  @Column({ type: 'varchar', length: 80 })
  name!: string;

  @Column({ type: 'varchar', length: 8 })
  ageGroup!: AgeGroup;

  @Column({ type: 'varchar', length: 16 })
  level!: Level;

  /** Usual space in metres: width across. */
  @Column({ type: 'real' })
  spaceWidth!: number;

  /** Usual space in metres: length along. */
  @Column({ type: 'real' })
  spaceLength!: number;

  /** Activities the staff want in the team's next plan; cleared once a plan has taken them. */
  @Column({ type: 'varchar', length: 64, array: true, default: () => "'{}'" })
  pinnedActivityIds!: string[];

  /** Coaches and assistants attached to the team. */
  @ManyToMany(() => User)
  @JoinTable({
    name: 'team_coach',
    joinColumn: { name: 'teamId', referencedColumnName: 'id' },
    inverseJoinColumn: { name: 'userId', referencedColumnName: 'id' },
  })
  coaches?: User[];

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
