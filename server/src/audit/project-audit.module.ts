import { Module } from '@nestjs/common';
import { ProjectsModule } from '../projects/projects.module.js';
import { AuditModule } from './audit.module.js';
import { ProjectAuditController } from './project-audit.controller.js';

/**
 * The audit API (GET /api/projects/:id/audit). Kept apart from AuditModule so that ProjectsModule can
 * import AuditModule to record membership changes without a cycle.
 */
@Module({
  imports: [AuditModule, ProjectsModule],
  controllers: [ProjectAuditController],
})
export class ProjectAuditModule {}
