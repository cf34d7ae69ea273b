import {
  CURVE_FILE_MAX_BYTES,
  type Extraction,
  extractionCurvesSchema,
  type ExtractionFromTableRequest,
  extractionFromTableRequestSchema,
  extractionListSchema,
  extractionSchema,
  type ExtractionSummary,
  type ExtractionUploadFields,
  extractionUploadFieldsSchema,
  type ProcessProfile,
  processProfileSchema,
  type RerunExtractionRequest,
  rerunExtractionRequestSchema,
  type SaveExtractionRequest,
  saveExtractionRequestSchema,
} from '@channelwright/shared/schemas';
import { Body, Controller, Delete, Get, Header, HttpCode, Param, Post, Res, StreamableFile, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { DomainError } from '../common/errors/domain-error.js';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { MaintainersOnly } from '../processes/process-maintainer.guard.js';
import type { Account } from '../users/users.service.js';
import { CurveFileTooLargeInterceptor } from './curve-file-too-large.interceptor.js';
import { ExtractionsService, type UploadedCurveFile } from './extractions.service.js';

/** Parameter extraction: upload curves, follow the fit, read the result, save it as a profile version (maintainers). */
@ApiTags('extractions')
@ApiBearerAuth()
@Controller('extractions')
export class ExtractionsController {
  constructor(private readonly extractions: ExtractionsService) {}

  @Post()
  @HttpCode(202)
  @UseInterceptors(CurveFileTooLargeInterceptor, FileInterceptor('file', { limits: { fileSize: CURVE_FILE_MAX_BYTES, files: 1, fields: 20 } }))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file', 'processId', 'polarity'],
      properties: {
        file: { type: 'string', format: 'binary', description: 'CSV of VGS, VDS, (VSB), (T), ID with units in the header, e.g. "VGS [V],VDS [V],VSB [V],T [°C],ID [uA]" (docs/extraction.md), at most 5 MB' },
        processId: { type: 'string' },
        version: { type: 'integer' },
        polarity: { type: 'string', enum: ['nmos', 'pmos'] },
        w: { type: 'string', description: 'When the file has no W column, e.g. "10u"' },
        l: { type: 'string' },
        fingers: { type: 'integer' },
        temperature: { type: 'string', description: '°C, when the file has no T column' },
        model: { type: 'string', enum: ['all-region', 'square-law'] },
        fixed: { type: 'string', description: 'Comma-separated parameters to hold' },
        noiseFloor: { type: 'number' },
        maxIterations: { type: 'integer' },
        minGmId: { type: 'number' },
      },
    },
  })
  @ApiZodResponse(202, extractionSchema, 'The stored upload with its queued fit; 400 CURVE_FILE_INVALID lists every problem by row and column, and nothing is stored; 413 above 5 MB')
  create(
    @UploadedFile() file: UploadedCurveFile | undefined,
    @Body(new ZodValidationPipe(extractionUploadFieldsSchema)) fields: ExtractionUploadFields,
    @CurrentUser() user: Account,
  ): Promise<Extraction> {
    if (!file) throw new DomainError('FILE_REQUIRED', 'Attach the curve file in the multipart field "file"', 400, 'file');
    return this.extractions.create(file, fields, user);
  }

  @Post('from-table')
  @HttpCode(202)
  @ApiZodBody(extractionFromTableRequestSchema, 'A process version\'s device (polarity, flavour) whose current characterised table is read at one corner, optionally fewer temperatures, lengths, VDS and VSB, and the fit\'s options')
  @ApiZodResponse(
    202,
    extractionSchema,
    'The table\'s points kept as an upload (a CSV whose "#" lines name the process, version, table, its hash and the corner) with its queued fit; 400 CORNER_NOT_IN_TABLE or VALIDATION_FAILED naming the field of a value not on the grid; 409 TABLE_NOT_CHARACTERISED / TABLE_NOT_READY without a finished table; nothing is stored on a refusal',
  )
  createFromTable(@Body(new ZodValidationPipe(extractionFromTableRequestSchema)) request: ExtractionFromTableRequest, @CurrentUser() user: Account): Promise<Extraction> {
    return this.extractions.createFromTable(request, user);
  }

  @Get()
  @ApiZodResponse(200, extractionListSchema, 'Your extractions (a process maintainer: everyone\'s), newest first')
  list(@CurrentUser() user: Account): Promise<ExtractionSummary[]> {
    return this.extractions.list(user);
  }

  @Get(':id')
  @ApiZodResponse(200, extractionSchema, 'The extraction with its state, progress and, once done, its result')
  get(@Param('id') id: string, @CurrentUser() user: Account): Promise<Extraction> {
    return this.extractions.get(id, user);
  }

  @Get(':id/points')
  @Header('Content-Type', 'application/json; charset=utf-8')
  @ApiZodResponse(200, extractionCurvesSchema, 'Every curve with the fit and the residual at each point; 409 EXTRACTION_NOT_DONE before the fit has ended')
  points(@Param('id') id: string, @CurrentUser() user: Account): Promise<string> {
    return this.extractions.curves(id, user);
  }

  @Get(':id/upload')
  @ApiResponse({ status: 200, description: 'The uploaded curve file as it came (text/csv)' })
  async upload(@Param('id') id: string, @CurrentUser() user: Account, @Res({ passthrough: true }) response: Response): Promise<StreamableFile> {
    const { fileName, content } = await this.extractions.uploadedFile(id, user);
    response.attachment(fileName);
    return new StreamableFile(content, { type: 'text/csv; charset=utf-8' });
  }

  @Delete(':id')
  @ApiZodResponse(200, extractionSchema, 'Cancelled (nothing of the fit is kept); 409 EXTRACTION_FINISHED once it has ended')
  cancel(@Param('id') id: string, @CurrentUser() user: Account): Promise<Extraction> {
    return this.extractions.cancel(id, user);
  }

  @Post(':id/rerun')
  @HttpCode(202)
  @ApiZodBody(rerunExtractionRequestSchema)
  @ApiZodResponse(202, extractionSchema, 'A new fit of the same upload with other options (absent ones as before)')
  rerun(@Param('id') id: string, @Body(new ZodValidationPipe(rerunExtractionRequestSchema)) request: RerunExtractionRequest, @CurrentUser() user: Account): Promise<Extraction> {
    return this.extractions.rerun(id, request, user);
  }

  @Post(':id/save')
  @MaintainersOnly()
  @ApiZodBody(saveExtractionRequestSchema)
  @ApiZodResponse(201, processProfileSchema, 'The base profile with its new version holding the fitted parameters (maintainers only); 409 STALE_EDIT when the profile has a newer version')
  save(@Param('id') id: string, @Body(new ZodValidationPipe(saveExtractionRequestSchema)) request: SaveExtractionRequest, @CurrentUser() user: Account): Promise<ProcessProfile> {
    return this.extractions.save(id, request, user);
  }
}
