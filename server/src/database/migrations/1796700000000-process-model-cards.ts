import type { MigrationInterface, QueryRunner } from 'typeorm';
import { createRefusingTrigger, dropTrigger, execute } from './dialect.js';

/**
 * Model cards on process versions: the re-emitted card text, its SHA-256 and the mapping of its sections to
 * corners and of its models to polarity and flavour. Part of the version's content, so the immutability trigger
 * now covers them too (a card change is a new version).
 */
export class ProcessModelCards1796700000000 implements MigrationInterface {
  name = 'ProcessModelCards1796700000000';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `ALTER TABLE "process_versions" ADD COLUMN "modelCard" text`);
    await execute(queryRunner, `ALTER TABLE "process_versions" ADD COLUMN "modelCardSha256" varchar(64)`);
    await execute(queryRunner, `ALTER TABLE "process_versions" ADD COLUMN "modelCardMapping" text`);
    await dropTrigger(queryRunner, 'TRG_process_versions_immutable', 'process_versions');
    await createRefusingTrigger(queryRunner, { name: 'TRG_process_versions_immutable', table: 'process_versions', event: 'UPDATE', columns: ['id', 'profileId', 'number', 'schemaVersion', 'definition', 'message', 'createdAt', 'modelCard', 'modelCardSha256', 'modelCardMapping'], message: 'process versions are immutable' });
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await dropTrigger(queryRunner, 'TRG_process_versions_immutable', 'process_versions');
    await createRefusingTrigger(queryRunner, { name: 'TRG_process_versions_immutable', table: 'process_versions', event: 'UPDATE', columns: ['id', 'profileId', 'number', 'schemaVersion', 'definition', 'message', 'createdAt'], message: 'process versions are immutable' });
    await execute(queryRunner, `ALTER TABLE "process_versions" DROP COLUMN "modelCardMapping"`);
    await execute(queryRunner, `ALTER TABLE "process_versions" DROP COLUMN "modelCardSha256"`);
    await execute(queryRunner, `ALTER TABLE "process_versions" DROP COLUMN "modelCard"`);
  }
}
