import type { MigrationInterface, QueryRunner } from 'typeorm';
import { execute } from './dialect.js';

/**
 * Projects with their members (one role each), sizing sheets on a process version, and devices with
 * their targets and stored results (JSON text) and the engine and process versions that made them.
 * Sheets and devices point at process_versions, so a version in use cannot be deleted.
 */
export class CreateProjectsAndSheets1796450000000 implements MigrationInterface {
  name = 'CreateProjectsAndSheets1796450000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner,
      `CREATE TABLE "projects" ("id" varchar PRIMARY KEY NOT NULL, "name" varchar(100) NOT NULL, "description" text NOT NULL DEFAULT (''), "version" integer NOT NULL DEFAULT (1), "createdById" varchar, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_projects_createdBy" FOREIGN KEY ("createdById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner,
      `CREATE TABLE "project_members" ("projectId" varchar NOT NULL, "userId" varchar NOT NULL, "role" varchar CHECK( "role" IN ('owner','designer','reviewer','viewer') ) NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_project_members_project" FOREIGN KEY ("projectId") REFERENCES "projects" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_project_members_user" FOREIGN KEY ("userId") REFERENCES "users" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, PRIMARY KEY ("projectId", "userId"))`,
    );
    await execute(queryRunner, `CREATE INDEX "IDX_project_members_user" ON "project_members" ("userId")`);
    await execute(queryRunner,
      `CREATE TABLE "sheets" ("id" varchar PRIMARY KEY NOT NULL, "projectId" varchar NOT NULL, "name" varchar(100) NOT NULL, "description" text NOT NULL DEFAULT (''), "processVersionId" varchar NOT NULL, "temperature" real, "corner" varchar(50) NOT NULL DEFAULT ('TT'), "model" varchar CHECK( "model" IN ('all-region','square-law') ) NOT NULL DEFAULT ('all-region'), "version" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_sheets_project" FOREIGN KEY ("projectId") REFERENCES "projects" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_sheets_processVersion" FOREIGN KEY ("processVersionId") REFERENCES "process_versions" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE INDEX "IDX_sheets_project" ON "sheets" ("projectId")`);
    await execute(queryRunner,
      `CREATE TABLE "devices" ("id" varchar PRIMARY KEY NOT NULL, "sheetId" varchar NOT NULL, "position" integer NOT NULL, "name" varchar(50) NOT NULL, "targets" text NOT NULL, "result" text, "error" text, "engineVersion" varchar(50) NOT NULL, "processVersionId" varchar NOT NULL, "computedAt" datetime NOT NULL, "version" integer NOT NULL DEFAULT (1), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_devices_sheet" FOREIGN KEY ("sheetId") REFERENCES "sheets" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_devices_processVersion" FOREIGN KEY ("processVersionId") REFERENCES "process_versions" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE UNIQUE INDEX "IDX_devices_sheet_name" ON "devices" ("sheetId", "name")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `DROP INDEX "IDX_devices_sheet_name"`);
    await execute(queryRunner, `DROP TABLE "devices"`);
    await execute(queryRunner, `DROP INDEX "IDX_sheets_project"`);
    await execute(queryRunner, `DROP TABLE "sheets"`);
    await execute(queryRunner, `DROP INDEX "IDX_project_members_user"`);
    await execute(queryRunner, `DROP TABLE "project_members"`);
    await execute(queryRunner, `DROP TABLE "projects"`);
  }
}
