import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Adds the rule-set history table (additive: no existing table changes). */
export class RuleSetHistory1764628000000 implements MigrationInterface {
  name = 'RuleSetHistory1764628000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "rule_set_change" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "clubId" uuid NOT NULL, "ruleSetId" uuid NOT NULL, "action" character varying(16) NOT NULL, "version" integer NOT NULL, "revision" integer NOT NULL, "authorId" uuid, "authorName" character varying(120) NOT NULL, "changedPaths" jsonb NOT NULL DEFAULT '[]'::jsonb, "body" jsonb NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_rule_set_change_id" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_rule_set_change_rule_set" ON "rule_set_change" ("ruleSetId")`);
    await queryRunner.query(
      `CREATE INDEX "IDX_rule_set_change_club_created" ON "rule_set_change" ("clubId", "createdAt")`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "rule_set_change"`);
  }
}
