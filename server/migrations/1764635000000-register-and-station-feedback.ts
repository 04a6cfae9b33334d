import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Feedback rows without an activity take it from the station of the plan they were given on. */
export const BACKFILL_FEEDBACK_ACTIVITY = `
      UPDATE "feedback" f SET "activityId" = left(st->>'activityId', 64)
        FROM "session_plan" sp
        CROSS JOIN LATERAL json_array_elements(
          CASE WHEN json_typeof(sp.plan->'phases') = 'array' THEN sp.plan->'phases' ELSE '[]'::json END
        ) WITH ORDINALITY AS ph(phase, n)
        CROSS JOIN LATERAL json_array_elements(
          CASE WHEN json_typeof(ph.phase->'stations') = 'array' THEN ph.phase->'stations' ELSE '[]'::json END
        ) AS st
       WHERE f."activityId" IS NULL AND sp.id = f."planId" AND ph.n - 1 = f."phaseIndex" AND st->>'id' = f."stationId"`;

/**
 * The register keeps how late a player came and how early they left (both still count as came;
 * null is on time, as every older row was recorded). Feedback keeps the station's activity, so a
 * verdict steers that activity next time and not every activity of its kind; older rows take it
 * from the plan they were given on.
 */
export class RegisterAndStationFeedback1764635000000 implements MigrationInterface {
  name = 'RegisterAndStationFeedback1764635000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "attendance" ADD "lateMinutes" smallint`);
    await queryRunner.query(`ALTER TABLE "attendance" ADD "leftEarlyMinutes" smallint`);
    await queryRunner.query(`ALTER TABLE "feedback" ADD "activityId" character varying(64)`);
    await queryRunner.query(BACKFILL_FEEDBACK_ACTIVITY);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "feedback" DROP COLUMN "activityId"`);
    await queryRunner.query(`ALTER TABLE "attendance" DROP COLUMN "leftEarlyMinutes"`);
    await queryRunner.query(`ALTER TABLE "attendance" DROP COLUMN "lateMinutes"`);
  }
}
