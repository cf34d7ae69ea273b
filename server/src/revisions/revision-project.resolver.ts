import { Injectable } from '@nestjs/common';
import type { DomainError } from '../common/errors/domain-error.js';
import type { ProjectResourceResolver } from '../projects/project-resource-resolver.js';
import { revisionNotFound, RevisionReader } from './revision-reader.js';

/** Lets `@ProjectAccess(need, 'revision')` find the project of /api/revisions/:id. */
@Injectable()
export class RevisionProjectResolver implements ProjectResourceResolver {
  readonly kind = 'revision';

  constructor(private readonly reader: RevisionReader) {}

  projectIdOf(revisionId: string): Promise<string | null> {
    return this.reader.projectIdOf(revisionId);
  }

  notFound(): DomainError {
    return revisionNotFound();
  }
}
