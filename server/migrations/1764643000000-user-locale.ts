import type { MigrationInterface, QueryRunner } from 'typeorm';

/** The person's own locale (a BCP 47 tag from their browser) for dates and times on cards and in e-mails. */
export class UserLocale1764643000000 implements MigrationInterface {
  name = 'UserLocale1764643000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "app_user" ADD "locale" character varying(35)`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "app_user" DROP COLUMN "locale"`);
  }
}
