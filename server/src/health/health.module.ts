import { Module } from '@nestjs/common';
import { AuthModule } from '../auth/auth.module.js';
import { HealthController } from './health.controller.js';
import { HealthService } from './health.service.js';
import { PublicConfigController } from './public-config.controller.js';

@Module({
  imports: [AuthModule],
  controllers: [HealthController, PublicConfigController],
  providers: [HealthService],
})
export class HealthModule {}
