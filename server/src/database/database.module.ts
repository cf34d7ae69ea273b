import { Global, Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AppConfigService } from '../config/app-config.service.js';
import { dataSourceOptions } from './data-source-options.js';
import { DatabaseHealth } from './database-health.js';
import { UnitOfWork } from './unit-of-work.js';

/**
 * The root connection: entities come from each feature's forFeature, migrations run at start-up. Global,
 * like configuration: every feature opens its cross-module transactions through UnitOfWork, and only this
 * module touches the DataSource.
 */
@Global()
@Module({
  imports: [
    TypeOrmModule.forRootAsync({
      inject: [AppConfigService],
      useFactory: (config: AppConfigService) => ({
        ...dataSourceOptions(config),
        autoLoadEntities: true,
        migrationsRun: true,
      }),
    }),
  ],
  providers: [UnitOfWork, DatabaseHealth],
  exports: [UnitOfWork, DatabaseHealth],
})
export class DatabaseModule {}
