import type { Sheet } from '@channelwright/shared/schemas';
import type { QueryClient } from '@tanstack/react-query';
import { sheetKeys } from './sheet-keys';

/**
 * After a change to a sheet's devices: the sheet and what hangs under its key (its review state says
 * whether it differs from its latest revision), and every project's list of sheets (device and stale counts).
 */
export const invalidateSheet = (queryClient: QueryClient, sheetId: string) =>
  Promise.all([
    queryClient.invalidateQueries({ queryKey: sheetKeys.detail(sheetId) }),
    queryClient.invalidateQueries({ queryKey: sheetKeys.lists() }),
  ]);

/**
 * After a change whose answer is the fresh sheet itself (a recompute): that answer goes into the cache
 * as it is, and only what depends on the sheet is read again.
 */
export function replaceSheet(queryClient: QueryClient, sheet: Sheet) {
  const key = sheetKeys.detail(sheet.id);
  queryClient.setQueryData(key, sheet);
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: key, predicate: (query) => query.queryKey.length > key.length }),
    queryClient.invalidateQueries({ queryKey: sheetKeys.lists() }),
  ]);
}
