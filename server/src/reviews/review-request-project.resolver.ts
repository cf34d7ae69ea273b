import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import type { DomainError } from '../common/errors/domain-error.js';
import type { ProjectResourceResolver } from '../projects/project-resource-resolver.js';
import { reviewRequestNotFound } from './review-request-reader.js';
import { ReviewRequestEntity } from './review-request.entity.js';

/** Lets `@ProjectAccess(need, 'review-request')` find the project of /api/review-requests/:id. */
@Injectable()
export class ReviewRequestProjectResolver implements ProjectResourceResolver {
  readonly kind = 'review-request';

  constructor(@InjectRepository(ReviewRequestEntity) private readonly requests: Repository<ReviewRequestEntity>) {}

  async projectIdOf(requestId: string): Promise<string | null> {
    const request = await this.requests.findOne({ select: { id: true, projectId: true }, where: { id: requestId } });
    return request?.projectId ?? null;
  }

  notFound(): DomainError {
    return reviewRequestNotFound();
  }
}
