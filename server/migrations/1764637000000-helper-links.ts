import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Read-only helper links to one plan (only a hash of each token is stored), and a Reply-To on
 * queued e-mail so a shared plan's answers reach the coach who sent it.
 */
export class HelperLinks1764637000000 implements MigrationInterface {
  name = 'HelperLinks1764637000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "helper_link" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "planId" uuid NOT NULL, "clubId" uuid NOT NULL, "tokenHash" character varying(64) NOT NULL, "createdBy" uuid, "emailedTo" integer NOT NULL DEFAULT '0', "expiresAt" TIMESTAMP WITH TIME ZONE NOT NULL, "revokedAt" TIMESTAMP WITH TIME ZONE, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_ba4a29f2c10ceb05e0a4f768978" UNIQUE ("tokenHash"), CONSTRAINT "PK_b623cd18d669e26da5b7a1d2828" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_9c64025dbfe3332381967ce3be" ON "helper_link" ("planId") `);
    await queryRunner.query(`ALTER TABLE "outbox_message" ADD "replyTo" jsonb`);
    await queryRunner.query(
      `ALTER TABLE "helper_link" ADD CONSTRAINT "FK_9c64025dbfe3332381967ce3bef" FOREIGN KEY ("planId") REFERENCES "session_plan"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "helper_link" ADD CONSTRAINT "FK_872afca386242cbcafb8097c93f" FOREIGN KEY ("clubId") REFERENCES "club"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "outbox_message" DROP COLUMN "replyTo"`);
    await queryRunner.query(`DROP TABLE "helper_link"`);
  }
}
