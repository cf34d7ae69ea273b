import type { MigrationInterface, QueryRunner } from 'typeorm';
import { execute } from './dialect.js';

/** Accounts: e-mail stored lower-case under a unique index, global role, disabled and maintainer flags. */
export class CreateUsers1796164741627 implements MigrationInterface {
  name = 'CreateUsers1796164741627';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner,
      `CREATE TABLE "users" ("id" varchar PRIMARY KEY NOT NULL, "email" varchar(254) NOT NULL, "displayName" varchar(100) NOT NULL, "passwordHash" varchar NOT NULL, "role" varchar CHECK( "role" IN ('admin','member') ) NOT NULL DEFAULT ('member'), "disabled" boolean NOT NULL DEFAULT (0), "processMaintainer" boolean NOT NULL DEFAULT (0), "createdAt" datetime NOT NULL DEFAULT (datetime('now')), "updatedAt" datetime NOT NULL DEFAULT (datetime('now')))`,
    );
    await execute(queryRunner, `CREATE UNIQUE INDEX "IDX_users_email" ON "users" ("email")`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `DROP INDEX "IDX_users_email"`);
    await execute(queryRunner, `DROP TABLE "users"`);
  }
}
