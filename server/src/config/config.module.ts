import { Global, Module, type DynamicModule } from '@nestjs/common';
import type { AppConfig } from './app-config.js';
import { APP_CONFIG, AppConfigService } from './app-config.service.js';

/** The one global module: every feature reads its settings through AppConfigService. */
@Global()
@Module({})
export class ConfigModule {
  static forRoot(config: AppConfig): DynamicModule {
    return {
      module: ConfigModule,
      providers: [{ provide: APP_CONFIG, useValue: config }, AppConfigService],
      exports: [AppConfigService],
    };
  }
}
