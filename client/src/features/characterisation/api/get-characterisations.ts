import { characterisationJobListSchema, type CharacterisationJob } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { characterisationKeys } from '../../../lib/characterisation/characterisation-keys';
import { isUnderway } from '../model/job-status';

/** How often a version's jobs are read again while one of them is queued or running, ms. */
export const PROGRESS_REFRESH_MS = 1500;

/** `GET /api/processes/:id/characterisations?version=`: the version's jobs, newest first. */
export const getCharacterisations = (processId: string, version: number, signal?: AbortSignal): Promise<CharacterisationJob[]> =>
  apiRequest(`/processes/${encodeURIComponent(processId)}/characterisations?version=${version}`, { schema: characterisationJobListSchema, signal });

export const characterisationsQueryOptions = (processId: string, version: number) =>
  queryOptions({
    queryKey: characterisationKeys.jobs(processId, version),
    queryFn: ({ signal }) => getCharacterisations(processId, version, signal),
    // The progress bar and its estimate refresh while a job is under way, and stop once none is.
    refetchInterval: (query) => (query.state.data?.some((job) => isUnderway(job.status)) ? PROGRESS_REFRESH_MS : false),
  });

export const useCharacterisations = (processId: string, version: number) => useQuery(characterisationsQueryOptions(processId, version));
