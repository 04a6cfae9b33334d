import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Per-client request counts of the rate-limited public routes, shared by every instance. */
export class RateLimitHits1764641000000 implements MigrationInterface {
  name = 'RateLimitHits1764641000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "rate_limit_hit" ("key" character varying(200) NOT NULL, "hits" integer NOT NULL, "resetAt" TIMESTAMP WITH TIME ZONE NOT NULL, CONSTRAINT "PK_rate_limit_hit_key" PRIMARY KEY ("key"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_rate_limit_hit_reset_at" ON "rate_limit_hit" ("resetAt")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TABLE "rate_limit_hit"`);
  }
}
