import { processFileSchema, type ProcessFile } from '@channelwright/shared/schemas';
import { useMutation } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';

export interface ExportProcessInput {
  id: string;
  version: number;
  name: string;
}

/** `GET /api/processes/:id/export?version=`: one version as our JSON file. */
export const exportProcess = ({ id, version }: ExportProcessInput): Promise<ProcessFile> =>
  apiRequest(`/processes/${encodeURIComponent(id)}/export?version=${version}`, { schema: processFileSchema });

/** The file name the server gives the download, e.g. "BF180-G-v3.process.json". */
export const exportFileName = (name: string, version: number) => `${name.replace(/[^A-Za-z0-9._-]+/g, '_')}-v${version}.process.json`;

/** Fetches the file and hands it to the browser as a download. */
export function useExportProcess() {
  return useMutation({
    mutationFn: async (input: ExportProcessInput) => {
      const file = await exportProcess(input);
      const url = URL.createObjectURL(new Blob([JSON.stringify(file, null, 2)], { type: 'application/json' }));
      const link = Object.assign(document.createElement('a'), { href: url, download: exportFileName(input.name, input.version) });
      document.body.append(link);
      link.click();
      link.remove();
      URL.revokeObjectURL(url);
    },
  });
}
