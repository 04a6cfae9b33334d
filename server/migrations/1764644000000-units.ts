import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The units people read distances and temperatures in: the club's setting (metres and °C until
 * the head of coaching says otherwise) and each person's own choice (null follows the club).
 * Plans, requests and rule sets stay metric.
 */
export class Units1764644000000 implements MigrationInterface {
  name = 'Units1764644000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `ALTER TABLE "club" ADD "distanceUnit" character varying(10) NOT NULL DEFAULT 'metres'`,
    );
    await queryRunner.query(
      `ALTER TABLE "club" ADD "temperatureUnit" character varying(10) NOT NULL DEFAULT 'celsius'`,
    );
    await queryRunner.query(
      `ALTER TABLE "club" ADD CONSTRAINT "CHK_club_distanceUnit" CHECK ("distanceUnit" IN ('metres', 'yards'))`,
    );
    await queryRunner.query(
      `ALTER TABLE "club" ADD CONSTRAINT "CHK_club_temperatureUnit" CHECK ("temperatureUnit" IN ('celsius', 'fahrenheit'))`,
    );
    await queryRunner.query(`ALTER TABLE "app_user" ADD "distanceUnit" character varying(10)`);
    await queryRunner.query(`ALTER TABLE "app_user" ADD "temperatureUnit" character varying(10)`);
    await queryRunner.query(
      `ALTER TABLE "app_user" ADD CONSTRAINT "CHK_app_user_distanceUnit" CHECK ("distanceUnit" IN ('metres', 'yards'))`,
    );
    await queryRunner.query(
      `ALTER TABLE "app_user" ADD CONSTRAINT "CHK_app_user_temperatureUnit" CHECK ("temperatureUnit" IN ('celsius', 'fahrenheit'))`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "app_user" DROP CONSTRAINT "CHK_app_user_temperatureUnit"`);
    await queryRunner.query(`ALTER TABLE "app_user" DROP CONSTRAINT "CHK_app_user_distanceUnit"`);
    await queryRunner.query(`ALTER TABLE "app_user" DROP COLUMN "temperatureUnit"`);
    await queryRunner.query(`ALTER TABLE "app_user" DROP COLUMN "distanceUnit"`);
    await queryRunner.query(`ALTER TABLE "club" DROP CONSTRAINT "CHK_club_temperatureUnit"`);
    await queryRunner.query(`ALTER TABLE "club" DROP CONSTRAINT "CHK_club_distanceUnit"`);
    await queryRunner.query(`ALTER TABLE "club" DROP COLUMN "temperatureUnit"`);
    await queryRunner.query(`ALTER TABLE "club" DROP COLUMN "distanceUnit"`);
  }
}
