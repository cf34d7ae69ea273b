import type { ProjectRole } from '@channelwright/shared/schemas';

export const ROLE_LABELS: Record<ProjectRole, string> = {
  owner: 'Owner',
  designer: 'Designer',
  reviewer: 'Reviewer',
  viewer: 'Viewer',
};

/** What each role may do, for the members panel. */
export const ROLE_MEANINGS: Record<ProjectRole, string> = {
  owner: 'manages members and edits everything',
  designer: 'sizes devices, edits sheets',
  reviewer: 'reads and reviews',
  viewer: 'reads and exports',
};
