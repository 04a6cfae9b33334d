import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Every table of the first release: clubs, people, squads, kit, rules, plans, feedback and mail. */
export class InitialSchema1764627000000 implements MigrationInterface {
  name = 'InitialSchema1764627000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "club" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "name" character varying(120) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_79282481e036a6e0b180afa38aa" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE TABLE "app_user" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "email" character varying(254) NOT NULL, "name" character varying(120) NOT NULL, "passwordHash" character varying(100) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_3fa909d0e37c531ebc237703391" UNIQUE ("email"), CONSTRAINT "PK_22a5c4a3d9b2fb8e4e73fc4ada1" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE TABLE "team" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "clubId" uuid NOT NULL, "name" character varying(80) NOT NULL, "ageGroup" character varying(8) NOT NULL, "level" character varying(16) NOT NULL, "spaceWidth" real NOT NULL, "spaceLength" real NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_f57d8293406df4af348402e4b74" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_5a5efe782647948e0a62033bf0" ON "team" ("clubId")`);
    await queryRunner.query(
      `CREATE TABLE "player" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "clubId" uuid NOT NULL, "teamId" uuid NOT NULL, "displayName" character varying(40) NOT NULL, "goalkeeper" boolean NOT NULL DEFAULT false, "active" boolean NOT NULL DEFAULT true, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_65edadc946a7faf4b638d5e8885" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_11ec30ccb365809f1630cf1482" ON "player" ("clubId")`);
    await queryRunner.query(`CREATE INDEX "IDX_e85150e7e8a80bee7f2be3adab" ON "player" ("teamId")`);
    await queryRunner.query(
      `CREATE TABLE "session_plan" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "clubId" uuid NOT NULL, "teamId" uuid NOT NULL, "date" date, "kickOff" character varying(5), "kind" character varying(20) NOT NULL, "minutes" integer NOT NULL, "playerCount" integer NOT NULL, "request" jsonb NOT NULL, "plan" jsonb NOT NULL, "ruleSetId" character varying(64) NOT NULL, "ruleSetVersion" integer NOT NULL, "seed" character varying(64) NOT NULL, "status" character varying(8) NOT NULL DEFAULT 'draft', "authorId" uuid, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "version" integer NOT NULL, CONSTRAINT "PK_87214c13305b58049f9041ca8d0" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_6f14432a77e4b0647cc7d42a1b" ON "session_plan" ("clubId", "teamId", "date")`,
    );
    await queryRunner.query(
      `CREATE TABLE "attendance" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "clubId" uuid NOT NULL, "planId" uuid NOT NULL, "playerId" uuid NOT NULL, "recordedById" uuid, "recordedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_ee0ffe42c1f1a01e72b725c0cb2" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_a7becef9b64f3b028b81cfa243" ON "attendance" ("playerId")`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_217c458aeca8f886f5b10c8f57" ON "attendance" ("planId", "playerId")`,
    );
    await queryRunner.query(
      `CREATE TABLE "feedback" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "clubId" uuid NOT NULL, "teamId" uuid NOT NULL, "planId" uuid NOT NULL, "stationId" character varying(64) NOT NULL, "phaseIndex" integer NOT NULL DEFAULT '0', "activityKind" character varying(40), "areaWidth" real, "areaLength" real, "verdict" character varying(10) NOT NULL, "note" text, "clientId" character varying(64), "authorId" uuid, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_8389f9e087a57689cd5be8b2b13" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_22226e5c920c0b524145738852" ON "feedback" ("teamId")`);
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_68e76dc6eeb777217b29ae42bf" ON "feedback" ("planId", "clientId") WHERE "clientId" IS NOT NULL`,
    );
    await queryRunner.query(
      `CREATE TABLE "invitation" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "clubId" uuid NOT NULL, "email" character varying(254) NOT NULL, "role" character varying(16) NOT NULL, "teamId" uuid, "tokenHash" character varying(64) NOT NULL, "expiresAt" TIMESTAMP WITH TIME ZONE NOT NULL, "acceptedAt" TIMESTAMP WITH TIME ZONE, "invitedById" uuid, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "UQ_676ef6471ce7176869d73365a45" UNIQUE ("tokenHash"), CONSTRAINT "PK_beb994737756c0f18a1c1f8669c" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_9e3fa7c45b4ea43b075e8c885a" ON "invitation" ("clubId")`);
    await queryRunner.query(
      `CREATE TABLE "kit_bag" ("teamId" uuid NOT NULL, "clubId" uuid NOT NULL, "balls" integer NOT NULL DEFAULT '0', "cones" integer NOT NULL DEFAULT '0', "bibs" integer NOT NULL DEFAULT '0', "goals" integer NOT NULL DEFAULT '0', "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_5d2daccd9498b094ba000c12d86" PRIMARY KEY ("teamId"))`,
    );
    await queryRunner.query(
      `CREATE TABLE "membership" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "clubId" uuid NOT NULL, "userId" uuid NOT NULL, "role" character varying(16) NOT NULL, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_83c1afebef3059472e7c37e8de8" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_eef2d9d9c70cd13bed868afedf" ON "membership" ("userId")`,
    );
    await queryRunner.query(
      `CREATE UNIQUE INDEX "IDX_5901b21047727c945aeb4b36c3" ON "membership" ("clubId", "userId")`,
    );
    await queryRunner.query(
      `CREATE TABLE "outbox_message" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "clubId" uuid, "kind" character varying(32) NOT NULL, "recipients" jsonb NOT NULL, "subject" character varying(200) NOT NULL, "textBody" text NOT NULL, "htmlBody" text, "attachments" jsonb NOT NULL DEFAULT '[]'::jsonb, "status" character varying(10) NOT NULL DEFAULT 'pending', "attempts" integer NOT NULL DEFAULT '0', "nextAttemptAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "lastError" text, "sentAt" TIMESTAMP WITH TIME ZONE, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), CONSTRAINT "PK_2f36ee5236f2793f3e7bd554589" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_77c1875845c0e4b7159770b023" ON "outbox_message" ("status", "nextAttemptAt")`,
    );
    await queryRunner.query(
      `CREATE TABLE "rule_set" ("id" uuid NOT NULL DEFAULT gen_random_uuid(), "clubId" uuid NOT NULL, "name" character varying(120) NOT NULL, "version" integer NOT NULL DEFAULT '1', "status" character varying(16) NOT NULL DEFAULT 'draft', "body" jsonb NOT NULL, "authorId" uuid, "basedOnId" uuid, "publishedAt" TIMESTAMP WITH TIME ZONE, "createdAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "updatedAt" TIMESTAMP WITH TIME ZONE NOT NULL DEFAULT now(), "revision" integer NOT NULL, CONSTRAINT "PK_b297de2aa110d7ac081e2bcd05f" PRIMARY KEY ("id"))`,
    );
    await queryRunner.query(
      `CREATE INDEX "IDX_a471b55d50a2e3631b263cf0af" ON "rule_set" ("clubId", "status")`,
    );
    await queryRunner.query(
      `CREATE TABLE "team_coach" ("teamId" uuid NOT NULL, "userId" uuid NOT NULL, CONSTRAINT "PK_4c89534d45d5022180054370b76" PRIMARY KEY ("teamId", "userId"))`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_91a8b441d9c3fd7057f4cd585d" ON "team_coach" ("teamId")`);
    await queryRunner.query(`CREATE INDEX "IDX_a9644c19ed31053b50a4109d70" ON "team_coach" ("userId")`);
    await queryRunner.query(
      `ALTER TABLE "team" ADD CONSTRAINT "FK_5a5efe782647948e0a62033bf0f" FOREIGN KEY ("clubId") REFERENCES "club"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "player" ADD CONSTRAINT "FK_e85150e7e8a80bee7f2be3adab0" FOREIGN KEY ("teamId") REFERENCES "team"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "session_plan" ADD CONSTRAINT "FK_e8fed99d1752fb3c3919138c709" FOREIGN KEY ("teamId") REFERENCES "team"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "session_plan" ADD CONSTRAINT "FK_752d03445797f289f85b107a110" FOREIGN KEY ("authorId") REFERENCES "app_user"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "attendance" ADD CONSTRAINT "FK_59696b752844e3d50fb5e98dfac" FOREIGN KEY ("planId") REFERENCES "session_plan"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "attendance" ADD CONSTRAINT "FK_a7becef9b64f3b028b81cfa2436" FOREIGN KEY ("playerId") REFERENCES "player"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "feedback" ADD CONSTRAINT "FK_55fcaba1fba514a0b92165ee123" FOREIGN KEY ("planId") REFERENCES "session_plan"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "invitation" ADD CONSTRAINT "FK_9e3fa7c45b4ea43b075e8c885a9" FOREIGN KEY ("clubId") REFERENCES "club"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "kit_bag" ADD CONSTRAINT "FK_5d2daccd9498b094ba000c12d86" FOREIGN KEY ("teamId") REFERENCES "team"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "membership" ADD CONSTRAINT "FK_ef23be796d14af117f3e737e707" FOREIGN KEY ("clubId") REFERENCES "club"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "membership" ADD CONSTRAINT "FK_eef2d9d9c70cd13bed868afedf4" FOREIGN KEY ("userId") REFERENCES "app_user"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "rule_set" ADD CONSTRAINT "FK_ebb9307c626a36f06d6049faafa" FOREIGN KEY ("clubId") REFERENCES "club"("id") ON DELETE CASCADE ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "rule_set" ADD CONSTRAINT "FK_aae02d85726f7c080e292194969" FOREIGN KEY ("authorId") REFERENCES "app_user"("id") ON DELETE SET NULL ON UPDATE NO ACTION`,
    );
    await queryRunner.query(
      `ALTER TABLE "team_coach" ADD CONSTRAINT "FK_91a8b441d9c3fd7057f4cd585dc" FOREIGN KEY ("teamId") REFERENCES "team"("id") ON DELETE CASCADE ON UPDATE CASCADE`,
    );
    await queryRunner.query(
      `ALTER TABLE "team_coach" ADD CONSTRAINT "FK_a9644c19ed31053b50a4109d70d" FOREIGN KEY ("userId") REFERENCES "app_user"("id") ON DELETE CASCADE ON UPDATE CASCADE`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "team_coach" DROP CONSTRAINT "FK_a9644c19ed31053b50a4109d70d"`);
    await queryRunner.query(`ALTER TABLE "team_coach" DROP CONSTRAINT "FK_91a8b441d9c3fd7057f4cd585dc"`);
    await queryRunner.query(`ALTER TABLE "rule_set" DROP CONSTRAINT "FK_aae02d85726f7c080e292194969"`);
    await queryRunner.query(`ALTER TABLE "rule_set" DROP CONSTRAINT "FK_ebb9307c626a36f06d6049faafa"`);
    await queryRunner.query(`ALTER TABLE "membership" DROP CONSTRAINT "FK_eef2d9d9c70cd13bed868afedf4"`);
    await queryRunner.query(`ALTER TABLE "membership" DROP CONSTRAINT "FK_ef23be796d14af117f3e737e707"`);
    await queryRunner.query(`ALTER TABLE "kit_bag" DROP CONSTRAINT "FK_5d2daccd9498b094ba000c12d86"`);
    await queryRunner.query(`ALTER TABLE "invitation" DROP CONSTRAINT "FK_9e3fa7c45b4ea43b075e8c885a9"`);
    await queryRunner.query(`ALTER TABLE "feedback" DROP CONSTRAINT "FK_55fcaba1fba514a0b92165ee123"`);
    await queryRunner.query(`ALTER TABLE "attendance" DROP CONSTRAINT "FK_a7becef9b64f3b028b81cfa2436"`);
    await queryRunner.query(`ALTER TABLE "attendance" DROP CONSTRAINT "FK_59696b752844e3d50fb5e98dfac"`);
    await queryRunner.query(`ALTER TABLE "session_plan" DROP CONSTRAINT "FK_752d03445797f289f85b107a110"`);
    await queryRunner.query(`ALTER TABLE "session_plan" DROP CONSTRAINT "FK_e8fed99d1752fb3c3919138c709"`);
    await queryRunner.query(`ALTER TABLE "player" DROP CONSTRAINT "FK_e85150e7e8a80bee7f2be3adab0"`);
    await queryRunner.query(`ALTER TABLE "team" DROP CONSTRAINT "FK_5a5efe782647948e0a62033bf0f"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_a9644c19ed31053b50a4109d70"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_91a8b441d9c3fd7057f4cd585d"`);
    await queryRunner.query(`DROP TABLE "team_coach"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_a471b55d50a2e3631b263cf0af"`);
    await queryRunner.query(`DROP TABLE "rule_set"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_77c1875845c0e4b7159770b023"`);
    await queryRunner.query(`DROP TABLE "outbox_message"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_5901b21047727c945aeb4b36c3"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_eef2d9d9c70cd13bed868afedf"`);
    await queryRunner.query(`DROP TABLE "membership"`);
    await queryRunner.query(`DROP TABLE "kit_bag"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_9e3fa7c45b4ea43b075e8c885a"`);
    await queryRunner.query(`DROP TABLE "invitation"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_68e76dc6eeb777217b29ae42bf"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_22226e5c920c0b524145738852"`);
    await queryRunner.query(`DROP TABLE "feedback"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_217c458aeca8f886f5b10c8f57"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_a7becef9b64f3b028b81cfa243"`);
    await queryRunner.query(`DROP TABLE "attendance"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_6f14432a77e4b0647cc7d42a1b"`);
    await queryRunner.query(`DROP TABLE "session_plan"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_e85150e7e8a80bee7f2be3adab"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_11ec30ccb365809f1630cf1482"`);
    await queryRunner.query(`DROP TABLE "player"`);
    await queryRunner.query(`DROP INDEX "public"."IDX_5a5efe782647948e0a62033bf0"`);
    await queryRunner.query(`DROP TABLE "team"`);
    await queryRunner.query(`DROP TABLE "app_user"`);
    await queryRunner.query(`DROP TABLE "club"`);
  }
}
