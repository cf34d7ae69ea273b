import type { ReviewRequest } from '@channelwright/shared/schemas';
import { toUserRef } from '../processes/process-response.js';
import { revisionLabel, type LoadedRevision } from '../revisions/revision-response.js';
import { revisionStateOf } from '../revisions/revision-state.js';
import type { ReviewRequestEntity } from './review-request.entity.js';

/** A request with requestedBy, reviewer and project loaded, its revision (with all its requests) and sheet name. */
export interface LoadedReviewRequest {
  request: ReviewRequestEntity;
  revision: LoadedRevision;
  sheetName: string;
}

export function toReviewRequest({ request, revision, sheetName }: LoadedReviewRequest): ReviewRequest {
  const r = revision.revision;
  return {
    id: request.id,
    projectId: request.projectId,
    projectName: request.project.name,
    sheetId: r.sheetId,
    sheetName,
    revision: { id: r.id, number: r.number, label: revisionLabel(r.number), message: r.message, hash: r.hash, state: revisionStateOf(revision.requests) },
    requestedBy: toUserRef(request.requestedBy),
    reviewer: request.reviewer ? { ...toUserRef(request.reviewer)!, email: request.reviewer.email } : null,
    note: request.note,
    state: request.state,
    createdAt: request.createdAt.toISOString(),
    decidedAt: request.decidedAt?.toISOString() ?? null,
    decisionComment: request.decisionComment,
    signedHash: request.signedHash,
  };
}
