import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module.js';
import { MailModule } from '../mail/mail.module.js';
import { DEMO_SEEDERS } from '../seed/demo-seeder.js';
import { UsersModule } from '../users/users.module.js';
import { MembersController } from './members.controller.js';
import { MembersService } from './members.service.js';
import { ProjectAccessGuard } from './project-access.guard.js';
import { ProjectAccessService } from './project-access.service.js';
import { ProjectMemberEntity } from './project-member.entity.js';
import { ProjectEntity } from './project.entity.js';
import { ProjectsDemoSeeder } from './projects-demo.seeder.js';
import { ProjectsController } from './projects.controller.js';
import { ProjectsService } from './projects.service.js';

/**
 * Projects and membership. Exports ProjectAccessService (require(user, projectId, need)) and the
 * ProjectAccessGuard behind `@ProjectAccess(need, kind?, param?)`, the one place project authorization
 * is decided; features whose routes address a resource inside a project register a
 * ProjectResourceResolver under PROJECT_RESOURCE_RESOLVERS. MembersService is exported for features
 * that need the member list (reviews, mail), and ProjectsService for a user's projects and projects' names.
 * The sheet count of each project comes from the sheets feature (PROJECT_SHEET_COUNTS).
 */
@Module({
  imports: [TypeOrmModule.forFeature([ProjectEntity, ProjectMemberEntity]), UsersModule, AuditModule, MailModule],
  controllers: [ProjectsController, MembersController],
  providers: [ProjectsService, MembersService, ProjectAccessService, ProjectAccessGuard, { provide: DEMO_SEEDERS, useClass: ProjectsDemoSeeder }],
  exports: [ProjectsService, ProjectAccessService, ProjectAccessGuard, MembersService],
})
export class ProjectsModule {}
