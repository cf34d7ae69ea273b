import type { ReviewInboxQuery } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import { notFound, type DomainError } from '../common/errors/domain-error.js';
import { ProjectMemberEntity } from '../projects/project-member.entity.js';
import { ProjectEntity } from '../projects/project.entity.js';
import { RevisionReader } from '../revisions/revision-reader.js';
import { SheetEntity } from '../sheets/sheet.entity.js';
import type { UserEntity } from '../users/user.entity.js';
import type { LoadedReviewRequest } from './review-request-response.js';
import { ReviewRequestEntity } from './review-request.entity.js';

export const reviewRequestNotFound = (): DomainError => notFound('REVIEW_REQUEST_NOT_FOUND', 'There is no review request with this id');

/** Reads review requests with what their responses show. */
@Injectable()
export class ReviewRequestReader {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly revisions: RevisionReader,
  ) {}

  async load(id: string, manager: EntityManager = this.dataSource.manager): Promise<LoadedReviewRequest> {
    const request = await manager.getRepository(ReviewRequestEntity).findOne({ where: { id }, relations: { project: true, requestedBy: true, reviewer: true } });
    if (!request) throw reviewRequestNotFound();
    return this.complete(request, manager);
  }

  /** Every request of one revision, oldest first. */
  async forRevision(revisionId: string): Promise<LoadedReviewRequest[]> {
    const requests = await this.dataSource.getRepository(ReviewRequestEntity).find({ where: { revisionId }, relations: { project: true, requestedBy: true, reviewer: true }, order: { createdAt: 'ASC' } });
    const loaded: LoadedReviewRequest[] = [];
    for (const request of requests) loaded.push(await this.complete(request, this.dataSource.manager));
    return loaded;
  }

  /**
   * The caller's inbox: requests assigned to them, or that they made, newest first; only in projects
   * they still belong to (admins: all of theirs).
   */
  async inbox(user: UserEntity, query: ReviewInboxQuery): Promise<LoadedReviewRequest[]> {
    const builder = this.dataSource
      .getRepository(ReviewRequestEntity)
      .createQueryBuilder('request')
      .leftJoinAndSelect('request.project', 'project')
      .leftJoinAndSelect('request.requestedBy', 'requestedBy')
      .leftJoinAndSelect('request.reviewer', 'reviewer')
      .where(query.mine === 'assigned' ? 'request.reviewerId = :me' : 'request.requestedById = :me', { me: user.id });
    if (query.state) builder.andWhere('request.state = :state', { state: query.state });
    if (user.role !== 'admin') {
      builder.andWhere(`EXISTS (SELECT 1 FROM ${quoted(this.dataSource, ProjectMemberEntity)} m WHERE m."projectId" = request."projectId" AND m."userId" = :me)`);
    }
    const requests = await builder.orderBy('request.createdAt', 'DESC').getMany();
    const loaded: LoadedReviewRequest[] = [];
    for (const request of requests) loaded.push(await this.complete(request, this.dataSource.manager));
    return loaded;
  }

  /** The project's and the sheet's names, for mails and summaries. */
  async facts(manager: EntityManager, projectId: string, sheetId: string): Promise<{ projectName: string; sheetName: string }> {
    const project = await manager.getRepository(ProjectEntity).findOneByOrFail({ id: projectId });
    const sheet = await manager.getRepository(SheetEntity).findOneByOrFail({ id: sheetId });
    return { projectName: project.name, sheetName: sheet.name };
  }

  private async complete(request: ReviewRequestEntity, manager: EntityManager): Promise<LoadedReviewRequest> {
    const revision = await this.revisions.load(request.revisionId, manager);
    const sheet = await manager.getRepository(SheetEntity).findOne({ select: { id: true, name: true }, where: { id: revision.revision.sheetId } });
    return { request, revision, sheetName: sheet?.name ?? JSON.parse(revision.revision.sheetSnapshot).name };
  }
}

function quoted(dataSource: DataSource, entity: typeof ProjectMemberEntity): string {
  return `"${dataSource.getMetadata(entity).tableName}"`;
}
