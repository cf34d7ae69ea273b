import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { In, type DataSource, type EntityManager, type FindOptionsWhere } from 'typeorm';
import { DomainError } from '../common/errors/domain-error.js';
import { ReviewRequestEntity } from '../reviews/review-request.entity.js';
import { RevisionDeviceEntity } from './revision-device.entity.js';
import type { LoadedRevision } from './revision-response.js';
import { RevisionEntity } from './revision.entity.js';

/** 404 REVISION_NOT_FOUND; `field` names a body or query field that held the id (e.g. against). */
export const revisionNotFound = (field?: string): DomainError => new DomainError('REVISION_NOT_FOUND', 'There is no revision with this id', 404, field);

/** Reads revisions with their author, device count and review requests, on the manager given. */
@Injectable()
export class RevisionReader {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async load(id: string, manager: EntityManager = this.dataSource.manager, field?: string): Promise<LoadedRevision> {
    const [loaded] = await this.loadWhere({ id }, manager);
    if (!loaded) throw revisionNotFound(field);
    return loaded;
  }

  /** A sheet's revisions, newest first. */
  loadSheet(sheetId: string, manager: EntityManager = this.dataSource.manager): Promise<LoadedRevision[]> {
    return this.loadWhere({ sheetId }, manager);
  }

  devices(revisionId: string, manager: EntityManager = this.dataSource.manager): Promise<RevisionDeviceEntity[]> {
    return manager.getRepository(RevisionDeviceEntity).find({ where: { revisionId }, order: { position: 'ASC' } });
  }

  private async loadWhere(where: FindOptionsWhere<RevisionEntity>, manager: EntityManager): Promise<LoadedRevision[]> {
    const revisions = await manager.getRepository(RevisionEntity).find({ where, relations: { author: true }, order: { number: 'DESC' } });
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
    const requests = await manager.getRepository(ReviewRequestEntity).find({ where: { revisionId: In(ids) }, relations: { reviewer: true }, order: { createdAt: 'ASC' } });
    return revisions.map((revision) => ({
      revision,
      deviceCount: Number(counts.find((c) => c.revisionId === revision.id)?.count ?? 0),
      requests: requests.filter((request) => request.revisionId === revision.id),
    }));
  }
}
