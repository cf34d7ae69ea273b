import { publicConfigSchema, type PublicConfig } from '@channelwright/shared/schemas';
import { Controller, Get } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Public } from '../common/auth/public.decorator.js';
import { ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { AuthService } from '../auth/auth.service.js';
import { AppConfigService } from '../config/app-config.service.js';
import { SERVER_VERSION } from '../config/paths.js';

/** What the client needs before sign-in: whether to offer sign-up, whether the demo data is on. */
@ApiTags('health')
@Controller('config')
export class PublicConfigController {
  constructor(
    private readonly config: AppConfigService,
    private readonly auth: AuthService,
  ) {}

  @Public()
  @Get()
  @ApiZodResponse(200, publicConfigSchema, 'Public settings of this server')
  async get(): Promise<PublicConfig> {
    return { signupEnabled: await this.auth.isSignupOpen(), demo: this.config.seedDemo, version: SERVER_VERSION };
  }
}
