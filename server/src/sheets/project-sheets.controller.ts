import { createSheetRequestSchema, sheetListSchema, sheetSchema, type CreateSheetRequest, type Sheet, type SheetSummary } from '@channelwright/shared/schemas';
import { Body, Controller, Get, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { CurrentProjectAccess, ProjectAccess, type ProjectAccessContext } from '../projects/project-access.guard.js';
import type { Account } from '../users/users.service.js';
import { SheetsService } from './sheets.service.js';

/** The sheets of a project: members read, designers and owners create. */
@ApiTags('sheets')
@ApiBearerAuth()
@Controller('projects/:id/sheets')
export class ProjectSheetsController {
  constructor(private readonly sheets: SheetsService) {}

  @Get()
  @ProjectAccess('read')
  @ApiZodResponse(200, sheetListSchema)
  list(@CurrentProjectAccess() access: ProjectAccessContext): Promise<SheetSummary[]> {
    return this.sheets.list(access.projectId);
  }

  @Post()
  @ProjectAccess('edit')
  @ApiZodBody(createSheetRequestSchema)
  @ApiZodResponse(201, sheetSchema, 'The new, empty sheet on the process version asked for (the latest when absent)')
  create(
    @CurrentProjectAccess() access: ProjectAccessContext,
    @Body(new ZodValidationPipe(createSheetRequestSchema)) request: CreateSheetRequest,
    @CurrentUser() user: Account,
  ): Promise<Sheet> {
    return this.sheets.create(access.projectId, request, user);
  }
}
