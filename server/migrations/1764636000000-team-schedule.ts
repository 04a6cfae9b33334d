import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * A team's week: scheduled training nights and matches (local day and time, in the club's time
 * zone, 'Europe/London' for every existing club), the plan made for one, and the secret address
 * of each team's calendar feed.
 */
export class TeamSchedule1764636000000 implements MigrationInterface {
  name = 'TeamSchedule1764636000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE "club" ADD "timeZone" character varying(64) NOT NULL DEFAULT 'Europe/London'`,
    );
    await queryRunner.query(
      `CREATE TABLE "scheduled_session" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "clubId" uuid NOT NULL, "teamId" uuid NOT NULL, "date" date NOT NULL, "startTime" character varying(5) NOT NULL, "kind" character varying(16) NOT NULL, "minutes" integer NOT NULL, "place" character varying(120) NOT NULL DEFAULT '', "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_c1f168796dc2e6ec4f5d389eb0c" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_a79334061f9e3144cdc3f73012" ON "scheduled_session" ("clubId", "teamId", "date")`,
    );
    await queryRunner.query(
      `ALTER TABLE "scheduled_session" ADD CONSTRAINT "FK_6290bfc71c9593f94df8df4d484" FOREIGN KEY ("teamId") REFERENCES "team"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(`ALTER TABLE "session_plan" ADD "scheduledSessionId" uuid`);
    await queryRunner.query(
      `CREATE INDEX "IDX_2c425be862372a44b16d9bbc98" ON "session_plan" ("scheduledSessionId")`,
    );
    await queryRunner.query(
      `ALTER TABLE "session_plan" ADD CONSTRAINT "FK_2c425be862372a44b16d9bbc983" FOREIGN KEY ("scheduledSessionId") REFERENCES "scheduled_session"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `CREATE TABLE "team_calendar" ("teamId" uuid NOT NULL, "clubId" uuid NOT NULL, "token" character varying(64) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_877d713f1228fd0e37c976698c9" UNIQUE ("token"), CONSTRAINT "PK_28ff97568f542f95b0a907bfe95" PRIMARY KEY ("teamId"))`,
    );
    await queryRunner.query(
      `ALTER TABLE "team_calendar" ADD CONSTRAINT "FK_28ff97568f542f95b0a907bfe95" FOREIGN KEY ("teamId") REFERENCES "team"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "team_calendar"`);
    await queryRunner.query(`ALTER TABLE "session_plan" DROP CONSTRAINT "FK_2c425be862372a44b16d9bbc983"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_2c425be862372a44b16d9bbc98"`);
    await queryRunner.query(`ALTER TABLE "session_plan" DROP COLUMN "scheduledSessionId"`);
    await queryRunner.query(`DROP TABLE "scheduled_session"`);
    await queryRunner.query(`ALTER TABLE "club" DROP COLUMN "timeZone"`);
  }
}
