import { type CharacterisationJob, type CharacterisationRequest, characterisationJobSchema, characterisationRequestSchema } from '@channelwright/shared/schemas';
import { Body, Controller, Delete, Get, HttpCode, Param, Post, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { MaintainersOnly } from '../processes/process-maintainer.guard.js';
import type { Account } from '../users/users.service.js';
import { CharacterisationService } from './characterisation.service.js';

/** Characterisation jobs: maintainers and admins start and cancel them; whoever may read the process follows them. */
@ApiTags('characterisations')
@ApiBearerAuth()
@Controller('characterisations')
export class CharacterisationsController {
  constructor(private readonly characterisations: CharacterisationService) {}

  @Post()
  @MaintainersOnly()
  @HttpCode(202)
  @ApiZodBody(characterisationRequestSchema, 'A process version with a model card, and optionally the devices and the grid (every grid field has a default)')
  @ApiZodResponse(202, characterisationJobSchema, 'The queued job; 200 with the existing job when the same version and grid are queued, running or done already; 400 GRID_TOO_LARGE, GRID_INVALID, DEVICE_NOT_IN_CARD, LEVEL_NOT_CHARACTERISED naming the field; 409 PROCESS_HAS_NO_MODEL_CARD (maintainers only)')
  async start(
    @Body(new ZodValidationPipe(characterisationRequestSchema)) request: CharacterisationRequest,
    @CurrentUser() user: Account,
    @Res({ passthrough: true }) response: Response,
  ): Promise<CharacterisationJob> {
    const { job, created } = await this.characterisations.request(request, user);
    if (!created) response.status(200);
    return job;
  }

  @Get(':id')
  @ApiZodResponse(200, characterisationJobSchema, 'The job with its progress, estimate and, when it failed, why')
  get(@Param('id') id: string, @CurrentUser() user: Account): Promise<CharacterisationJob> {
    return this.characterisations.get(id, user);
  }

  @Delete(':id')
  @MaintainersOnly()
  @ApiZodResponse(200, characterisationJobSchema, 'The job cancelled (nothing of it kept); 409 CHARACTERISATION_FINISHED when it had finished (maintainers only)')
  cancel(@Param('id') id: string, @CurrentUser() user: Account): Promise<CharacterisationJob> {
    return this.characterisations.cancel(id, user);
  }
}
