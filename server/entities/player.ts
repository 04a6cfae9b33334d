import {
  Column,
  CreateDateColumn,
  Entity,
  Index,
  JoinColumn,
  ManyToOne,
  PrimaryGeneratedColumn,
} from 'typeorm';
import { Team } from './team';

/**
 * A child on a squad. Only a display name (first name and initial) and a goalkeeper flag:
 * no birth dates or contact details are kept.
 */
@Entity({ name: 'player' })
export class Player {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Index()
  @Column({ type: 'uuid' })
  clubId!: string;

  @Index()
  @Column({ type: 'uuid' })
  teamId!: string;

  @ManyToOne(() => Team, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'teamId' })
  team?: Team;

  @Column({ type: 'varchar', length: 40 })
  displayName!: string;

  @Column({ type: 'boolean', default: false })
  goalkeeper!: boolean;

  @Column({ type: 'boolean', default: true })
  active!: boolean;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
