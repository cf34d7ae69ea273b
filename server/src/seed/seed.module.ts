import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { UserEntity } from '../users/user.entity.js';
import { DEMO_SEEDERS } from './demo-seeder.js';
import { DemoUsersSeeder } from './demo-users.seeder.js';
import { SeedService } from './seed.service.js';

@Module({
  imports: [TypeOrmModule.forFeature([UserEntity])],
  providers: [SeedService, { provide: DEMO_SEEDERS, useClass: DemoUsersSeeder }],
})
export class SeedModule {}
