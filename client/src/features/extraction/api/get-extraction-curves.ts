import { type ExtractionCurves, extractionCurvesSchema } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { extractionKeys } from './extraction-keys';

export const getExtractionCurves = (id: string, signal?: AbortSignal): Promise<ExtractionCurves> =>
  apiRequest(`/extractions/${id}/points`, { schema: extractionCurvesSchema, signal });

/** `GET /api/extractions/:id/points`: every curve with the fit at each point; asked once the fit is done. */
export const extractionCurvesQueryOptions = (id: string, done: boolean) =>
  queryOptions({ queryKey: extractionKeys.curves(id), queryFn: ({ signal }) => getExtractionCurves(id, signal), enabled: done, staleTime: Infinity });

export const useExtractionCurves = (id: string, done: boolean) => useQuery(extractionCurvesQueryOptions(id, done));
