import { designChartSchema, type DesignChart, type Polarity } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { characterisationKeys } from '../../../lib/characterisation/characterisation-keys';

/** What the gm/ID charts are read at; absent fields take the server's defaults (TT, near tnom, VDS near VDD/2, VSB 0). */
export interface DesignChartQueryInput {
  version: number;
  polarity: Polarity;
  flavour?: string;
  corner?: string;
  temperature?: number;
  vds?: number;
  vsb?: number;
}

/** `GET /api/processes/:id/design-chart`: one device's gm/ID curves from its current table. The chart shows its own refusal. */
export function getDesignChart(processId: string, query: DesignChartQueryInput, signal?: AbortSignal): Promise<DesignChart> {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined) params.set(key, String(value));
  return apiRequest(`/processes/${encodeURIComponent(processId)}/design-chart?${params}`, { schema: designChartSchema, quiet: true, signal });
}

export const designChartQueryOptions = (processId: string, query: DesignChartQueryInput) =>
  queryOptions({
    queryKey: characterisationKeys.designChart(processId, { ...query }),
    queryFn: ({ signal }) => getDesignChart(processId, query, signal),
    placeholderData: keepPreviousData,
  });

export const useDesignChart = (processId: string, query: DesignChartQueryInput | null) =>
  useQuery({ ...designChartQueryOptions(processId, query ?? { version: 0, polarity: 'nmos' }), enabled: query !== null });
