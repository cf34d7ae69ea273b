import type { MigrationInterface, QueryRunner } from 'typeorm';
import { execute } from './dialect.js';

/**
 * Characterisation jobs and their lookup tables (the characterisation module), the tables' bytes in chunks. A version
 * and grid have at most one queued, running or finished job (partial unique index); a job's tables and chunks go with
 * it, and all go with their version.
 */
export class CreateCharacterisations1796700000002 implements MigrationInterface {
  name = 'CreateCharacterisations1796700000002';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner,
      `CREATE TABLE "characterisation_jobs" ("id" varchar PRIMARY KEY NOT NULL, "processVersionId" varchar NOT NULL, "gridHash" varchar(64) NOT NULL, "plan" text NOT NULL, "status" varchar(16) NOT NULL, "done" integer NOT NULL DEFAULT (0), "total" integer NOT NULL, "etaSeconds" real, "error" text, "engine" varchar(16), "attempts" integer NOT NULL DEFAULT (0), "cancelRequested" boolean NOT NULL DEFAULT (0), "owner" varchar(64), "heartbeatAt" datetime, "requestedById" varchar, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "startedAt" datetime, "finishedAt" datetime, "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_characterisation_jobs_processVersion" FOREIGN KEY ("processVersionId") REFERENCES "process_versions" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_characterisation_jobs_requestedBy" FOREIGN KEY ("requestedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE UNIQUE INDEX "IDX_characterisation_jobs_version_grid" ON "characterisation_jobs" ("processVersionId", "gridHash") WHERE "status" IN ('queued', 'running', 'done')`);
    await execute(queryRunner, `CREATE INDEX "IDX_characterisation_jobs_status" ON "characterisation_jobs" ("status", "createdAt")`);
    await execute(queryRunner,
      `CREATE TABLE "characterisation_tables" ("id" varchar PRIMARY KEY NOT NULL, "jobId" varchar NOT NULL, "processVersionId" varchar NOT NULL, "polarity" varchar(4) NOT NULL, "flavour" varchar(50) NOT NULL DEFAULT (''), "modelName" varchar(100) NOT NULL, "sha256" varchar(64) NOT NULL, "points" integer NOT NULL, "size" integer NOT NULL, "storedBytes" integer NOT NULL, "grid" text NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_characterisation_tables_job" FOREIGN KEY ("jobId") REFERENCES "characterisation_jobs" ("id") ON DELETE CASCADE ON UPDATE NO ACTION, CONSTRAINT "FK_characterisation_tables_processVersion" FOREIGN KEY ("processVersionId") REFERENCES "process_versions" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE UNIQUE INDEX "IDX_characterisation_tables_job_device" ON "characterisation_tables" ("jobId", "polarity", "flavour")`);
    await execute(queryRunner, `CREATE INDEX "IDX_characterisation_tables_version_device" ON "characterisation_tables" ("processVersionId", "polarity", "flavour")`);
    await execute(queryRunner,
      `CREATE TABLE "characterisation_table_chunks" ("tableId" varchar NOT NULL, "seq" integer NOT NULL, "jobId" varchar NOT NULL, "data" blob NOT NULL, PRIMARY KEY ("tableId", "seq"), CONSTRAINT "FK_characterisation_table_chunks_job" FOREIGN KEY ("jobId") REFERENCES "characterisation_jobs" ("id") ON DELETE CASCADE ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE INDEX "IDX_characterisation_table_chunks_job" ON "characterisation_table_chunks" ("jobId")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `DROP INDEX "IDX_characterisation_table_chunks_job"`);
    await execute(queryRunner, `DROP TABLE "characterisation_table_chunks"`);
    await execute(queryRunner, `DROP INDEX "IDX_characterisation_tables_version_device"`);
    await execute(queryRunner, `DROP INDEX "IDX_characterisation_tables_job_device"`);
    await execute(queryRunner, `DROP TABLE "characterisation_tables"`);
    await execute(queryRunner, `DROP INDEX "IDX_characterisation_jobs_status"`);
    await execute(queryRunner, `DROP INDEX "IDX_characterisation_jobs_version_grid"`);
    await execute(queryRunner, `DROP TABLE "characterisation_jobs"`);
  }
}
