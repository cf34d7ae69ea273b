import type { MigrationInterface, QueryRunner } from 'typeorm';
import { execute } from './dialect.js';

/**
 * A sheet's budgets: the off-state leakage budget (current at a temperature, JSON, null without one) and the
 * offset budgets of its match groups (JSON list, empty by default). Existing sheets have neither. After the rebuild of sheets for the table model (1796700000001), which lists its columns.
 */
export class SheetBudgets1796700000003 implements MigrationInterface {
  name = 'SheetBudgets1796700000003';

  async up(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `ALTER TABLE "sheets" ADD COLUMN "leakageBudget" text`);
    await execute(queryRunner, `ALTER TABLE "sheets" ADD COLUMN "offsetBudgets" text NOT NULL DEFAULT ('[]')`);
  }

  async down(queryRunner: QueryRunner): Promise<void> {
    await execute(queryRunner, `ALTER TABLE "sheets" DROP COLUMN "offsetBudgets"`);
    await execute(queryRunner, `ALTER TABLE "sheets" DROP COLUMN "leakageBudget"`);
  }
}
