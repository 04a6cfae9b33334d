import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Each saved change to a club's rules keeps what each place said before and after, so the history
 * reads "Group sizes › Keep-ball › Beginner › Most: 6 → 5". Changes saved before this have none.
 */
export class RuleChangeValues1764645000000 implements MigrationInterface {
  name = 'RuleChangeValues1764645000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "rule_set_change" ADD "changes" json`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "rule_set_change" DROP COLUMN "changes"`);
  }
}
