import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * First answers to creates sent with an Idempotency-Key (server/middleware/idempotency.ts), kept
 * for a day. The primary key is what makes two concurrent copies of one request meet: only one
 * INSERT of (member, route, key) can succeed.
 */
export class IdempotencyRecords1764634000000 implements MigrationInterface {
  name = 'IdempotencyRecords1764634000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "idempotency_record" ("userId" uuid NOT NULL, "route" character varying(200) NOT NULL, "key" character varying(128) NOT NULL, "requestHash" character varying(64) NOT NULL, "status" smallint, "headers" json, "body" text, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "expiresAt" TIMESTAMP WITH TIME ZONE NOT NULL, CONSTRAINT "PK_idempotency_record" PRIMARY KEY ("userId", "route", "key"))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_idempotency_record_expires" ON "idempotency_record" ("expiresAt")`,
    );
    await queryRunner.query(
      `ALTER TABLE "idempotency_record" ADD CONSTRAINT "FK_idempotency_record_user" FOREIGN KEY ("userId") REFERENCES "app_user"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    // A plan's answer is 20–45 kB of JSON text: lz4 where the server has it, as for the plans.
    const rows: { lz4: boolean }[] = await queryRunner.query(
      `SELECT 'lz4' = ANY (enumvals) AS lz4 FROM pg_settings WHERE name = 'default_toast_compression'`,
    );
    if (rows[0]?.lz4 === true)
      await queryRunner.query(`ALTER TABLE "idempotency_record" ALTER COLUMN "body" SET COMPRESSION lz4`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "idempotency_record"`);
  }
}
