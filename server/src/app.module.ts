import { Module, type DynamicModule } from '@nestjs/common';
import { AuditModule } from './audit/audit.module.js';
import { AuthModule } from './auth/auth.module.js';
import { CharacterisationModule } from './characterisation/characterisation.module.js';
import { ComputeModule } from './compute/compute.module.js';
import { serveClient } from './common/static/serve-client.js';
import type { AppConfig } from './config/app-config.js';
import { ConfigModule } from './config/config.module.js';
import { DatabaseModule } from './database/database.module.js';
import { ExtractionsModule } from './extractions/extractions.module.js';
import { HealthModule } from './health/health.module.js';
import { MailModule } from './mail/mail.module.js';
import { ProcessesModule } from './processes/processes.module.js';
import { ProjectAuditModule } from './project-audit/project-audit.module.js';
import { ProjectsModule } from './projects/projects.module.js';
import { ReviewsModule } from './reviews/reviews.module.js';
import { RevisionsModule } from './revisions/revisions.module.js';
import { SeedModule } from './seed/seed.module.js';
import { SheetsModule } from './sheets/sheets.module.js';
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
        CharacterisationModule,
        SeedModule,
        ProcessesModule,
        MailModule,
        AuditModule,
        ProjectAuditModule,
        ProjectsModule,
        SheetsModule,
        RevisionsModule,
        ReviewsModule,
        ExtractionsModule,
        ...serveClient(config.clientDist),
      ],
    };
  }
}
