import type { MigrationInterface, QueryRunner } from 'typeorm';
import { createRefusingTrigger, dropTrigger, execute } from './dialect.js';

/**
 * Revisions: immutable numbered snapshots of a sheet and of its devices, with their SHA-256 hash.
 * Triggers refuse every UPDATE and DELETE of either table: the API never changes a revision (it
 * answers 409), and the database is the second guard.
 */
export class CreateRevisions1796500000000 implements MigrationInterface {
  name = 'CreateRevisions1796500000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner,
      `CREATE TABLE "revisions" ("id" varchar PRIMARY KEY NOT NULL, "sheetId" varchar NOT NULL, "projectId" varchar NOT NULL, "number" integer NOT NULL, "message" varchar(500) NOT NULL, "authorId" varchar NOT NULL, "createdAt" datetime NOT NULL, "sheetSnapshot" text NOT NULL, "processVersionId" varchar NOT NULL, "processProfileId" varchar NOT NULL, "processName" varchar(100) NOT NULL, "processVersionNumber" integer NOT NULL, "engineVersion" varchar(50) NOT NULL, "hash" varchar(64) NOT NULL, CONSTRAINT "FK_revisions_sheet" FOREIGN KEY ("sheetId") REFERENCES "sheets" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_revisions_project" FOREIGN KEY ("projectId") REFERENCES "projects" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_revisions_author" FOREIGN KEY ("authorId") REFERENCES "users" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_revisions_processVersion" FOREIGN KEY ("processVersionId") REFERENCES "process_versions" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE INDEX "IDX_revisions_project" ON "revisions" ("projectId")`);
    await execute(queryRunner, `CREATE UNIQUE INDEX "IDX_revisions_sheet_number" ON "revisions" ("sheetId", "number")`);
    await execute(queryRunner,
      `CREATE TABLE "revision_devices" ("id" varchar PRIMARY KEY NOT NULL, "revisionId" varchar NOT NULL, "deviceId" varchar NOT NULL, "position" integer NOT NULL, "name" varchar(50) NOT NULL, "targets" text NOT NULL, "result" text, "error" text, "engineVersion" varchar(50) NOT NULL, "processVersionId" varchar NOT NULL, "computedAt" varchar(30) NOT NULL, CONSTRAINT "FK_revision_devices_revision" FOREIGN KEY ("revisionId") REFERENCES "revisions" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_revision_devices_processVersion" FOREIGN KEY ("processVersionId") REFERENCES "process_versions" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE UNIQUE INDEX "IDX_revision_devices_revision_position" ON "revision_devices" ("revisionId", "position")`);
    for (const table of ['revisions', 'revision_devices']) {
      await createRefusingTrigger(queryRunner, { name: `TRG_${table}_no_update`, table, event: 'UPDATE', message: 'revisions are immutable' });
      await createRefusingTrigger(queryRunner, { name: `TRG_${table}_no_delete`, table, event: 'DELETE', message: 'revisions are immutable' });
    }
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    for (const table of ['revision_devices', 'revisions']) {
      await dropTrigger(queryRunner, `TRG_${table}_no_delete`, table);
      await dropTrigger(queryRunner, `TRG_${table}_no_update`, table);
    }
    await execute(queryRunner, `DROP INDEX "IDX_revision_devices_revision_position"`);
    await execute(queryRunner, `DROP TABLE "revision_devices"`);
    await execute(queryRunner, `DROP INDEX "IDX_revisions_sheet_number"`);
    await execute(queryRunner, `DROP INDEX "IDX_revisions_project"`);
    await execute(queryRunner, `DROP TABLE "revisions"`);
  }
}
