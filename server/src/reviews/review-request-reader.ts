import type { ReviewInboxQuery } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, type EntityManager, type Repository } from 'typeorm';
import { notFound, type DomainError } from '../common/errors/domain-error.js';
import { ProjectsService } from '../projects/projects.service.js';
import type { ReviewFacts, RevisionReviewSource } from '../revisions/revision-reviews.js';
import { RevisionReader } from '../revisions/revision-reader.js';
import { SheetReader } from '../sheets/sheet-reader.js';
import { UsersService, type Account } from '../users/users.service.js';
import type { LoadedReviewRequest } from './review-request-response.js';
import { ReviewRequestEntity } from './review-request.entity.js';

export const reviewRequestNotFound = (): DomainError => notFound('REVIEW_REQUEST_NOT_FOUND', 'There is no review request with this id');

/** Reads review requests with what their responses show; also tells the revisions their requests (REVISION_REVIEWS). */
@Injectable()
export class ReviewRequestReader implements RevisionReviewSource {
  constructor(
    @InjectRepository(ReviewRequestEntity) private readonly requests: Repository<ReviewRequestEntity>,
    private readonly revisions: RevisionReader,
    private readonly sheets: SheetReader,
    private readonly projects: ProjectsService,
    private readonly users: UsersService,
  ) {}

  async load(id: string, manager: EntityManager = this.requests.manager): Promise<LoadedReviewRequest> {
    const request = await manager.getRepository(ReviewRequestEntity).findOneBy({ id });
    if (!request) throw reviewRequestNotFound();
    const [loaded] = await this.complete([request], manager);
    return loaded;
  }

  /** Every request of one revision, oldest first. */
  async forRevision(revisionId: string): Promise<LoadedReviewRequest[]> {
    const requests = await this.requests.find({ where: { revisionId }, order: { createdAt: 'ASC' } });
    return this.complete(requests, this.requests.manager);
  }

  /**
   * The caller's inbox: requests assigned to them, or that they made, newest first; only in projects
   * they still belong to (admins: all of theirs).
   */
  async inbox(user: Account, query: ReviewInboxQuery): Promise<LoadedReviewRequest[]> {
    const mine = query.mine === 'assigned' ? { reviewerId: user.id } : { requestedById: user.id };
    const projectIds = user.role === 'admin' ? undefined : await this.projects.projectIdsOf(user.id);
    if (projectIds?.length === 0) return [];
    const requests = await this.requests.find({
      where: { ...mine, ...(query.state && { state: query.state }), ...(projectIds && { projectId: In(projectIds) }) },
      order: { createdAt: 'DESC' },
    });
    return this.complete(requests, this.requests.manager);
  }

  /** The project's and the sheet's names, for mails and summaries. */
  async facts(manager: EntityManager, projectId: string, sheetId: string): Promise<{ projectName: string; sheetName: string }> {
    const projectName = (await this.projects.namesOf([projectId], manager)).get(projectId) ?? '';
    return { projectName, sheetName: (await this.sheets.nameOf(sheetId, manager)) ?? '' };
  }

  async requestsOf(revisionIds: readonly string[], manager: EntityManager): Promise<ReviewFacts[]> {
    if (revisionIds.length === 0) return [];
    return manager.getRepository(ReviewRequestEntity).find({ where: { revisionId: In([...revisionIds]) }, order: { createdAt: 'ASC' } });
  }

  private async complete(requests: ReviewRequestEntity[], manager: EntityManager): Promise<LoadedReviewRequest[]> {
    const projectNames = await this.projects.namesOf(requests.map((r) => r.projectId), manager);
    const users = await this.users.cards(requests.flatMap((r) => [r.requestedById, r.reviewerId]), manager);
    const loaded: LoadedReviewRequest[] = [];
    for (const request of requests) {
      const revision = await this.revisions.load(request.revisionId, manager);
      const sheetName = (await this.sheets.nameOf(revision.revision.sheetId, manager)) ?? JSON.parse(revision.revision.sheetSnapshot).name;
      loaded.push({ request, revision, sheetName, projectName: projectNames.get(request.projectId) ?? '', users });
    }
    return loaded;
  }
}
