import { createCommentRequestSchema, revisionCommentSchema, type CreateCommentRequest, type RevisionComment } from '@channelwright/shared/schemas';
import { Body, Controller, Get, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { CurrentProjectAccess, ProjectAccess, type ProjectAccessContext } from '../projects/project-access.guard.js';
import type { Account } from '../users/users.service.js';
import { CommentsService } from './comments.service.js';

/** Comments on a revision or one of its devices: members read; owners, designers and reviewers write. */
@ApiTags('reviews')
@ApiBearerAuth()
@Controller('revisions')
export class RevisionCommentsController {
  constructor(private readonly comments: CommentsService) {}

  @Get(':id/comments')
  @ProjectAccess('read', 'revision')
  @ApiZodResponse(200, z.array(revisionCommentSchema), 'Oldest first')
  list(@CurrentProjectAccess() access: ProjectAccessContext): Promise<RevisionComment[]> {
    return this.comments.list(access.resourceId);
  }

  @Post(':id/comments')
  @ProjectAccess('read', 'revision')
  @ApiZodBody(createCommentRequestSchema)
  @ApiZodResponse(201, revisionCommentSchema, '403 COMMENT_NOT_ALLOWED for viewers; 400 DEVICE_NOT_IN_REVISION')
  add(
    @CurrentProjectAccess() access: ProjectAccessContext,
    @Body(new ZodValidationPipe(createCommentRequestSchema)) input: CreateCommentRequest,
    @CurrentUser() user: Account,
  ): Promise<RevisionComment> {
    return this.comments.add(access.resourceId, access, input, user);
  }
}
