import type { EntityManager } from 'typeorm';

/**
 * One feature's part of the invented demo data. Seeders run in ascending `order`, all in one
 * transaction, only on an empty database with SEED_DEMO on. The demo users come first (order 0);
 * a seeder that needs them looks them up by e-mail (DEMO_ACCOUNTS).
 */
export interface DemoSeeder {
  readonly order: number;
  seed(manager: EntityManager): Promise<void>;
}

/**
 * Register a seeder in its feature module with `{ provide: DEMO_SEEDERS, useClass: MyDemoSeeder }`.
 * Every module may provide this token once; SeedService collects them all across modules.
 */
export const DEMO_SEEDERS = Symbol('DEMO_SEEDERS');
