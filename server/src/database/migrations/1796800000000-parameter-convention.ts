import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * The parameter convention of each process version: every version written before engine 2.0 gets 1 (kp read
 * without the all-region model's bulk-charge factor 1/n), which the library then shows; the server writes new
 * versions with the current convention. Part of a version's content, so the immutability trigger covers it.
 */
export class ParameterConvention1796800000000 implements MigrationInterface {
  name = 'ParameterConvention1796800000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`ALTER TABLE "process_versions" ADD COLUMN "parameterConvention" integer NOT NULL DEFAULT (1)`);
    await queryRunner.query(`DROP TRIGGER "TRG_process_versions_immutable"`);
    await queryRunner.query(
      `CREATE TRIGGER "TRG_process_versions_immutable" BEFORE UPDATE OF "id", "profileId", "number", "schemaVersion", "definition", "message", "createdAt", "modelCard", "modelCardSha256", "modelCardMapping", "parameterConvention" ON "process_versions" BEGIN SELECT RAISE(ABORT, 'process versions are immutable'); END`,
    );
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await queryRunner.query(`DROP TRIGGER "TRG_process_versions_immutable"`);
    await queryRunner.query(
      `CREATE TRIGGER "TRG_process_versions_immutable" BEFORE UPDATE OF "id", "profileId", "number", "schemaVersion", "definition", "message", "createdAt", "modelCard", "modelCardSha256", "modelCardMapping" ON "process_versions" BEGIN SELECT RAISE(ABORT, 'process versions are immutable'); END`,
    );
    await queryRunner.query(`ALTER TABLE "process_versions" DROP COLUMN "parameterConvention"`);
  }
}
