import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Library access and e-mail confirmation on accounts. A new account reads no process profile until an admin
 * grants library access or adds it to a project that uses one, and a self-registered account signs in once
 * it has confirmed its address. Accounts that exist already keep what they had: confirmed, with access.
 */
export class AccountAccess1796600000000 implements MigrationInterface {
  name = 'AccountAccess1796600000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "users" ADD COLUMN "libraryAccess" boolean NOT NULL DEFAULT (0)`);
    await queryRunner.query(`ALTER TABLE "users" ADD COLUMN "emailConfirmed" boolean NOT NULL DEFAULT (0)`);
    await queryRunner.query(`UPDATE "users" SET "libraryAccess" = 1, "emailConfirmed" = 1`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "users" DROP COLUMN "emailConfirmed"`);
    await queryRunner.query(`ALTER TABLE "users" DROP COLUMN "libraryAccess"`);
  }
}
