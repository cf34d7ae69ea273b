import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Model cards on process versions: the re-emitted card text, its SHA-256 and the mapping of its sections to
 * corners and of its models to polarity and flavour. Part of the version's content, so the immutability trigger
 * now covers them too (a card change is a new version).
 */
export class ProcessModelCards1796700000000 implements MigrationInterface {
  name = 'ProcessModelCards1796700000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "process_versions" ADD COLUMN "modelCard" text`);
    await queryRunner.query(`ALTER TABLE "process_versions" ADD COLUMN "modelCardSha256" varchar(64)`);
    await queryRunner.query(`ALTER TABLE "process_versions" ADD COLUMN "modelCardMapping" text`);
    await queryRunner.query(`DROP TRIGGER "TRG_process_versions_immutable"`);
    await queryRunner.query(
      `CREATE TRIGGER "TRG_process_versions_immutable" BEFORE UPDATE OF "id", "profileId", "number", "schemaVersion", "definition", "message", "createdAt", "modelCard", "modelCardSha256", "modelCardMapping" ON "process_versions" BEGIN SELECT RAISE(ABORT, 'process versions are immutable'); END`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER "TRG_process_versions_immutable"`);
    await queryRunner.query(
      `CREATE TRIGGER "TRG_process_versions_immutable" BEFORE UPDATE OF "id", "profileId", "number", "schemaVersion", "definition", "message", "createdAt" ON "process_versions" BEGIN SELECT RAISE(ABORT, 'process versions are immutable'); END`,
    );
    await queryRunner.query(`ALTER TABLE "process_versions" DROP COLUMN "modelCardMapping"`);
    await queryRunner.query(`ALTER TABLE "process_versions" DROP COLUMN "modelCardSha256"`);
    await queryRunner.query(`ALTER TABLE "process_versions" DROP COLUMN "modelCard"`);
  }
}
