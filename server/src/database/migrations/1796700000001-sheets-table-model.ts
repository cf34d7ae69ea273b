import type { MigrationInterface, QueryRunner } from 'typeorm';
import { engineOf } from '../database-engine.js';
import { execute } from './dialect.js';

/**
 * Sheets may default to the table model: the CHECK of sheets.model gains "table". SQLite cannot change a CHECK in
 * place, so the table is rebuilt (TypeORM turns foreign keys off around migrations, so the devices that point at the
 * sheets stay; the check at the end proves nothing dangles).
 */
export class SheetsTableModel1796700000001 implements MigrationInterface {
  name = 'SheetsTableModel1796700000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await this.rebuild(queryRunner, `'all-region','square-law','table'`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `UPDATE "sheets" SET "model" = 'all-region' WHERE "model" = 'table'`);
    await this.rebuild(queryRunner, `'all-region','square-law'`);
  }

  private async rebuild(queryRunner: QueryRunner, models: string): Promise<void> {
    if (engineOf(queryRunner) === 'postgres') {
      // PostgreSQL changes a CHECK in place (it named the column's check sheets_model_check).
      await queryRunner.query(`ALTER TABLE "sheets" DROP CONSTRAINT "sheets_model_check", ADD CONSTRAINT "sheets_model_check" CHECK ("model" IN (${models}))`);
      return;
    }
    await execute(queryRunner,
      `CREATE TABLE "sheets_rebuilt" ("id" varchar PRIMARY KEY NOT NULL, "projectId" varchar NOT NULL, "name" varchar(100) NOT NULL, "description" text NOT NULL DEFAULT (''), "processVersionId" varchar NOT NULL, "temperature" real, "corner" varchar(50) NOT NULL DEFAULT ('TT'), "model" varchar CHECK( "model" IN (${models}) ) NOT NULL DEFAULT ('all-region'), "version" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_sheets_project" FOREIGN KEY ("projectId") REFERENCES "projects" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_sheets_processVersion" FOREIGN KEY ("processVersionId") REFERENCES "process_versions" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `INSERT INTO "sheets_rebuilt" SELECT "id", "projectId", "name", "description", "processVersionId", "temperature", "corner", "model", "version", "createdAt", "updatedAt" FROM "sheets"`);
    await execute(queryRunner, `DROP INDEX "IDX_sheets_project"`);
    await execute(queryRunner, `DROP TABLE "sheets"`);
    await execute(queryRunner, `ALTER TABLE "sheets_rebuilt" RENAME TO "sheets"`);
    await execute(queryRunner, `CREATE INDEX "IDX_sheets_project" ON "sheets" ("projectId")`);
    const dangling: unknown[] = await queryRunner.query(`PRAGMA foreign_key_check`);
    if (dangling.length > 0) throw new Error(`Rebuilding sheets left ${dangling.length} foreign keys dangling: ${JSON.stringify(dangling.slice(0, 3))}`);
  }
}
