import { Module, type DynamicModule } from '@nestjs/common';
import { AuthModule } from './auth/auth.module.js';
import { ComputeModule } from './compute/compute.module.js';
import { serveClient } from './common/static/serve-client.js';
import type { AppConfig } from './config/app-config.js';
import { ConfigModule } from './config/config.module.js';
import { DatabaseModule } from './database/database.module.js';
import { HealthModule } from './health/health.module.js';
import { SeedModule } from './seed/seed.module.js';
import { UsersModule } from './users/users.module.js';

/** The whole server, configured from one parsed AppConfig. Feature modules join the imports here. */
@Module({})
export class AppModule {
  static forRoot(config: AppConfig): DynamicModule {
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot(config),
        DatabaseModule,
        UsersModule,
        AuthModule,
        HealthModule,
        ComputeModule,
        SeedModule,
        ...serveClient(config.clientDist),
      ],
    };
  }
}
