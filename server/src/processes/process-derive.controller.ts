import { deriveProcessRequestSchema, deriveProcessResponseSchema, type DeriveProcessRequest, type DeriveProcessResponse } from '@channelwright/shared/schemas';
import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { deriveProcess } from './derive/derive-process.js';

/** The physics helper: Cox, γ, 2φF (and VT0 from a flat-band voltage) from tox and doping, for anyone signed in. */
@ApiTags('processes')
@ApiBearerAuth()
@Controller('processes')
export class ProcessDeriveController {
  @Post('derive')
  @HttpCode(200)
  @ApiZodBody(deriveProcessRequestSchema)
  @ApiZodResponse(200, deriveProcessResponseSchema, 'Derived parameters with the equations and the constants and their sources')
  derive(@Body(new ZodValidationPipe(deriveProcessRequestSchema)) request: DeriveProcessRequest): DeriveProcessResponse {
    return deriveProcess(request);
  }
}
