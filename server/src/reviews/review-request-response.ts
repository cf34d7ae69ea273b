import type { ReviewRequest } from '@channelwright/shared/schemas';
import { revisionLabel, type LoadedRevision } from '../revisions/revision-response.js';
import { revisionStateOf } from '../revisions/revision-state.js';
import { toUserRef } from '../users/user-ref.js';
import type { UserCard } from '../users/users.service.js';
import type { ReviewRequestEntity } from './review-request.entity.js';

/** A request with its revision (with all its requests), the names of its project and sheet, and the accounts it names. */
export interface LoadedReviewRequest {
  request: ReviewRequestEntity;
  revision: LoadedRevision;
  sheetName: string;
  projectName: string;
  users: ReadonlyMap<string, UserCard>;
}

export function toReviewRequest({ request, revision, sheetName, projectName, users }: LoadedReviewRequest): ReviewRequest {
  const r = revision.revision;
  const reviewer = users.get(request.reviewerId);
  return {
    id: request.id,
    projectId: request.projectId,
    projectName,
    sheetId: r.sheetId,
    sheetName,
    revision: { id: r.id, number: r.number, label: revisionLabel(r.number), message: r.message, hash: r.hash, state: revisionStateOf(revision.requests) },
    requestedBy: toUserRef(users.get(request.requestedById)),
    reviewer: reviewer ? { ...toUserRef(reviewer)!, email: reviewer.email } : null,
    note: request.note,
    state: request.state,
    createdAt: request.createdAt.toISOString(),
    decidedAt: request.decidedAt?.toISOString() ?? null,
    decisionComment: request.decisionComment,
    signedHash: request.signedHash,
  };
}
