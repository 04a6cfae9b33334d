import type { MigrationInterface, QueryRunner } from 'typeorm';

/** A team's pinned activities: what its staff want in the next plan (empty for every team at first). */
export class TeamPinnedActivities1764632000000 implements MigrationInterface {
  name = 'TeamPinnedActivities1764632000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE "team" ADD "pinnedActivityIds" character varying(64) array NOT NULL DEFAULT '{}'`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "team" DROP COLUMN "pinnedActivityIds"`);
  }
}
