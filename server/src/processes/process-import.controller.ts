import {
  importProcessFieldsSchema,
  MODEL_CARD_MAX_BYTES,
  PROCESS_IMPORT_MAX_BYTES,
  modelCardCheckFieldsSchema,
  modelCardCheckSchema,
  processProfileSchema,
  type ImportProcessFields,
  type ModelCardCheck,
  type ModelCardCheckFields,
  type ProcessProfile,
} from '@channelwright/shared/schemas';
import { Body, Controller, HttpCode, Post, UploadedFile, UploadedFiles, UseInterceptors } from '@nestjs/common';
import { FileFieldsInterceptor, FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { DomainError } from '../common/errors/domain-error.js';
import { ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import type { Account } from '../users/users.service.js';
import { fileTooLarge, megabytes } from '../common/files/file-too-large.interceptor.js';
import { readUpload } from './import/read-process-file.js';
import { MaintainersOnly } from './process-maintainer.guard.js';
import { ProcessesService } from './processes.service.js';

/** The part of an upload the route reads (multer's memory storage). */
interface UploadedProcessFile {
  originalname: string;
  buffer: Buffer;
}

const LIMITS = { fileSize: MODEL_CARD_MAX_BYTES, fields: 10 };
/** Above the card limit (the larger one): 413 naming both limits. */
const FileTooLarge = fileTooLarge(`${megabytes(MODEL_CARD_MAX_BYTES)} (a model card may have ${megabytes(MODEL_CARD_MAX_BYTES)}, a process file ${megabytes(PROCESS_IMPORT_MAX_BYTES)})`);

@ApiTags('processes')
@ApiBearerAuth()
@Controller('processes')
export class ProcessImportController {
  constructor(private readonly processes: ProcessesService) {}

  @Post('import')
  @MaintainersOnly()
  @UseInterceptors(FileTooLarge, FileFieldsInterceptor([{ name: 'file', maxCount: 1 }, { name: 'card', maxCount: 1 }], { limits: { ...LIMITS, files: 2 } }))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      properties: {
        file: { type: 'string', format: 'binary', description: 'Our JSON process file or a CSV of parameter,polarity,value,unit rows (docs/processes.md), at most 1 MB; or a SPICE model card (.lib, .mod, .sp …), at most 2 MB' },
        card: { type: 'string', format: 'binary', description: 'A SPICE model card to attach to the process file, at most 2 MB' },
        mapping: { type: 'string', description: 'JSON of the card\'s mapping ({ "corners": { "TT": "tt" }, "devices": [{ "model": "n1", "polarity": "nmos" }] }); guessed from the names when absent' },
        nodeClass: { type: 'string' },
        message: { type: 'string' },
        profileId: { type: 'string', description: 'With baseVersion: import as a new version of this profile (a card alone needs them)' },
        baseVersion: { type: 'integer' },
      },
    },
  })
  @ApiZodResponse(
    201,
    processProfileSchema,
    'The imported profile or new version; 400 IMPORT_INVALID lists every problem of a process file by row and field, 400 MODEL_CARD_REFUSED / MODEL_CARD_INVALID every problem of a card by line, 400 MODEL_CARD_MAPPING_INVALID every wrong mapping entry, 413 a file too large; nothing is stored on any error (maintainers only)',
  )
  async import(
    @UploadedFiles() files: { file?: UploadedProcessFile[]; card?: UploadedProcessFile[] } | undefined,
    @Body(new ZodValidationPipe(importProcessFieldsSchema)) fields: ImportProcessFields,
    @CurrentUser() user: Account,
  ): Promise<ProcessProfile> {
    const file = files?.file?.[0];
    const cardFile = files?.card?.[0];
    if (!file && !cardFile) throw new DomainError('FILE_REQUIRED', 'Attach the process file in the multipart field "file" (or a model card in "file" or "card")', 400, 'file');
    const upload = file ? readUpload(file.buffer, file.originalname) : null;
    const attached = cardFile ? readUpload(cardFile.buffer, cardFile.originalname, 'card') : null;
    if (upload?.kind === 'card' && attached) throw new DomainError('VALIDATION_FAILED', 'Two model cards were uploaded: give one, in "file" or in "card"', 400, 'card');
    const cardText = upload?.kind === 'card' ? upload.text : attached?.kind === 'card' ? attached.text : null;
    return this.processes.import(upload?.kind === 'process' ? upload.process : null, cardText, fields, user);
  }

  @Post('model-cards/check')
  @MaintainersOnly()
  @HttpCode(200)
  @UseInterceptors(FileTooLarge, FileInterceptor('file', { limits: { ...LIMITS, files: 1 } }))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file', 'profileId'],
      properties: {
        file: { type: 'string', format: 'binary', description: 'A SPICE model card, at most 2 MB' },
        profileId: { type: 'string' },
        version: { type: 'integer', description: 'The version whose corners and flavours the mapping is for; the latest when absent' },
        mapping: { type: 'string', description: 'JSON of a mapping to check; guessed when absent' },
      },
    },
  })
  @ApiZodResponse(200, modelCardCheckSchema, 'The card parsed and its mapping (guessed, or the one given) checked against the version; nothing is stored (maintainers only)')
  check(
    @UploadedFile() file: UploadedProcessFile | undefined,
    @Body(new ZodValidationPipe(modelCardCheckFieldsSchema)) fields: ModelCardCheckFields,
    @CurrentUser() user: Account,
  ): Promise<ModelCardCheck> {
    if (!file) throw new DomainError('FILE_REQUIRED', 'Attach the model card in the multipart field "file"', 400, 'file');
    const upload = readUpload(file.buffer, file.originalname, 'card');
    return this.processes.checkModelCard(upload.kind === 'card' ? upload.text : '', fields, user);
  }
}
