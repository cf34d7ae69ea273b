import { importProcessFieldsSchema, PROCESS_IMPORT_MAX_BYTES, processProfileSchema, type ImportProcessFields, type ProcessProfile } from '@channelwright/shared/schemas';
import { Body, Controller, Post, UploadedFile, UseInterceptors } from '@nestjs/common';
import { FileInterceptor } from '@nestjs/platform-express';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { DomainError } from '../common/errors/domain-error.js';
import { ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import type { Account } from '../users/users.service.js';
import { FileTooLargeInterceptor } from '../common/files/file-too-large.interceptor.js';
import { readProcessFile } from './import/read-process-file.js';
import { MaintainersOnly } from './process-maintainer.guard.js';
import { ProcessesService } from './processes.service.js';

/** The part of an upload the route reads (multer's memory storage). */
interface UploadedProcessFile {
  originalname: string;
  buffer: Buffer;
}

@ApiTags('processes')
@ApiBearerAuth()
@Controller('processes')
export class ProcessImportController {
  constructor(private readonly processes: ProcessesService) {}

  @Post('import')
  @MaintainersOnly()
  @UseInterceptors(FileTooLargeInterceptor, FileInterceptor('file', { limits: { fileSize: PROCESS_IMPORT_MAX_BYTES, files: 1, fields: 10 } }))
  @ApiConsumes('multipart/form-data')
  @ApiBody({
    schema: {
      type: 'object',
      required: ['file'],
      properties: {
        file: { type: 'string', format: 'binary', description: 'Our JSON process file, or a CSV of parameter,polarity,value,unit rows (docs/processes.md), at most 1 MB' },
        nodeClass: { type: 'string' },
        message: { type: 'string' },
        profileId: { type: 'string', description: 'With baseVersion: import as a new version of this profile' },
        baseVersion: { type: 'integer' },
      },
    },
  })
  @ApiZodResponse(201, processProfileSchema, 'The imported profile; 400 IMPORT_INVALID lists every problem by row and field, and nothing is stored (maintainers only)')
  async import(
    @UploadedFile() file: UploadedProcessFile | undefined,
    @Body(new ZodValidationPipe(importProcessFieldsSchema)) fields: ImportProcessFields,
    @CurrentUser() user: Account,
  ): Promise<ProcessProfile> {
    if (!file) throw new DomainError('FILE_REQUIRED', 'Attach the process file in the multipart field "file"', 400, 'file');
    return this.processes.import(readProcessFile(file.buffer, file.originalname), fields, user);
  }
}
