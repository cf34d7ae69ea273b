import { auditEventSchema, auditQuerySchema, type AuditEvent, type AuditQuery } from '@channelwright/shared/schemas';
import { Controller, Get, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { z } from 'zod';
import { ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { CurrentProjectAccess, ProjectAccess, type ProjectAccessContext } from '../projects/project-access.guard.js';
import { auditCsv } from '../audit/audit-csv.js';
import { AuditService } from '../audit/audit.service.js';
import { SheetsService } from '../sheets/sheets.service.js';

/** A project's audit trail: every member reads it (outsiders get 404), as JSON or as a CSV download. */
@ApiTags('audit')
@ApiBearerAuth()
@Controller('projects')
export class ProjectAuditController {
  constructor(
    private readonly audit: AuditService,
    private readonly sheets: SheetsService,
  ) {}

  @Get(':id/audit')
  @ProjectAccess('read')
  @ApiProduces('application/json', 'text/csv')
  @ApiZodResponse(200, z.array(auditEventSchema), 'Newest first, filtered; ?format=csv downloads the same rows as CSV')
  async list(
    @CurrentProjectAccess() access: ProjectAccessContext,
    @Query(new ZodValidationPipe(auditQuerySchema)) query: AuditQuery,
    @Res({ passthrough: true }) response: Response,
  ): Promise<AuditEvent[] | string> {
    // Installation-wide process-version events count for every project with a sheet on that profile.
    const profileIds = await this.sheets.profileIdsOfProject(access.projectId);
    const events = await this.audit.listForProject(access.projectId, profileIds, query);
    if (query.format === 'json') return events;
    response.attachment(`audit-${access.projectId}.csv`);
    response.type('text/csv; charset=utf-8');
    return auditCsv(events);
  }
}
