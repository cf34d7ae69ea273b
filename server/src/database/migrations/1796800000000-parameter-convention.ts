import type { MigrationInterface, QueryRunner } from 'typeorm';
import { createRefusingTrigger, dropTrigger, execute } from './dialect.js';

/**
 * The parameter convention of each process version: every version written before engine 2.0 gets 1 (kp read
 * without the all-region model's bulk-charge factor 1/n), which the library then shows; the server writes new
 * versions with the current convention. Part of a version's content, so the immutability trigger covers it.
 */
export class ParameterConvention1796800000000 implements MigrationInterface {
  name = 'ParameterConvention1796800000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `ALTER TABLE "process_versions" ADD COLUMN "parameterConvention" integer NOT NULL DEFAULT (1)`);
    await dropTrigger(queryRunner, 'TRG_process_versions_immutable', 'process_versions');
    await createRefusingTrigger(queryRunner, { name: 'TRG_process_versions_immutable', table: 'process_versions', event: 'UPDATE', columns: ['id', 'profileId', 'number', 'schemaVersion', 'definition', 'message', 'createdAt', 'modelCard', 'modelCardSha256', 'modelCardMapping', 'parameterConvention'], message: 'process versions are immutable' });
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await dropTrigger(queryRunner, 'TRG_process_versions_immutable', 'process_versions');
    await createRefusingTrigger(queryRunner, { name: 'TRG_process_versions_immutable', table: 'process_versions', event: 'UPDATE', columns: ['id', 'profileId', 'number', 'schemaVersion', 'definition', 'message', 'createdAt', 'modelCard', 'modelCardSha256', 'modelCardMapping'], message: 'process versions are immutable' });
    await execute(queryRunner, `ALTER TABLE "process_versions" DROP COLUMN "parameterConvention"`);
  }
}
