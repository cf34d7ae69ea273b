import type { MigrationInterface, QueryRunner } from 'typeorm';
import { createRefusingTrigger, dropTrigger, execute } from './dialect.js';

/**
 * The process-profile library: profiles (name unique regardless of case through nameKey) and their
 * immutable versions (the definition as JSON text). A trigger refuses any change to a version's
 * content, so a version a sheet or a sign-off points at can never change under it.
 */
export class CreateProcessProfiles1796250000000 implements MigrationInterface {
  name = 'CreateProcessProfiles1796250000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner,
      `CREATE TABLE "process_profiles" ("id" varchar PRIMARY KEY NOT NULL, "name" varchar(100) NOT NULL, "nameKey" varchar(100) NOT NULL, "description" text NOT NULL DEFAULT (''), "nodeClass" varchar(50) NOT NULL DEFAULT (''), "deprecated" boolean NOT NULL DEFAULT (0), "demoData" boolean NOT NULL DEFAULT (0), "latestVersion" integer NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedById" varchar, CONSTRAINT "FK_process_profiles_updatedBy" FOREIGN KEY ("updatedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE UNIQUE INDEX "IDX_process_profiles_nameKey" ON "process_profiles" ("nameKey")`);
    await execute(queryRunner,
      `CREATE TABLE "process_versions" ("id" varchar PRIMARY KEY NOT NULL, "profileId" varchar NOT NULL, "number" integer NOT NULL, "schemaVersion" integer NOT NULL DEFAULT (1), "definition" text NOT NULL, "message" varchar(500) NOT NULL DEFAULT (''), "authorId" varchar, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_process_versions_profile" FOREIGN KEY ("profileId") REFERENCES "process_profiles" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_process_versions_author" FOREIGN KEY ("authorId") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE UNIQUE INDEX "IDX_process_versions_profile_number" ON "process_versions" ("profileId", "number")`);
    await createRefusingTrigger(queryRunner, { name: 'TRG_process_versions_immutable', table: 'process_versions', event: 'UPDATE', columns: ['id', 'profileId', 'number', 'schemaVersion', 'definition', 'message', 'createdAt'], message: 'process versions are immutable' });
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await dropTrigger(queryRunner, 'TRG_process_versions_immutable', 'process_versions');
    await execute(queryRunner, `DROP INDEX "IDX_process_versions_profile_number"`);
    await execute(queryRunner, `DROP TABLE "process_versions"`);
    await execute(queryRunner, `DROP INDEX "IDX_process_profiles_nameKey"`);
    await execute(queryRunner, `DROP TABLE "process_profiles"`);
  }
}
