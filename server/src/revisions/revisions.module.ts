import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module.js';
import { PROJECT_RESOURCE_RESOLVERS } from '../projects/project-resource-resolver.js';
import { ProjectsModule } from '../projects/projects.module.js';
import { ReviewRequestEntity } from '../reviews/review-request.entity.js';
import { SheetsModule } from '../sheets/sheets.module.js';
import { RevisionDeviceEntity } from './revision-device.entity.js';
import { RevisionProjectResolver } from './revision-project.resolver.js';
import { RevisionReader } from './revision-reader.js';
import { RevisionEntity } from './revision.entity.js';
import { RevisionsController } from './revisions.controller.js';
import { RevisionsService } from './revisions.service.js';

/**
 * Immutable revisions of sheets with their content hash. Exports RevisionReader and RevisionsService
 * for the reviews. Review requests are read here only to derive a revision's state.
 */
@Module({
  imports: [TypeOrmModule.forFeature([RevisionEntity, RevisionDeviceEntity, ReviewRequestEntity]), ProjectsModule, SheetsModule, AuditModule],
  controllers: [RevisionsController],
  providers: [RevisionsService, RevisionReader, { provide: PROJECT_RESOURCE_RESOLVERS, useClass: RevisionProjectResolver }],
  exports: [RevisionsService, RevisionReader],
})
export class RevisionsModule {}
