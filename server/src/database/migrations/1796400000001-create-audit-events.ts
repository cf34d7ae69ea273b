import type { MigrationInterface, QueryRunner } from 'typeorm';
import { createRefusingTrigger, dropTrigger, execute } from './dialect.js';

/**
 * The append-only audit trail. Triggers refuse every UPDATE and DELETE, so a row once written stays
 * as it was; the entity ids are deliberately not foreign keys, so the trail outlives what it describes.
 */
export class CreateAuditEvents1796400000001 implements MigrationInterface {
  name = 'CreateAuditEvents1796400000001';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner,
      `CREATE TABLE "audit_events" ("id" integer PRIMARY KEY AUTOINCREMENT NOT NULL, "at" datetime NOT NULL, "actorId" varchar, "projectId" varchar, "entityType" varchar(40) NOT NULL, "entityId" varchar NOT NULL, "action" varchar(60) NOT NULL, "before" text, "after" text, "summary" varchar(500) NOT NULL, CONSTRAINT "FK_audit_events_actor" FOREIGN KEY ("actorId") REFERENCES "users" ("id") ON DELETE NO ACTION ON UPDATE NO ACTION)`,
    );
    await execute(queryRunner, `CREATE INDEX "IDX_audit_events_project" ON "audit_events" ("projectId", "id")`);
    await createRefusingTrigger(queryRunner, { name: 'TRG_audit_events_no_update', table: 'audit_events', event: 'UPDATE', message: 'audit events are append-only' });
    await createRefusingTrigger(queryRunner, { name: 'TRG_audit_events_no_delete', table: 'audit_events', event: 'DELETE', message: 'audit events are append-only' });
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await dropTrigger(queryRunner, 'TRG_audit_events_no_delete', 'audit_events');
    await dropTrigger(queryRunner, 'TRG_audit_events_no_update', 'audit_events');
    await execute(queryRunner, `DROP INDEX "IDX_audit_events_project"`);
    await execute(queryRunner, `DROP TABLE "audit_events"`);
  }
}
