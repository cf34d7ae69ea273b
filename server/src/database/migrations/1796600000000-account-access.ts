import type { MigrationInterface, QueryRunner } from 'typeorm';
import { engineOf } from '../database-engine.js';
import { execute } from './dialect.js';

/**
 * Library access and e-mail confirmation on accounts. A new account reads no process profile until an admin
 * grants library access or adds it to a project that uses one, and a self-registered account signs in once
 * it has confirmed its address. Accounts that exist already keep what they had: confirmed, with access.
 */
export class AccountAccess1796600000000 implements MigrationInterface {
  name = 'AccountAccess1796600000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `ALTER TABLE "users" ADD COLUMN "libraryAccess" boolean NOT NULL DEFAULT (0)`);
    await execute(queryRunner, `ALTER TABLE "users" ADD COLUMN "emailConfirmed" boolean NOT NULL DEFAULT (0)`);
    const yes = engineOf(queryRunner) === 'postgres' ? 'true' : '1';
    await execute(queryRunner, `UPDATE "users" SET "libraryAccess" = ${yes}, "emailConfirmed" = ${yes}`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `ALTER TABLE "users" DROP COLUMN "emailConfirmed"`);
    await execute(queryRunner, `ALTER TABLE "users" DROP COLUMN "libraryAccess"`);
  }
}
