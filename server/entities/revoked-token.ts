import { Column, Entity, Index, PrimaryColumn } from 'typeorm';

/**
 * A signed-out session token, by its id (the token's `jti`), kept until the token would have
 * expired anyway; the per-request membership read refuses any token listed here.
 */
@Entity({ name: 'revoked_token' })
export class RevokedToken {
  @PrimaryColumn({ type: 'uuid', primaryKeyConstraintName: 'PK_revoked_token_jti' })
  jti!: string;

  @Index('IDX_revoked_token_expiresAt')
  @Column({ type: 'timestamptz' })
  expiresAt!: Date;
}
