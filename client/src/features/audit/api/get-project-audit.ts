import { auditEventSchema, type AuditEvent } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import { auditSearch, type AuditFilters } from './audit-filters';
import { auditKeys } from './audit-keys';

const eventsSchema = z.array(auditEventSchema);

/** `GET /api/projects/:id/audit`: the project's events, newest first, filtered. */
export const getProjectAudit = (projectId: string, filters: AuditFilters, signal?: AbortSignal): Promise<AuditEvent[]> =>
  apiRequest(`/projects/${encodeURIComponent(projectId)}/audit${auditSearch(filters, 'json')}`, { schema: eventsSchema, signal, quiet: true });

/**
 * Every change anywhere in the project appends to its trail, and no mutation of another feature can
 * name this key, so the page reads the trail afresh each time it opens (staleTime 0) instead.
 */
export const projectAuditQueryOptions = (projectId: string, filters: AuditFilters) =>
  queryOptions({
    queryKey: auditKeys.list(projectId, filters),
    queryFn: ({ signal }) => getProjectAudit(projectId, filters, signal),
    placeholderData: keepPreviousData,
    staleTime: 0,
  });

export const useProjectAudit = (projectId: string, filters: AuditFilters) => useQuery(projectAuditQueryOptions(projectId, filters));
