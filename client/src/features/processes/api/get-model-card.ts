import { storedModelCardSchema, type StoredModelCard } from '@channelwright/shared/schemas';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { apiRequest } from '../../../lib/api-client';
import { processKeys } from '../../../lib/processes/process-keys';

/** `GET /api/processes/:id/model-card?version=`: the card as Channelwright re-emitted it (what the simulator is given). */
export const getModelCard = (id: string, version: number, signal?: AbortSignal): Promise<StoredModelCard> =>
  apiRequest(`/processes/${encodeURIComponent(id)}/model-card?version=${version}`, { schema: storedModelCardSchema, signal });

/** A version's card never changes (a change is a new version): read once, when asked for. */
export const useModelCard = (id: string, version: number, enabled: boolean) =>
  useQuery({ ...queryOptions({ queryKey: processKeys.modelCard(id, version), queryFn: ({ signal }) => getModelCard(id, version, signal) }), enabled, staleTime: Infinity });
