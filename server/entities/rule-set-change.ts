import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';

export type RuleSetChangeAction = 'create' | 'update' | 'publish' | 'rollback';

/** One step in a club's rule-set history: who did what to which version, when, and what it said after. */
@Entity({ name: 'rule_set_change' })
@Index('IDX_rule_set_change_club_created', ['clubId', 'createdAt'])
export class RuleSetChange {
  @PrimaryGeneratedColumn('uuid')
  id!: string;

  @Column({ type: 'uuid' })
  clubId!: string;

  @Index('IDX_rule_set_change_rule_set')
  @Column({ type: 'uuid' })
  ruleSetId!: string;

  @Column({ type: 'varchar', length: 16 })
  action!: RuleSetChangeAction;

  /** The rule set's document version and optimistic revision after the change. */
  @Column({ type: 'integer' })
  version!: number;

  @Column({ type: 'integer' })
  revision!: number;

  @Column({ type: 'uuid', nullable: true })
  authorId!: string | null;

  /** Kept as written so the history still reads right if the member leaves. */
  @Column({ type: 'varchar', length: 120 })
  authorName!: string;

  /** JSON pointers the change touched (empty for create/publish). */
  @Column({ type: 'jsonb', default: () => "'[]'" })
  changedPaths!: string[];

  /**
   * What each touched place said before and after a save, as RuleSetDiffEntry objects (null for
   * other steps and for saves made before this was kept).
   */
  @Column({ type: 'json', nullable: true })
  changes!: object[] | null;

  /** The document as it stood after the change. */
  @Column({ type: 'json' })
  body!: unknown;

  @CreateDateColumn({ type: 'timestamptz' })
  createdAt!: Date;
}
