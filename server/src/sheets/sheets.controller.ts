import {
  deleteQuerySchema,
  exportQuerySchema,
  sheetSchema,
  updateSheetRequestSchema,
  type DeleteQuery,
  type ExportQuery,
  type Sheet,
  type UpdateSheetRequest,
} from '@channelwright/shared/schemas';
import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { z } from 'zod';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { ProjectAccess } from '../projects/project-access.guard.js';
import type { Account } from '../users/users.service.js';
import { SheetsService } from './sheets.service.js';

/** One sheet: members read and export; designers and owners edit, delete and recompute. */
@ApiTags('sheets')
@ApiBearerAuth()
@Controller('sheets')
export class SheetsController {
  constructor(private readonly sheets: SheetsService) {}

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

  @Get(':id/export')
  @ProjectAccess('read', 'sheet')
  @ApiProduces('text/csv')
  @ApiZodResponse(200, z.string(), 'key,value metadata, an empty line, then one row per device under a header row with units')
  async export(@Param('id') id: string, @Query(new ZodValidationPipe(exportQuerySchema)) _query: ExportQuery, @Res({ passthrough: true }) response: Response): Promise<string> {
    const { fileName, csv } = await this.sheets.exportCsv(id);
    response.attachment(fileName);
    response.type('text/csv; charset=utf-8');
    return csv;
  }
}
