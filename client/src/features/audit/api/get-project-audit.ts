import { auditEventSchema, type AuditEvent } from '@channelwright/shared/schemas';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import { apiRequest } from '../../../lib/api-client';
import { auditSearch, type AuditFilters } from './audit-filters';

const eventsSchema = z.array(auditEventSchema);

/** `GET /api/projects/:id/audit`: the project's events, newest first, filtered. */
export const getProjectAudit = (projectId: string, filters: AuditFilters, signal?: AbortSignal): Promise<AuditEvent[]> =>
  apiRequest(`/projects/${encodeURIComponent(projectId)}/audit${auditSearch(filters, 'json')}`, { schema: eventsSchema, signal, quiet: true });

export const projectAuditQueryOptions = (projectId: string, filters: AuditFilters) =>
  queryOptions({ queryKey: ['audit', projectId, filters] as const, queryFn: ({ signal }) => getProjectAudit(projectId, filters, signal), placeholderData: keepPreviousData });

export const useProjectAudit = (projectId: string, filters: AuditFilters) => useQuery(projectAuditQueryOptions(projectId, filters));
