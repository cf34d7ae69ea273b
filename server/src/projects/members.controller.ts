import {
  addMemberRequestSchema,
  projectMemberListSchema,
  projectMemberSchema,
  updateMemberRequestSchema,
  type AddMemberRequest,
  type ProjectMember,
  type UpdateMemberRequest,
} from '@channelwright/shared/schemas';
import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { MembersService } from './members.service.js';
import { CurrentProjectAccess, ProjectAccess, type ProjectAccessContext } from './project-access.guard.js';

/** Members of a project: members read the list; owners (and admins) add, re-role and remove. */
@ApiTags('projects')
@ApiBearerAuth()
@Controller('projects/:id/members')
export class MembersController {
  constructor(private readonly members: MembersService) {}

  @Get()
  @ProjectAccess('read')
  @ApiZodResponse(200, projectMemberListSchema)
  list(@CurrentProjectAccess() access: ProjectAccessContext): Promise<ProjectMember[]> {
    return this.members.list(access.projectId);
  }

  @Post()
  @ProjectAccess('manage')
  @ApiZodBody(addMemberRequestSchema)
  @ApiZodResponse(201, projectMemberSchema, 'The same answer whether or not the address has an account (no account enumeration): one with an active account is added and mailed, any other address is mailed how to get one; 409 MEMBER_EXISTS')
  add(@CurrentProjectAccess() access: ProjectAccessContext, @Body(new ZodValidationPipe(addMemberRequestSchema)) request: AddMemberRequest): Promise<ProjectMember> {
    return this.members.add(access.projectId, request);
  }

  @Patch(':userId')
  @ProjectAccess('manage')
  @ApiZodBody(updateMemberRequestSchema)
  @ApiZodResponse(200, projectMemberSchema, '409 LAST_OWNER when the project would have no owner')
  update(
    @CurrentProjectAccess() access: ProjectAccessContext,
    @Param('userId') userId: string,
    @Body(new ZodValidationPipe(updateMemberRequestSchema)) request: UpdateMemberRequest,
  ): Promise<ProjectMember> {
    return this.members.updateRole(access.projectId, userId, request.role);
  }

  @Delete(':userId')
  @ProjectAccess('manage')
  @HttpCode(204)
  @ApiZodResponse(204, z.null(), '409 LAST_OWNER when this is the last owner')
  remove(@CurrentProjectAccess() access: ProjectAccessContext, @Param('userId') userId: string): Promise<void> {
    return this.members.remove(access.projectId, userId);
  }
}
