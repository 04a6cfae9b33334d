import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * E-mail addresses confirmed by a mailed link. Everyone already here counts as confirmed: the
 * invited opened a mailed link to join, and the accounts made before this change keep working.
 */
export class EmailVerification1764642000000 implements MigrationInterface {
  name = 'EmailVerification1764642000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "app_user" ADD "emailVerifiedAt" TIMESTAMP WITH TIME ZONE`);
    await queryRunner.query(`UPDATE "app_user" SET "emailVerifiedAt" = "createdAt"`);
    await queryRunner.query(
      `CREATE TABLE "email_verification" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "userId" uuid NOT NULL, "tokenHash" character varying(64) NOT NULL, "expiresAt" TIMESTAMP WITH TIME ZONE NOT NULL, "usedAt" TIMESTAMP WITH TIME ZONE, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_email_verification_id" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_email_verification_userId" ON "email_verification" ("userId") `,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "UQ_email_verification_tokenHash" ON "email_verification" ("tokenHash") `,
    );
    await queryRunner.query(
      `ALTER TABLE "email_verification" ADD CONSTRAINT "FK_email_verification_userId" FOREIGN KEY ("userId") REFERENCES "app_user"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "email_verification"`);
    await queryRunner.query(`ALTER TABLE "app_user" DROP COLUMN "emailVerifiedAt"`);
  }
}
