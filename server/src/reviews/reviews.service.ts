import { REVIEWING_PROJECT_ROLES, type CreateReviewRequest, type DecideReviewRequest, type ReviewRequest } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { AuditService } from '../audit/audit.service.js';
import { conflict, DomainError, forbidden } from '../common/errors/domain-error.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { MailService } from '../mail/mail.service.js';
import { ProjectAccessService } from '../projects/project-access.service.js';
import { revisionHash } from '../revisions/revision-content.js';
import { RevisionReader } from '../revisions/revision-reader.js';
import { revisionLabel, type LoadedRevision } from '../revisions/revision-response.js';
import { revisionStateOf } from '../revisions/revision-state.js';
import { UsersService, type Account } from '../users/users.service.js';
import { decisionNotice, reviewRequestedNotice, withdrawnNotice, type ReviewFacts } from './review-notices.js';
import { ReviewRequestReader } from './review-request-reader.js';
import { toReviewRequest } from './review-request-response.js';
import { ReviewRequestEntity } from './review-request.entity.js';

/**
 * Review requests and decisions. Each step is one transaction holding the change, its audit row and
 * its mail (delivered after commit). Callers have checked that the caller may see the project.
 */
@Injectable()
export class ReviewsService {
  constructor(
    private readonly unitOfWork: UnitOfWork,
    private readonly users: UsersService,
    private readonly revisions: RevisionReader,
    private readonly requests: ReviewRequestReader,
    private readonly access: ProjectAccessService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
  ) {}

  /** Asks a reviewer (a member with the reviewer or owner role, not the author) to review a revision. */
  async request(revisionId: string, input: CreateReviewRequest, requester: Account): Promise<ReviewRequest> {
    const id = await this.unitOfWork.run(async (manager) => {
      const revision = await this.revisions.load(revisionId, manager);
      await this.assertReviewable(manager, revision);
      const reviewer = await this.eligibleReviewer(manager, revision, input, requester);
      const repository = manager.getRepository(ReviewRequestEntity);
      const request = await repository.save(
        repository.create({ revisionId, projectId: revision.revision.projectId, requestedById: requester.id, reviewerId: reviewer.id, note: input.note, state: 'open', createdAt: new Date() }),
      );
      const facts = await this.facts(manager, revision);
      await this.audit.record(manager, {
        actor: requester,
        projectId: request.projectId,
        entityType: 'review-request',
        entityId: request.id,
        action: 'review.requested',
        after: { revisionId, revision: facts.label, reviewerId: reviewer.id, reviewer: reviewer.email, note: input.note, state: 'open' },
        summary: `Asked ${reviewer.displayName} to review ${facts.sheetName} ${facts.label}`,
      });
      await this.mail.notify(reviewRequestedNotice(reviewer.email, requester.displayName, facts, input.note), manager);
      return request.id;
    });
    return this.get(id);
  }

  /** The requester takes an open request back; 409 once it is decided or withdrawn. */
  async withdraw(requestId: string, user: Account): Promise<ReviewRequest> {
    await this.unitOfWork.run(async (manager) => {
      const { request, revision } = await this.requests.load(requestId, manager);
      if (request.requestedById !== user.id) throw forbidden('NOT_REQUEST_AUTHOR', 'Only the person who asked for this review may withdraw it');
      assertOpen(request);
      await this.close(manager, request, { state: 'withdrawn', decidedAt: new Date() });
      const facts = await this.facts(manager, revision);
      await this.audit.record(manager, {
        actor: user,
        projectId: request.projectId,
        entityType: 'review-request',
        entityId: request.id,
        action: 'review.withdrawn',
        before: { state: 'open' },
        after: { state: 'withdrawn' },
        summary: `Withdrew the review request for ${facts.sheetName} ${facts.label}`,
      });
      const reviewer = (await this.users.cards([request.reviewerId], manager)).get(request.reviewerId);
      if (reviewer) await this.mail.notify(withdrawnNotice(reviewer.email, user.displayName, facts), manager);
    });
    return this.get(requestId);
  }

  /**
   * The assigned reviewer decides, once. Approval re-verifies the revision's hash and signs it off with
   * that hash; request-changes sends it back. Mail goes to the requester and, when another person,
   * the revision's author.
   */
  async decide(requestId: string, input: DecideReviewRequest, reviewer: Account): Promise<ReviewRequest> {
    await this.unitOfWork.run(async (manager) => {
      const { request, revision } = await this.requests.load(requestId, manager);
      if (request.reviewerId !== reviewer.id) throw forbidden('NOT_ASSIGNED_REVIEWER', 'Only the reviewer this request is assigned to may decide it');
      assertOpen(request);
      const role = await this.access.roleOf(request.projectId, reviewer.id, manager);
      if (role === null || !REVIEWING_PROJECT_ROLES.includes(role)) {
        throw forbidden('REVIEWER_NOT_ELIGIBLE', 'You no longer hold the reviewer or owner role in this project');
      }
      const approved = input.decision === 'approve';
      let signedHash: string | null = null;
      if (approved) {
        const computed = revisionHash(revision.revision, await this.revisions.devices(revision.revision.id, manager));
        if (computed !== revision.revision.hash) {
          throw conflict('REVISION_HASH_MISMATCH', `${revisionLabel(revision.revision.number)} no longer matches its hash: it cannot be signed off`);
        }
        signedHash = computed;
      }
      const state = approved ? 'approved' : 'changes-requested';
      await this.close(manager, request, { state, decidedAt: new Date(), decisionComment: input.comment, signedHash });
      const facts = await this.facts(manager, revision);
      await this.audit.record(manager, {
        actor: reviewer,
        projectId: request.projectId,
        entityType: 'review-request',
        entityId: request.id,
        action: approved ? 'review.approved' : 'review.changes-requested',
        before: { state: 'open' },
        after: { state, comment: input.comment, revisionId: revision.revision.id, revision: facts.label, ...(signedHash && { signedHash }) },
        summary: approved ? `Signed off ${facts.sheetName} ${facts.label}` : `Requested changes to ${facts.sheetName} ${facts.label}`,
      });
      const people = await this.users.cards([request.requestedById, revision.revision.authorId], manager);
      const recipients = new Set([...people.values()].map((person) => person.email));
      for (const to of recipients) await this.mail.notify(decisionNotice(to, reviewer.displayName, facts, approved, input.comment), manager);
    });
    return this.get(requestId);
  }

  async get(id: string): Promise<ReviewRequest> {
    return toReviewRequest(await this.requests.load(id));
  }

  async forRevision(revisionId: string): Promise<ReviewRequest[]> {
    return (await this.requests.forRevision(revisionId)).map(toReviewRequest);
  }

  async inbox(user: Account, query: Parameters<ReviewRequestReader['inbox']>[1]): Promise<ReviewRequest[]> {
    return (await this.requests.inbox(user, query)).map(toReviewRequest);
  }

  /** A new request only for the sheet's latest revision, while it is a draft. */
  private async assertReviewable(manager: EntityManager, { revision, requests }: LoadedRevision): Promise<void> {
    const label = revisionLabel(revision.number);
    const state = revisionStateOf(requests);
    if (state === 'signed-off') throw conflict('REVISION_SIGNED_OFF', `${label} is already signed off`);
    if (state === 'in-review') throw conflict('REVIEW_ALREADY_OPEN', `${label} is already in review; withdraw that request first`);
    if (state === 'changes-requested') throw conflict('REVISION_CHANGES_REQUESTED', `Changes were requested on ${label}: edit the sheet and freeze a new revision`);
    const newest = await this.revisions.newestNumber(revision.sheetId, manager);
    if (newest !== null && newest > revision.number) throw conflict('REVISION_SUPERSEDED', `${label} has been superseded by ${revisionLabel(newest)}: ask for a review of that one`);
  }

  private async eligibleReviewer(manager: EntityManager, { revision }: LoadedRevision, input: CreateReviewRequest, requester: Account): Promise<Account> {
    const field = input.reviewerId !== undefined ? 'reviewerId' : 'reviewerEmail';
    const reviewer = input.reviewerId !== undefined ? await this.users.findById(input.reviewerId, manager) : await this.users.findByEmail(input.reviewerEmail!, manager);
    if (reviewer && (reviewer.id === revision.authorId || reviewer.id === requester.id)) {
      throw new DomainError('SELF_REVIEW', 'A revision is reviewed by someone other than its author (separation of duties)', 403, field);
    }
    const role = reviewer && !reviewer.disabled ? await this.access.roleOf(revision.projectId, reviewer.id, manager) : null;
    if (!reviewer || role === null || !REVIEWING_PROJECT_ROLES.includes(role)) {
      throw new DomainError('REVIEWER_NOT_ELIGIBLE', `The reviewer must be a member of this project with the ${REVIEWING_PROJECT_ROLES.join(' or ')} role`, 400, field);
    }
    return reviewer;
  }

  /** The one change a request ever gets: open → closed (the database refuses any later one). */
  private async close(manager: EntityManager, request: ReviewRequestEntity, change: Partial<ReviewRequestEntity>): Promise<void> {
    const result = await manager.getRepository(ReviewRequestEntity).update({ id: request.id, state: 'open' }, change);
    if (result.affected !== 1) throw conflict('REVIEW_ALREADY_DECIDED', 'This review request has been decided already');
  }

  private async facts(manager: EntityManager, { revision }: LoadedRevision): Promise<ReviewFacts> {
    const loaded = await this.requests.facts(manager, revision.projectId, revision.sheetId);
    return { ...loaded, label: revisionLabel(revision.number), revisionId: revision.id };
  }
}

function assertOpen(request: ReviewRequestEntity): void {
  if (request.state === 'withdrawn') throw conflict('REVIEW_WITHDRAWN', 'This review request was withdrawn and cannot be decided or withdrawn again');
  if (request.state !== 'open') throw conflict('REVIEW_ALREADY_DECIDED', `This review request was decided already (${request.state}); a decision is final`);
}
