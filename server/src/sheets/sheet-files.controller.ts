import { exportQuerySchema, SHEET_IMPORT_MAX_BYTES, sheetImportFieldsSchema, sheetImportResultSchema, type ExportQuery, type SheetImportFields, type SheetImportResult } from '@channelwright/shared/schemas';
import { Body, Controller, Get, HttpCode, Param, Post, Query, Res, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { z } from 'zod';
import { DomainError } from '../common/errors/domain-error.js';
import { fileTooLarge, megabytes } from '../common/files/file-too-large.interceptor.js';
import { ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { ProjectAccess } from '../projects/project-access.guard.js';
import { SheetExportService } from './exchange/sheet-export.service.js';
import { SheetImportService } from './exchange/sheet-import.service.js';

/** The sheet as files: exported by members (CSV, its metadata, SPICE lines), a CSV imported by designers and owners. */
@ApiTags('sheets')
@ApiBearerAuth()
@Controller('sheets/:id')
export class SheetFilesController {
  constructor(
    private readonly exporter: SheetExportService,
    private readonly importer: SheetImportService,
  ) {}

  @Get('export')
  @ProjectAccess('read', 'sheet')
  @ApiProduces('text/csv', 'text/plain')
  @ApiZodResponse(200, z.string(), 'csv: # metadata lines (unless metadata=none), a header with units, one row per device; csv-metadata: key,value rows; spice: a commented header and one instance line per device')
  async export(@Param('id') id: string, @Query(new ZodValidationPipe(exportQuerySchema)) query: ExportQuery, @Res({ passthrough: true }) response: Response): Promise<string> {
    const file = await this.exporter.export(id, query);
    response.attachment(file.fileName);
    response.type(file.contentType);
    return file.body;
  }

  @Post('import')
  @HttpCode(200)
  @ProjectAccess('edit', 'sheet')
  @UseInterceptors(fileTooLarge(megabytes(SHEET_IMPORT_MAX_BYTES)), FileInterceptor('file', { limits: { fileSize: SHEET_IMPORT_MAX_BYTES, files: 1, fields: 5 } }))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: {
        file: { type: 'string', format: 'binary', description: 'A CSV with the export\'s columns (units in the header, SI prefixes in cells), UTF-8 with or without BOM, comma or semicolon, at most 1 MB' },
        mode: { type: 'string', enum: ['preview', 'apply'] },
        onlyValid: { type: 'string', enum: ['true', 'false'] },
      },
    },
  })
  @ApiZodResponse(200, sheetImportResultSchema, 'preview: what would be added and updated, and every row in error; apply: written in one transaction (400 IMPORT_INVALID and nothing written when a row is in error, unless onlyValid)')
  import(
    @Param('id') id: string,
    @UploadedFile() file: { buffer: Buffer } | undefined,
    @Body(new ZodValidationPipe(sheetImportFieldsSchema)) fields: SheetImportFields,
  ): Promise<SheetImportResult> {
    if (!file) throw new DomainError('FILE_REQUIRED', 'Attach the CSV in the multipart field "file"', 400, 'file');
    return this.importer.import(id, file.buffer, fields);
  }
}

