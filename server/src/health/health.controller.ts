import { healthResponseSchema, type HealthResponse } from '@channelwright/shared/schemas';
import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Public } from '../common/auth/public.decorator.js';
import { ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { HealthService } from './health.service.js';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly health: HealthService) {}

  @Public()
  @Get()
  @ApiZodResponse(200, healthResponseSchema, 'The server and its database answer')
  check(): Promise<HealthResponse> {
    return this.health.check();
  }
}
