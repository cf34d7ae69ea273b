import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource } from 'typeorm';
import type { DomainError } from '../common/errors/domain-error.js';
import type { ProjectResourceResolver } from '../projects/project-resource-resolver.js';
import { revisionNotFound } from './revision-reader.js';
import { RevisionEntity } from './revision.entity.js';

/** Lets `@ProjectAccess(need, 'revision')` find the project of /api/revisions/:id. */
@Injectable()
export class RevisionProjectResolver implements ProjectResourceResolver {
  readonly kind = 'revision';

  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async projectIdOf(revisionId: string): Promise<string | null> {
    const revision = await this.dataSource.getRepository(RevisionEntity).findOne({ select: { id: true, projectId: true }, where: { id: revisionId } });
    return revision?.projectId ?? null;
  }

  notFound(): DomainError {
    return revisionNotFound();
  }
}
