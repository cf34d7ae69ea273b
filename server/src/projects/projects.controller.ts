import {
  createProjectRequestSchema,
  projectListSchema,
  projectSchema,
  updateProjectRequestSchema,
  type CreateProjectRequest,
  type Project,
  type UpdateProjectRequest,
} from '@channelwright/shared/schemas';
import { Body, Controller, Get, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import type { Account } from '../users/users.service.js';
import { CurrentProjectAccess, ProjectAccess, type ProjectAccessContext } from './project-access.guard.js';
import { ProjectsService } from './projects.service.js';

/** Projects: everyone signed in creates one (and owns it); members read; owners (and admins) rename. */
@ApiTags('projects')
@ApiBearerAuth()
@Controller('projects')
export class ProjectsController {
  constructor(private readonly projects: ProjectsService) {}

  @Get()
  @ApiZodResponse(200, projectListSchema)
  list(@CurrentUser() user: Account): Promise<Project[]> {
    return this.projects.list(user);
  }

  @Post()
  @ApiZodBody(createProjectRequestSchema)
  @ApiZodResponse(201, projectSchema, 'The new project; the caller is its owner')
  create(@Body(new ZodValidationPipe(createProjectRequestSchema)) request: CreateProjectRequest, @CurrentUser() user: Account): Promise<Project> {
    return this.projects.create(request, user);
  }

  @Get(':id')
  @ProjectAccess('read')
  @ApiZodResponse(200, projectSchema, '404 PROJECT_NOT_FOUND for outsiders')
  get(@CurrentProjectAccess() access: ProjectAccessContext): Promise<Project> {
    return this.projects.get(access.projectId, access.role);
  }

  @Patch(':id')
  @ProjectAccess('manage')
  @ApiZodBody(updateProjectRequestSchema)
  @ApiZodResponse(200, projectSchema, 'Owners and admins; 409 STALE_EDIT when version is not the stored one')
  update(@CurrentProjectAccess() access: ProjectAccessContext, @Body(new ZodValidationPipe(updateProjectRequestSchema)) request: UpdateProjectRequest): Promise<Project> {
    return this.projects.update(access, request);
  }
}
