import type { MigrationInterface, QueryRunner } from 'typeorm';
import { execute } from './dialect.js';

/**
 * Parameter extraction (the extractions module): uploaded curve files kept as they came, and the fits of a profile's
 * parameters to them, each a job with its state, progress and result. A fit refers to its base version, which it
 * keeps from being deleted (an extraction is a record of where a version came from); re-runs share an upload.
 */
export class CreateExtractions1796800000001 implements MigrationInterface {
  name = 'CreateExtractions1796800000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner,
      `CREATE TABLE "extraction_uploads" ("id" varchar PRIMARY KEY NOT NULL, "fileName" varchar(255) NOT NULL, "sha256" varchar(64) NOT NULL, "bytes" integer NOT NULL, "content" blob NOT NULL, "readOptions" text NOT NULL, "reading" text NOT NULL, "uploadedById" varchar, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_extraction_uploads_uploadedBy" FOREIGN KEY ("uploadedById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner,
      `CREATE TABLE "extractions" ("id" varchar PRIMARY KEY NOT NULL, "uploadId" varchar NOT NULL, "processVersionId" varchar NOT NULL, "polarity" varchar(4) NOT NULL, "options" text NOT NULL, "status" varchar(16) NOT NULL, "iterations" integer NOT NULL DEFAULT (0), "maxIterations" integer NOT NULL, "cancelRequested" boolean NOT NULL DEFAULT (0), "attempts" integer NOT NULL DEFAULT (0), "error" text, "result" text, "curves" text, "savedProfileId" varchar, "savedVersion" integer, "rerunOfId" varchar, "createdById" varchar, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "startedAt" datetime, "finishedAt" datetime, "updatedAt" datetime NOT NULL DEFAULT (datetime('now')), CONSTRAINT "FK_extractions_upload" FOREIGN KEY ("uploadId") REFERENCES "extraction_uploads" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_extractions_processVersion" FOREIGN KEY ("processVersionId") REFERENCES "process_versions" ("id") ON DELETE RESTRICT ON UPDATE NO ACTION, CONSTRAINT "FK_extractions_rerunOf" FOREIGN KEY ("rerunOfId") REFERENCES "extractions" ("id") ON DELETE SET NULL ON UPDATE NO ACTION, CONSTRAINT "FK_extractions_createdBy" FOREIGN KEY ("createdById") REFERENCES "users" ("id") ON DELETE SET NULL ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE INDEX "IDX_extractions_status" ON "extractions" ("status", "createdAt")`);
    await execute(queryRunner, `CREATE INDEX "IDX_extractions_createdBy" ON "extractions" ("createdById", "createdAt")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `DROP INDEX "IDX_extractions_createdBy"`);
    await execute(queryRunner, `DROP INDEX "IDX_extractions_status"`);
    await execute(queryRunner, `DROP TABLE "extractions"`);
    await execute(queryRunner, `DROP TABLE "extraction_uploads"`);
  }
}
