import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * How many were in the group a verdict is about (players plus a coach who joined), so the next
 * plan can size its area to the group it has rather than to the one that gave the verdict.
 * Older rows stay null: their area is reused as it was.
 */
export class FeedbackGroupSize1764630000000 implements MigrationInterface {
  name = 'FeedbackGroupSize1764630000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "feedback" ADD "groupSize" smallint`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "feedback" DROP COLUMN "groupSize"`);
  }
}
