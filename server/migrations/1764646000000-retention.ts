import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * How long a club keeps plans, attendance and station feedback: a whole number of seasons from
 * 1 to 10 (three until the head of coaching says otherwise). The retention job purges older rows.
 */
export class Retention1764646000000 implements MigrationInterface {
  name = 'Retention1764646000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "club" ADD "keepSeasons" smallint NOT NULL DEFAULT 3`);
    await queryRunner.query(
      `ALTER TABLE "club" ADD CONSTRAINT "CHK_club_keepSeasons" CHECK ("keepSeasons" BETWEEN 1 AND 10)`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "club" DROP CONSTRAINT "CHK_club_keepSeasons"`);
    await queryRunner.query(`ALTER TABLE "club" DROP COLUMN "keepSeasons"`);
  }
}
