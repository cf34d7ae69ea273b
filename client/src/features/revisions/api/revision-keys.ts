import { sheetKeys } from '../../../lib/sheets/sheet-keys';

/**
 * Every query key of revisions, from one place. A sheet's review state sits under the sheet's own key,
 * so whatever refreshes the sheet (a device edit) refreshes it too. Review requests have theirs in
 * lib/reviews (the inbox reads them as well); the members offered as reviewers are the project's.
 */
export const revisionKeys = {
  all: ['revisions'] as const,
  detail: (id: string) => [...revisionKeys.all, 'detail', id] as const,
  verify: (id: string) => [...revisionKeys.all, 'verify', id] as const,
  diff: (id: string, against: string | undefined) => [...revisionKeys.all, 'diff', id, against ?? 'last-signed-off'] as const,
  comments: (id: string) => [...revisionKeys.all, 'comments', id] as const,
  /** `GET /api/sheets/:id/review-state`. */
  sheetState: (sheetId: string) => [...sheetKeys.detail(sheetId), 'review-state'] as const,
};
