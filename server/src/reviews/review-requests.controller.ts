import {
  createReviewRequestSchema,
  decideReviewRequestSchema,
  reviewInboxQuerySchema,
  reviewRequestListSchema,
  reviewRequestSchema,
  type CreateReviewRequest,
  type DecideReviewRequest,
  type ReviewInboxQuery,
  type ReviewRequest,
} from '@channelwright/shared/schemas';
import { Body, Controller, Get, HttpCode, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/auth/current-user.decorator.js';
import { ApiZodBody, ApiZodResponse } from '../common/openapi/api-zod.decorators.js';
import { ZodValidationPipe } from '../common/validation/zod-validation.pipe.js';
import { CurrentProjectAccess, ProjectAccess, type ProjectAccessContext } from '../projects/project-access.guard.js';
import type { Account } from '../users/users.service.js';
import { ReviewsService } from './reviews.service.js';

/** Review requests: designers and owners ask; the assigned reviewer decides; the requester may withdraw. */
@ApiTags('reviews')
@ApiBearerAuth()
@Controller()
export class ReviewRequestsController {
  constructor(private readonly reviews: ReviewsService) {}

  @Post('revisions/:id/review-requests')
  @ProjectAccess('edit', 'revision')
  @ApiZodBody(createReviewRequestSchema)
  @ApiZodResponse(201, reviewRequestSchema, '403 SELF_REVIEW; 400 REVIEWER_NOT_ELIGIBLE; 409 REVIEW_ALREADY_OPEN, REVISION_SIGNED_OFF, REVISION_SUPERSEDED, REVISION_CHANGES_REQUESTED')
  request(
    @CurrentProjectAccess() access: ProjectAccessContext,
    @Body(new ZodValidationPipe(createReviewRequestSchema)) input: CreateReviewRequest,
    @CurrentUser() user: Account,
  ): Promise<ReviewRequest> {
    return this.reviews.request(access.resourceId, input, user);
  }

  @Get('revisions/:id/review-requests')
  @ProjectAccess('read', 'revision')
  @ApiZodResponse(200, reviewRequestListSchema, 'Every request of the revision, oldest first, with its outcome')
  forRevision(@CurrentProjectAccess() access: ProjectAccessContext): Promise<ReviewRequest[]> {
    return this.reviews.forRevision(access.resourceId);
  }

  @Get('review-requests')
  @ApiZodResponse(200, reviewRequestListSchema, 'The caller\'s inbox: ?mine=assigned (to review) or authored (asked by the caller)')
  inbox(@CurrentUser() user: Account, @Query(new ZodValidationPipe(reviewInboxQuerySchema)) query: ReviewInboxQuery): Promise<ReviewRequest[]> {
    return this.reviews.inbox(user, query);
  }

  @Get('review-requests/:id')
  @ProjectAccess('read', 'review-request')
  @ApiZodResponse(200, reviewRequestSchema)
  get(@CurrentProjectAccess() access: ProjectAccessContext): Promise<ReviewRequest> {
    return this.reviews.get(access.resourceId);
  }

  @Post('review-requests/:id/decision')
  @HttpCode(200)
  @ProjectAccess('read', 'review-request')
  @ApiZodBody(decideReviewRequestSchema)
  @ApiZodResponse(200, reviewRequestSchema, 'Only the assigned reviewer (403 NOT_ASSIGNED_REVIEWER); final (409 REVIEW_ALREADY_DECIDED, REVIEW_WITHDRAWN)')
  decide(
    @CurrentProjectAccess() access: ProjectAccessContext,
    @Body(new ZodValidationPipe(decideReviewRequestSchema)) input: DecideReviewRequest,
    @CurrentUser() user: Account,
  ): Promise<ReviewRequest> {
    return this.reviews.decide(access.resourceId, input, user);
  }

  @Post('review-requests/:id/withdraw')
  @HttpCode(200)
  @ProjectAccess('read', 'review-request')
  @ApiZodResponse(200, reviewRequestSchema, 'Only the requester (403 NOT_REQUEST_AUTHOR); 409 once decided or withdrawn')
  withdraw(@CurrentProjectAccess() access: ProjectAccessContext, @CurrentUser() user: Account): Promise<ReviewRequest> {
    return this.reviews.withdraw(access.resourceId, user);
  }
}
