import { Injectable } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import { InjectRepository } from '@nestjs/typeorm';
import type { EntityManager, FindOptionsWhere, Repository } from 'typeorm';
import { DomainError } from '../common/errors/domain-error.js';
import { registeredUnder } from '../common/extension-points.js';
import { UsersService } from '../users/users.service.js';
import { RevisionDeviceEntity } from './revision-device.entity.js';
import type { LoadedRevision } from './revision-response.js';
import { REVISION_REVIEWS, type ReviewFacts, type RevisionReviewSource } from './revision-reviews.js';
import { RevisionEntity } from './revision.entity.js';

/** 404 REVISION_NOT_FOUND; `field` names a body or query field that held the id (e.g. against). */
export const revisionNotFound = (field?: string): DomainError => new DomainError('REVISION_NOT_FOUND', 'There is no revision with this id', 404, field);

/** Reads revisions with their device count, review requests (from REVISION_REVIEWS) and accounts, on the manager given. */
@Injectable()
export class RevisionReader {
  constructor(
    @InjectRepository(RevisionEntity) private readonly revisions: Repository<RevisionEntity>,
    private readonly users: UsersService,
    private readonly moduleRef: ModuleRef,
  ) {}

  async load(id: string, manager: EntityManager = this.revisions.manager, field?: string): Promise<LoadedRevision> {
    const [loaded] = await this.loadWhere({ id }, manager);
    if (!loaded) throw revisionNotFound(field);
    return loaded;
  }

  /** A sheet's revisions, newest first. */
  loadSheet(sheetId: string, manager: EntityManager = this.revisions.manager): Promise<LoadedRevision[]> {
    return this.loadWhere({ sheetId }, manager);
  }

  devices(revisionId: string, manager: EntityManager = this.revisions.manager): Promise<RevisionDeviceEntity[]> {
    return manager.getRepository(RevisionDeviceEntity).find({ where: { revisionId }, order: { position: 'ASC' } });
  }

  /** The number of the sheet's newest revision, or null when it has none. */
  newestNumber(sheetId: string, manager: EntityManager = this.revisions.manager): Promise<number | null> {
    return manager.getRepository(RevisionEntity).maximum('number', { sheetId });
  }

  /** The project of a revision, or null when there is no such revision. */
  async projectIdOf(revisionId: string): Promise<string | null> {
    return (await this.revisions.findOne({ select: { id: true, projectId: true }, where: { id: revisionId } }))?.projectId ?? null;
  }

  private async loadWhere(where: FindOptionsWhere<RevisionEntity>, manager: EntityManager): Promise<LoadedRevision[]> {
    const revisions = await manager.getRepository(RevisionEntity).find({ where, order: { number: 'DESC' } });
    if (revisions.length === 0) return [];
    const ids = revisions.map((revision) => revision.id);
    const counts: Array<{ revisionId: string; count: number }> = await manager
      .getRepository(RevisionDeviceEntity)
      .createQueryBuilder('device')
      .select('device.revisionId', 'revisionId')
      .addSelect('COUNT(*)', 'count')
      .where('device.revisionId IN (:...ids)', { ids })
      .groupBy('device.revisionId')
      .getRawMany();
    const requests: ReviewFacts[] = [];
    for (const source of registeredUnder<RevisionReviewSource>(this.moduleRef, REVISION_REVIEWS)) requests.push(...(await source.requestsOf(ids, manager)));
    requests.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime());
    const users = await this.users.cards([...revisions.map((r) => r.authorId), ...requests.map((r) => r.reviewerId)], manager);
    return revisions.map((revision) => ({
      revision,
      deviceCount: Number(counts.find((c) => c.revisionId === revision.id)?.count ?? 0),
      requests: requests.filter((request) => request.revisionId === revision.id),
      users,
    }));
  }
}
