/**
 * Every query key of revisions and their reviews, from one place. A sheet's review state sits under
 * the sheet's own key (['sheets', id, …]), so whatever refreshes the sheet refreshes it too.
 */
export const revisionKeys = {
  all: ['revisions'] as const,
  detail: (id: string) => ['revisions', 'detail', id] as const,
  verify: (id: string) => ['revisions', 'verify', id] as const,
  diff: (id: string, against: string | undefined) => ['revisions', 'diff', id, against ?? 'last-signed-off'] as const,
  comments: (id: string) => ['revisions', 'comments', id] as const,
  requests: (id: string) => ['revisions', 'requests', id] as const,
  reviewers: (projectId: string) => ['revisions', 'reviewer-candidates', projectId] as const,
  sheetState: (sheetId: string) => ['sheets', sheetId, 'review-state'] as const,
};
