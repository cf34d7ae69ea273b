/**
 * Every query key of sheets, from one place. A sheet's detail key is the prefix of what hangs under it
 * (its review state), so refreshing the sheet refreshes those too; the lists are each project's sheet
 * summaries, whose device and stale counts change with every device.
 */
export const sheetKeys = {
  all: ['sheets'] as const,
  lists: () => [...sheetKeys.all, 'list'] as const,
  /** `GET /api/projects/:id/sheets`. */
  list: (projectId: string) => [...sheetKeys.lists(), projectId] as const,
  /** `GET /api/sheets/:id`, and the prefix of every read about that one sheet. */
  detail: (sheetId: string) => [...sheetKeys.all, 'detail', sheetId] as const,
};
