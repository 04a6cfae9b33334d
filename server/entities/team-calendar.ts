import { Column, CreateDateColumn, Entity, JoinColumn, OneToOne, PrimaryColumn } from 'typeorm';
import { Team } from './team';

/**
 * A team's calendar feed: the secret in its address. Whoever has the address can read the
 * team's schedule (no names of players), so staff can replace it or turn it off.
 */
@Entity({ name: 'team_calendar' })
export class TeamCalendar {
  @PrimaryColumn({ type: 'uuid' })
  teamId!: string;

  @OneToOne(() => Team, { onDelete: 'CASCADE' })
  @JoinColumn({ name: 'teamId' })
  team?: Team;

  @Column({ type: 'uuid' })
  clubId!: string;

  /** 32 random bytes, base64url: the feed's address is /api/calendar/<token>.ics. */
  @Column({ type: 'varchar', length: 64, unique: true })
  token!: string;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
