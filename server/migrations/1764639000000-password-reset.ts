import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Choosing a new password by e-mail: single-use links, kept as hashes. */
export class PasswordReset1764639000000 implements MigrationInterface {
  name = 'PasswordReset1764639000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "password_reset" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "userId" uuid NOT NULL, "tokenHash" character varying(64) NOT NULL, "expiresAt" TIMESTAMP WITH TIME ZONE NOT NULL, "usedAt" TIMESTAMP WITH TIME ZONE, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_password_reset_id" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_password_reset_userId" ON "password_reset" ("userId") `);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_password_reset_tokenHash" ON "password_reset" ("tokenHash") `,
    );
    await queryRunner.query(
      `ALTER TABLE "password_reset" ADD CONSTRAINT "FK_password_reset_userId" FOREIGN KEY ("userId") REFERENCES "app_user"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "password_reset"`);
  }
}
