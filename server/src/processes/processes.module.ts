import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module.js';
import { DEMO_SEEDERS } from '../seed/demo-seeder.js';
import { UsersModule } from '../users/users.module.js';
import { ProcessDeriveController } from './process-derive.controller.js';
import { ProcessImportController } from './process-import.controller.js';
import { ProcessMaintainerGuard } from './process-maintainer.guard.js';
import { ProcessProfileEntity } from './process-profile.entity.js';
import { ProcessVersionEntity } from './process-version.entity.js';
import { ProcessVisibility } from './process-visibility.js';
import { ProcessWriter } from './process-writes.js';
import { ProcessesController } from './processes.controller.js';
import { ProcessesDemoSeeder } from './processes-demo.seeder.js';
import { ProcessesService } from './processes.service.js';

/**
 * The versioned process-profile library. Exports ProcessesService for the compute API and sheets
 * (resolveDefinition, resolveVersion, versionFacts); a table with a foreign key to process_versions is found
 * by the delete check by itself. Who reads which profile is ProcessVisibility's answer, fed by the
 * ProcessUseSource each feature that uses processes registers under PROCESS_USE_SOURCES.
 */
@Module({
  imports: [TypeOrmModule.forFeature([ProcessProfileEntity, ProcessVersionEntity]), UsersModule, AuditModule],
  controllers: [ProcessImportController, ProcessDeriveController, ProcessesController],
  providers: [ProcessesService, ProcessWriter, ProcessVisibility, ProcessMaintainerGuard, { provide: DEMO_SEEDERS, useClass: ProcessesDemoSeeder }],
  exports: [ProcessesService],
})
export class ProcessesModule {}
