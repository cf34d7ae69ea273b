import type { ListProcessesQuery } from '@channelwright/shared/schemas';

/**
 * Every query key of the process library, from one place. The library's mutations invalidate `all`;
 * the list and the detail live in lib (several features read them), versions, diffs and model cards in processes/.
 */
export const processKeys = {
  all: ['processes'] as const,
  list: (query: Partial<ListProcessesQuery>) => [...processKeys.all, 'list', query] as const,
  detail: (id: string, version?: number) => [...processKeys.all, 'detail', id, version ?? 'latest'] as const,
  versions: (id: string) => [...processKeys.all, 'versions', id] as const,
  diff: (id: string, from: number, to: number) => [...processKeys.all, 'diff', id, from, to] as const,
  modelCard: (id: string, version: number) => [...processKeys.all, 'model-card', id, version] as const,
};
