import type { QueryClient } from '@tanstack/react-query';
import { processKeys } from '../../../lib/processes/process-keys';
import { sheetKeys } from '../../../lib/sheets/sheet-keys';

/**
 * After a profile moved on (a new version, deprecated or restored): every process read, and every sheet
 * read, since a sheet shows whether its process has a newer version and whether it is deprecated.
 */
export const invalidateMovedProfile = (queryClient: QueryClient) =>
  Promise.all([queryClient.invalidateQueries({ queryKey: processKeys.all }), queryClient.invalidateQueries({ queryKey: sheetKeys.all })]);
