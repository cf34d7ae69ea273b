import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { saveFile } from '../../../lib/save-file';
import { auditSearch, type AuditFilters } from './audit-filters';

/** `GET /api/projects/:id/audit?format=csv`: the same filtered rows as CSV text. */
export const exportProjectAudit = (projectId: string, filters: AuditFilters): Promise<string> =>
  apiRequest(`/projects/${encodeURIComponent(projectId)}/audit${auditSearch(filters, 'csv')}`, { responseType: 'text' });

/** Fetches the CSV with the session's token and hands it to the browser as a download. */
export function useExportProjectAudit() {
  return useMutation({
    mutationFn: async ({ projectId, filters }: { projectId: string; filters: AuditFilters }) => {
      const text = await exportProjectAudit(projectId, filters);
      saveFile(new Blob([text], { type: 'text/csv;charset=utf-8' }), `audit-${projectId}.csv`);
    },
  });
}
