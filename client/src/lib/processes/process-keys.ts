import type { ListProcessesQuery } from '@channelwright/shared/schemas';

/** Every query key of the process library, from one place; mutations invalidate `processKeys.all`. */
export const processKeys = {
  all: ['processes'] as const,
  list: (query: Partial<ListProcessesQuery>) => ['processes', 'list', query] as const,
  detail: (id: string, version?: number) => ['processes', 'detail', id, version ?? 'latest'] as const,
  versions: (id: string) => ['processes', 'versions', id] as const,
  diff: (id: string, from: number, to: number) => ['processes', 'diff', id, from, to] as const,
};
