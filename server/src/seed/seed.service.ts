import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import { AppConfigService } from '../config/app-config.service.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { UsersService } from '../users/users.service.js';
import { DEMO_SEEDERS, type DemoSeeder } from './demo-seeder.js';

/** Seeds the invented demo data at start-up when SEED_DEMO is on and the database has no account yet. */
@Injectable()
export class SeedService implements OnApplicationBootstrap {
  private readonly logger = new Logger(SeedService.name);

  constructor(
    private readonly config: AppConfigService,
    private readonly unitOfWork: UnitOfWork,
    private readonly users: UsersService,
    private readonly moduleRef: ModuleRef,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (this.config.seedDemo && (await this.seedIfEmpty())) this.logger.log('Seeded the invented demo data');
  }

  /** Runs every registered DemoSeeder in order, in one transaction; false when there were accounts already. */
  seedIfEmpty(): Promise<boolean> {
    const seeders = this.moduleRef
      .get<DemoSeeder>(DEMO_SEEDERS, { strict: false, each: true })
      .toSorted((a, b) => a.order - b.order);
    return this.unitOfWork.run(async (manager) => {
      if (await this.users.hasAnyAccount(manager)) return false;
      for (const seeder of seeders) await seeder.seed(manager);
      return true;
    });
  }
}
