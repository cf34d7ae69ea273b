import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { DEMO_SEEDERS } from '../seed/demo-seeder.js';
import { ProcessDeriveController } from './process-derive.controller.js';
import { ProcessImportController } from './process-import.controller.js';
import { ProcessMaintainerGuard } from './process-maintainer.guard.js';
import { ProcessProfileEntity } from './process-profile.entity.js';
import { ProcessVersionEntity } from './process-version.entity.js';
import { ProcessesController } from './processes.controller.js';
import { ProcessesDemoSeeder } from './processes-demo.seeder.js';
import { ProcessesService } from './processes.service.js';

/**
 * The versioned process-profile library. Exports ProcessesService for the compute API and sheets
 * (resolveDefinition, resolveVersion); a table with a foreign key to process_versions is found by the
 * delete check by itself.
 */
@Module({
  imports: [TypeOrmModule.forFeature([ProcessProfileEntity, ProcessVersionEntity])],
  controllers: [ProcessImportController, ProcessDeriveController, ProcessesController],
  providers: [ProcessesService, ProcessMaintainerGuard, { provide: DEMO_SEEDERS, useClass: ProcessesDemoSeeder }],
  exports: [ProcessesService],
})
export class ProcessesModule {}
