import {
  createProcessRequestSchema,
  deprecateProcessRequestSchema,
  listProcessesQuerySchema,
  processDiffQuerySchema,
  processDiffSchema,
  processFileSchema,
  processProfileSchema,
  processProfileSummarySchema,
  processVersionQuerySchema,
  processVersionSummarySchema,
  storedModelCardSchema,
  updateProcessRequestSchema,
  type CreateProcessRequest,
  type DeprecateProcessRequest,
  type ListProcessesQuery,
  type ProcessDiff,
  type ProcessDiffQuery,
  type ProcessFile,
  type ProcessProfile,
  type ProcessProfileSummary,
  type ProcessVersionQuery,
  type ProcessVersionSummary,
  type StoredModelCard,
  type UpdateProcessRequest,
} from '@channelwright/shared/schemas';
import { Body, Controller, Delete, Get, HttpCode, Param, Post, Put, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { z } from 'zod';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import type { Account } from '../users/users.service.js';
import { MaintainersOnly } from './process-maintainer.guard.js';
import { ProcessesService } from './processes.service.js';

/** The library: each reads what ProcessVisibility lets them see; admins and process maintainers write. */
@ApiTags('processes')
@ApiBearerAuth()
@Controller('processes')
export class ProcessesController {
  constructor(private readonly processes: ProcessesService) {}

  @Get()
  @ApiZodResponse(200, z.array(processProfileSummarySchema), 'The latest version of every profile, by name')
  list(@Query(new ZodValidationPipe(listProcessesQuerySchema)) query: ListProcessesQuery, @CurrentUser() user: Account): Promise<ProcessProfileSummary[]> {
    return this.processes.list(query, user);
  }

  @Post()
  @MaintainersOnly()
  @ApiZodBody(createProcessRequestSchema)
  @ApiZodResponse(201, processProfileSchema, 'The new profile with its version 1 (maintainers only)')
  create(@Body(new ZodValidationPipe(createProcessRequestSchema)) request: CreateProcessRequest, @CurrentUser() user: Account): Promise<ProcessProfile> {
    return this.processes.create(request, user);
  }

  @Get(':id')
  @ApiZodResponse(200, processProfileSchema, 'The profile with one version in full (?version=, else the latest)')
  get(@Param('id') id: string, @Query(new ZodValidationPipe(processVersionQuerySchema)) query: ProcessVersionQuery, @CurrentUser() user: Account): Promise<ProcessProfile> {
    return this.processes.get(id, user, query.version);
  }

  @Put(':id')
  @MaintainersOnly()
  @ApiZodBody(updateProcessRequestSchema)
  @ApiZodResponse(200, processProfileSchema, 'The profile with its new version; 409 STALE_EDIT when baseVersion is not the latest (maintainers only)')
  update(
    @Param('id') id: string,
    @Body(new ZodValidationPipe(updateProcessRequestSchema)) request: UpdateProcessRequest,
    @CurrentUser() user: Account,
  ): Promise<ProcessProfile> {
    return this.processes.update(id, request, user);
  }

  @Delete(':id')
  @MaintainersOnly()
  @HttpCode(204)
  @ApiZodResponse(204, z.null(), 'Deleted; 409 PROCESS_IN_USE when anything refers to it (maintainers only)')
  remove(@Param('id') id: string): Promise<void> {
    return this.processes.remove(id);
  }

  @Get(':id/versions')
  @ApiZodResponse(200, z.array(processVersionSummarySchema), 'Every version, newest first')
  versions(@Param('id') id: string, @CurrentUser() user: Account): Promise<ProcessVersionSummary[]> {
    return this.processes.versions(id, user);
  }

  @Get(':id/diff')
  @ApiZodResponse(200, processDiffSchema, 'Which values changed from version `from` to version `to`')
  diff(@Param('id') id: string, @Query(new ZodValidationPipe(processDiffQuerySchema)) query: ProcessDiffQuery, @CurrentUser() user: Account): Promise<ProcessDiff> {
    return this.processes.diff(id, user, query.from, query.to);
  }

  @Post(':id/deprecate')
  @MaintainersOnly()
  @HttpCode(200)
  @ApiZodBody(deprecateProcessRequestSchema)
  @ApiZodResponse(200, processProfileSchema, 'The profile, deprecated (or restored with { "deprecated": false }) (maintainers only)')
  deprecate(
    @Param('id') id: string,
    @Body(new ZodValidationPipe(deprecateProcessRequestSchema)) request: DeprecateProcessRequest,
    @CurrentUser() user: Account,
  ): Promise<ProcessProfile> {
    return this.processes.setDeprecated(id, request.deprecated, user);
  }

  @Get(':id/model-card')
  @ApiZodResponse(200, storedModelCardSchema, 'The model card of one version (?version=, else the latest) as Channelwright re-emitted it, with its mapping; 404 PROCESS_HAS_NO_MODEL_CARD without one')
  modelCard(@Param('id') id: string, @Query(new ZodValidationPipe(processVersionQuerySchema)) query: ProcessVersionQuery, @CurrentUser() user: Account): Promise<StoredModelCard> {
    return this.processes.modelCard(id, user, query.version);
  }

  @Get(':id/export')
  @ApiZodResponse(200, processFileSchema, 'One version (?version=, else the latest) as a Channelwright process file')
  async export(
    @Param('id') id: string,
    @Query(new ZodValidationPipe(processVersionQuerySchema)) query: ProcessVersionQuery,
    @Res({ passthrough: true }) response: Response,
    @CurrentUser() user: Account,
  ): Promise<ProcessFile> {
    const { fileName, file } = await this.processes.exportFile(id, user, query.version);
    response.attachment(fileName);
    return file;
  }
}
