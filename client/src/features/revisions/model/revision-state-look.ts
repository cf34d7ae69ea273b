import type { RevisionState } from '@channelwright/shared/schemas';

/** How each review state is named and coloured wherever it shows. */
export const REVISION_STATE_LOOK: Record<RevisionState, { label: string; color: string; hint: string }> = {
  draft: { label: 'Draft', color: 'gray', hint: 'Frozen, not in review' },
  'in-review': { label: 'In review', color: 'channel', hint: 'A reviewer has been asked' },
  'changes-requested': { label: 'Changes requested', color: 'oxide', hint: 'Sent back: edit the sheet and freeze a new revision' },
  'signed-off': { label: 'Signed off', color: 'green', hint: 'Approved by a reviewer; it can never change' },
};
