import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module.js';
import { PROJECT_RESOURCE_RESOLVERS } from '../projects/project-resource-resolver.js';
import { ProjectsModule } from '../projects/projects.module.js';
import { SHEET_REMOVAL_CHECKS } from '../sheets/sheet-removal-check.js';
import { SHEET_REVISION_FACTS } from '../sheets/sheet-revision-facts.js';
import { SheetsModule } from '../sheets/sheets.module.js';
import { UsersModule } from '../users/users.module.js';
import { RevisionDeviceEntity } from './revision-device.entity.js';
import { RevisionFactsOfSheets } from './revision-facts-of-sheets.js';
import { RevisionProjectResolver } from './revision-project.resolver.js';
import { RevisionReader } from './revision-reader.js';
import { RevisionEntity } from './revision.entity.js';
import { RevisionsController } from './revisions.controller.js';
import { RevisionsKeepSheets } from './revisions-keep-sheets.js';
import { RevisionsService } from './revisions.service.js';

/**
 * Immutable revisions of sheets with their content hash. Exports RevisionReader and RevisionsService
 * for the reviews. A revision's state comes from its review requests, which the reviews feature reports
 * through REVISION_REVIEWS; a sheet with revisions is kept (SHEET_REMOVAL_CHECKS), and its export names the
 * newest revision (SHEET_REVISION_FACTS).
 */
@Module({
  imports: [TypeOrmModule.forFeature([RevisionEntity, RevisionDeviceEntity]), UsersModule, ProjectsModule, SheetsModule, AuditModule],
  controllers: [RevisionsController],
  providers: [
    RevisionsService,
    RevisionReader,
    { provide: PROJECT_RESOURCE_RESOLVERS, useClass: RevisionProjectResolver },
    { provide: SHEET_REMOVAL_CHECKS, useClass: RevisionsKeepSheets },
    { provide: SHEET_REVISION_FACTS, useClass: RevisionFactsOfSheets },
  ],
  exports: [RevisionsService, RevisionReader],
})
export class RevisionsModule {}
