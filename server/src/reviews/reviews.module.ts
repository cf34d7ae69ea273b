import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AuditModule } from '../audit/audit.module.js';
import { MailModule } from '../mail/mail.module.js';
import { PROJECT_RESOURCE_RESOLVERS } from '../projects/project-resource-resolver.js';
import { ProjectsModule } from '../projects/projects.module.js';
import { REVISION_REVIEWS } from '../revisions/revision-reviews.js';
import { RevisionsModule } from '../revisions/revisions.module.js';
import { SheetsModule } from '../sheets/sheets.module.js';
import { UsersModule } from '../users/users.module.js';
import { CommentsService } from './comments.service.js';
import { ReviewRequestProjectResolver } from './review-request-project.resolver.js';
import { ReviewRequestReader } from './review-request-reader.js';
import { ReviewRequestEntity } from './review-request.entity.js';
import { ReviewRequestsController } from './review-requests.controller.js';
import { ReviewsService } from './reviews.service.js';
import { RevisionCommentEntity } from './revision-comment.entity.js';
import { RevisionCommentsController } from './revision-comments.controller.js';
import { SheetReviewStateController } from './sheet-review-state.controller.js';
import { SheetReviewStateService } from './sheet-review-state.service.js';

/**
 * Review requests, decisions, comments and the sheet's review state; every step audited and mailed. Tells
 * the revisions their review requests (REVISION_REVIEWS), from which a revision's state is derived.
 */
@Module({
  imports: [TypeOrmModule.forFeature([ReviewRequestEntity, RevisionCommentEntity]), UsersModule, RevisionsModule, ProjectsModule, SheetsModule, AuditModule, MailModule],
  controllers: [ReviewRequestsController, RevisionCommentsController, SheetReviewStateController],
  providers: [
    ReviewsService,
    ReviewRequestReader,
    CommentsService,
    SheetReviewStateService,
    { provide: PROJECT_RESOURCE_RESOLVERS, useClass: ReviewRequestProjectResolver },
    { provide: REVISION_REVIEWS, useExisting: ReviewRequestReader },
  ],
})
export class ReviewsModule {}
