import { Column, Entity, JoinColumn, OneToOne, PrimaryColumn, UpdateDateColumn } from 'typeorm';
import { Team } from './team';

/** What is in a team's bag. One per team. */
@Entity({ name: 'kit_bag' })
export class KitBag {
  @PrimaryColumn({ type: 'uuid' })
  teamId!: string;

  @OneToOne(() => Team, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'teamId' })
  team?: Team;

  @Column({ type: 'uuid' })
  clubId!: string;

  @Column({ type: 'integer', default: 0 })
  balls!: number;

  @Column({ type: 'integer', default: 0 })
  cones!: number;

  @Column({ type: 'integer', default: 0 })
  bibs!: number;

  /** Small or pop-up goals. */
  @Column({ type: 'integer', default: 0 })
  goals!: number;

  @UpdateDateColumn({ type: 'timestamptz' })
  updatedAt!: Date;
}
