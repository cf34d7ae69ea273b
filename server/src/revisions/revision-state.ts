import type { RevisionState } from '@channelwright/shared/schemas';
import type { ReviewFacts } from './revision-reviews.js';

type RequestFacts = Pick<ReviewFacts, 'state' | 'createdAt' | 'decidedAt'>;

/**
 * A revision's state from its review requests: signed off once one is approved (final); in review
 * while one is open; changes requested when the latest decision sent it back; otherwise a draft
 * (never requested, or every request withdrawn).
 */
export function revisionStateOf(requests: readonly RequestFacts[]): RevisionState {
  if (requests.some((request) => request.state === 'approved')) return 'signed-off';
  if (requests.some((request) => request.state === 'open')) return 'in-review';
  const decided = requests.filter((request) => request.state === 'changes-requested');
  return decided.length > 0 ? 'changes-requested' : 'draft';
}
