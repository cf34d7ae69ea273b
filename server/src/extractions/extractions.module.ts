import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module.js';
import { CharacterisationModule } from '../characterisation/characterisation.module.js';
import { ProcessesModule } from '../processes/processes.module.js';
import { UsersModule } from '../users/users.module.js';
import { ExtractionUploadEntity } from './extraction-upload.entity.js';
import { ExtractionEntity } from './extraction.entity.js';
import { ExtractionsController } from './extractions.controller.js';
import { ExtractionsService } from './extractions.service.js';
import { ExtractionJobStore } from './jobs/extraction-job-store.js';
import { ExtractionRunner } from './jobs/extraction-runner.js';
import { ExtractionWorkers } from './jobs/extraction-workers.js';

/**
 * Parameter extraction (docs/extraction.md): curve files uploaded and kept, fits run as jobs on worker threads, results,
 * and a result saved as a profile version through ProcessesService; the points of a characterised table, read through
 * the characterisation module's exported CharacterisationTables, kept as an upload. Exports nothing: no other module
 * needs its rows.
 */
@Module({
  imports: [TypeOrmModule.forFeature([ExtractionEntity, ExtractionUploadEntity]), ProcessesModule, UsersModule, AuditModule, CharacterisationModule],
  controllers: [ExtractionsController],
  providers: [ExtractionsService, ExtractionWorkers, ExtractionJobStore, ExtractionRunner],
})
export class ExtractionsModule {}
