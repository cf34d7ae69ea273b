import {
  deleteQuerySchema,
  migrateSheetRequestSchema,
  sheetMigrationSchema,
  sheetSchema,
  updateSheetRequestSchema,
  type DeleteQuery,
  type MigrateSheetRequest,
  type Sheet,
  type SheetMigration,
  type UpdateSheetRequest,
} from '@channelwright/shared/schemas';
import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { ProjectAccess } from '../projects/project-access.guard.js';
import type { Account } from '../users/users.service.js';
import { SheetMigrationService } from './migration/sheet-migration.service.js';
import { SheetsService } from './sheets.service.js';

/** One sheet: members read; designers and owners edit, delete, recompute and migrate it to another process. */
@ApiTags('sheets')
@ApiBearerAuth()
@Controller('sheets')
export class SheetsController {
  constructor(
    private readonly sheets: SheetsService,
    private readonly migration: SheetMigrationService,
  ) {}

  @Get(':id')
  @ProjectAccess('read', 'sheet')
  @ApiZodResponse(200, sheetSchema, 'The sheet with its devices and totals; 404 SHEET_NOT_FOUND for outsiders')
  get(@Param('id') id: string): Promise<Sheet> {
    return this.sheets.get(id);
  }

  @Patch(':id')
  @ProjectAccess('edit', 'sheet')
  @ApiZodBody(updateSheetRequestSchema)
  @ApiZodResponse(200, sheetSchema, 'A move to another process version marks results stale until recompute; 409 STALE_EDIT')
  update(@Param('id') id: string, @Body(new ZodValidationPipe(updateSheetRequestSchema)) request: UpdateSheetRequest, @CurrentUser() user: Account): Promise<Sheet> {
    return this.sheets.update(id, request, user);
  }

  @Delete(':id')
  @ProjectAccess('edit', 'sheet')
  @HttpCode(204)
  @ApiZodResponse(204, z.null(), 'Deletes the sheet and its devices; ?version= makes a stale delete a 409')
  remove(@Param('id') id: string, @Query(new ZodValidationPipe(deleteQuerySchema)) query: DeleteQuery): Promise<void> {
    return this.sheets.remove(id, query.version);
  }

  @Post(':id/recompute')
  @ProjectAccess('edit', 'sheet')
  @HttpCode(200)
  @ApiZodResponse(200, sheetSchema, 'Every device recomputed with this engine on the sheet\'s process version, in one transaction')
  recompute(@Param('id') id: string): Promise<Sheet> {
    return this.sheets.recompute(id);
  }

  @Post(':id/migrate')
  @HttpCode(200)
  @ProjectAccess('edit', 'sheet')
  @ApiZodBody(migrateSheetRequestSchema)
  @ApiZodResponse(200, sheetMigrationSchema, 'Every device re-solved on another process, side by side with the source; a new sheet of the project unless preview (the source is never changed)')
  migrate(@Param('id') id: string, @Body(new ZodValidationPipe(migrateSheetRequestSchema)) request: MigrateSheetRequest, @CurrentUser() user: Account): Promise<SheetMigration> {
    return this.migration.migrate(id, request, user);
  }
}
