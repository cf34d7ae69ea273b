import {
  type CornersRequestInput,
  type SizeRequestInput,
  type SweepRequestInput,
  cornersRequestSchema,
  cornersResponseSchema,
  sizeRequestSchema,
  sizeResponseSchema,
  sweepRequestSchema,
  sweepAnyResponseSchema,
} from '@channelwright/shared/schemas';
import { Body, Controller, HttpCode, Post, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import type { Account } from '../users/users.service.js';
import { ComputeService } from './compute.service.js';

/**
 * The compute API: size one device, sweep it, or run it over corners × temperatures. Any signed-in user.
 * The body is validated by the engine against the shared schema (so it is parsed once); a wrong field
 * answers 400 with its name.
 */
@ApiTags('compute')
@ApiBearerAuth()
@Controller('compute')
export class ComputeController {
  constructor(private readonly compute: ComputeService) {}

  @Post('size')
  @HttpCode(200)
  @ApiZodBody(sizeRequestSchema, 'ID, L, VDS, VSB, temperature, corner and exactly one of vov, gmId, w, vgs; PMOS voltages polarity-normalised (VSG, VSD, VBS)')
  @ApiZodResponse(200, sizeResponseSchema)
  size(@Body() body: SizeRequestInput, @CurrentUser() user: Account) {
    return this.compute.size(body, user);
  }

  @Post('sweep')
  @HttpCode(200)
  @ApiZodBody(sweepRequestSchema, 'A device and a swept parameter, holding the current (re-size at each point) or the width')
  @ApiZodResponse(200, sweepAnyResponseSchema)
  async sweep(@Body() body: SweepRequestInput, @CurrentUser() user: Account) {
    const answer = await this.compute.sweep(body, user);
    // A large sweep comes back from its worker as JSON bytes, sent as they are.
    return Buffer.isBuffer(answer) ? new StreamableFile(answer, { type: 'application/json; charset=utf-8', length: answer.length }) : answer;
  }

  @Post('corners')
  @HttpCode(200)
  @ApiZodBody(cornersRequestSchema, 'A sized device (w, l) biased by current or by voltage over corners × temperatures')
  @ApiZodResponse(200, cornersResponseSchema)
  corners(@Body() body: CornersRequestInput, @CurrentUser() user: Account) {
    return this.compute.corners(body, user);
  }
}
