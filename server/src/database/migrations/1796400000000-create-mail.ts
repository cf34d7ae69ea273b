import type { MigrationInterface, QueryRunner } from 'typeorm';
import { execute } from './dialect.js';

/**
 * Mail: the outbox (every message the server sends, with its delivery state, written in the
 * transaction of the change it reports) and the messages the local SMTP sink received.
 */
export class CreateMail1796400000000 implements MigrationInterface {
  name = 'CreateMail1796400000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner,
      `CREATE TABLE "outbox_messages" ("id" varchar PRIMARY KEY NOT NULL, "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "recipient" varchar(254) NOT NULL, "subject" varchar(300) NOT NULL, "text" text NOT NULL, "html" text NOT NULL, "link" varchar(2000) NOT NULL, "state" varchar CHECK( "state" IN ('queued','sent','failed') ) NOT NULL DEFAULT ('queued'), "attempts" integer NOT NULL DEFAULT (0), "lastError" text, "nextAttemptAt" datetime NOT NULL, "sentAt" datetime)`,
    );
    await execute(queryRunner, `CREATE INDEX "IDX_outbox_messages_state_next" ON "outbox_messages" ("state", "nextAttemptAt")`);
    await execute(queryRunner,
      `CREATE TABLE "received_mail" ("id" varchar PRIMARY KEY NOT NULL, "receivedAt" datetime NOT NULL, "sender" varchar(500) NOT NULL, "recipients" text NOT NULL, "subject" varchar(1000) NOT NULL, "text" text NOT NULL, "html" text NOT NULL, "messageId" varchar(500))`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `DROP TABLE "received_mail"`);
    await execute(queryRunner, `DROP INDEX "IDX_outbox_messages_state_next"`);
    await execute(queryRunner, `DROP TABLE "outbox_messages"`);
  }
}
