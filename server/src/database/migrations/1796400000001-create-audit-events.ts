import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The append-only audit trail. Triggers refuse every UPDATE and DELETE, so a row once written stays
 * as it was; the entity ids are deliberately not foreign keys, so the trail outlives what it describes.
 */
export class CreateAuditEvents1796400000001 implements MigrationInterface {
  name = 'CreateAuditEvents1796400000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(
      `CREATE TABLE "audit_events" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "at" datetime NOT NULL, "actorId" varchar, "projectId" varchar, "entityType" varchar(40) NOT NULL, "entityId" varchar NOT NULL, "action" varchar(60) NOT NULL, "before" text, "after" text, "summary" varchar(500) NOT NULL, CONSTRAINT "FK_audit_events_actor" FOREIGN KEY ("actorId") REFERENCES "users" ("id") ON DELETE NO ACTION ON UPDATE NO ACTION)`,
    );
    await queryRunner.query(`CREATE INDEX "IDX_audit_events_project" ON "audit_events" ("projectId", "id")`);
    await queryRunner.query(
      `CREATE TRIGGER "TRG_audit_events_no_update" BEFORE UPDATE ON "audit_events" BEGIN SELECT RAISE(ABORT, 'audit events are append-only'); END`,
    );
    await queryRunner.query(
      `CREATE TRIGGER "TRG_audit_events_no_delete" BEFORE DELETE ON "audit_events" BEGIN SELECT RAISE(ABORT, 'audit events are append-only'); END`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER "TRG_audit_events_no_delete"`);
    await queryRunner.query(`DROP TRIGGER "TRG_audit_events_no_update"`);
    await queryRunner.query(`DROP INDEX "IDX_audit_events_project"`);
    await queryRunner.query(`DROP TABLE "audit_events"`);
  }
}
