import type { AuditQuery } from '@channelwright/shared/schemas';

/** The filters of the audit page, as the query string of GET /api/projects/:id/audit takes them. */
export type AuditFilters = Partial<Pick<AuditQuery, 'action' | 'entityType' | 'actor' | 'from' | 'to'>>;

export function auditSearch(filters: AuditFilters, format: 'json' | 'csv'): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(filters)) if (typeof value === 'string' && value.trim() !== '') params.set(key, value.trim());
  if (format === 'csv') params.set('format', 'csv');
  const text = params.toString();
  return text ? `?${text}` : '';
}
