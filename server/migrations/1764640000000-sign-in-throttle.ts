import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Wrong passwords per address, shared by every instance. */
export class SignInThrottle1764640000000 implements MigrationInterface {
  name = 'SignInThrottle1764640000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "sign_in_throttle" ("email" character varying(254) NOT NULL, "failures" integer NOT NULL, "windowStart" TIMESTAMP WITH TIME ZONE NOT NULL, "lockedUntil" TIMESTAMP WITH TIME ZONE, CONSTRAINT "PK_sign_in_throttle_email" PRIMARY KEY ("email"))`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "sign_in_throttle"`);
  }
}
