import { Module } from '@nestjs/common';
import { AuditModule } from '../audit/audit.module.js';
import { ProjectsModule } from '../projects/projects.module.js';
import { SheetsModule } from '../sheets/sheets.module.js';
import { ProjectAuditController } from './project-audit.controller.js';

/**
 * The audit API (GET /api/projects/:id/audit): the project's events and those of the process profiles its
 * sheets use. Above audit, projects and sheets, so none of them needs another to answer it.
 */
@Module({
  imports: [AuditModule, ProjectsModule, SheetsModule],
  controllers: [ProjectAuditController],
})
export class ProjectAuditModule {}
