import { Module } from '@nestjs/common';
import { UsersModule } from '../users/users.module.js';
import { DEMO_SEEDERS } from './demo-seeder.js';
import { DemoUsersSeeder } from './demo-users.seeder.js';
import { SeedService } from './seed.service.js';

/** The invented demo data at start-up; the demo accounts come through UsersService, every feature seeds its own tables. */
@Module({
  imports: [UsersModule],
  providers: [SeedService, { provide: DEMO_SEEDERS, useClass: DemoUsersSeeder }],
})
export class SeedModule {}
