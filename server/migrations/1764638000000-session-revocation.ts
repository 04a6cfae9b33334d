import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Sessions that can be ended: a token version per person, and signed-out tokens until they expire. */
export class SessionRevocation1764638000000 implements MigrationInterface {
  name = 'SessionRevocation1764638000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "app_user" ADD "tokenVersion" integer NOT NULL DEFAULT '0'`);
    await queryRunner.query(
      `CREATE TABLE "revoked_token" ("jti" uuid NOT NULL, "expiresAt" TIMESTAMP WITH TIME ZONE NOT NULL, CONSTRAINT "PK_revoked_token_jti" PRIMARY KEY ("jti"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_revoked_token_expiresAt" ON "revoked_token" ("expiresAt") `);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "revoked_token"`);
    await queryRunner.query(`ALTER TABLE "app_user" DROP COLUMN "tokenVersion"`);
  }
}
