import type { MigrationInterface, QueryRunner } from 'typeorm';

/** Large documents written whole and read whole, never queried inside. */
const DOCUMENT_COLUMNS: [table: string, column: string][] = [
  ['session_plan', 'request'],
  ['session_plan', 'plan'],
  ['rule_set', 'body'],
  ['rule_set_change', 'body'],
];

/**
 * Plans and rule sets as `json` rather than `jsonb`, compressed with lz4 where the server has it.
 * A plan is about 22 kB: as jsonb it was parsed into binary form and compressed with pglz on
 * every save, which made inserting one about eight times slower than storing its text with lz4
 * (measured on this project's machine: 3.2 ms against 0.4 ms). Nothing queries inside these
 * documents, and `json` also keeps a rule set's keys in the order its author wrote them.
 */
export class DocumentsAsJson1764629000000 implements MigrationInterface {
  name = 'DocumentsAsJson1764629000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    const lz4 = await lz4Available(queryRunner);
    for (const [table, column] of DOCUMENT_COLUMNS) {
      await queryRunner.query(
        `ALTER TABLE "${table}" ALTER COLUMN "${column}" TYPE json USING "${column}"::json`,
      );
      if (lz4) await queryRunner.query(`ALTER TABLE "${table}" ALTER COLUMN "${column}" SET COMPRESSION lz4`);
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const [table, column] of DOCUMENT_COLUMNS) {
      await queryRunner.query(`ALTER TABLE "${table}" ALTER COLUMN "${column}" SET COMPRESSION default`);
      await queryRunner.query(
        `ALTER TABLE "${table}" ALTER COLUMN "${column}" TYPE jsonb USING "${column}"::jsonb`,
      );
    }
  }
}

/** Whether this PostgreSQL was built with lz4 (Debian's is; a build without it keeps pglz). */
async function lz4Available(queryRunner: QueryRunner): Promise<boolean> {
  const rows: { lz4: boolean }[] = await queryRunner.query(
    `SELECT 'lz4' = ANY (enumvals) AS lz4 FROM pg_settings WHERE name = 'default_toast_compression'`,
  );
  return rows[0]?.lz4 === true;
}
