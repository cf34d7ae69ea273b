import type { AuditFilters } from './audit-filters';

/** Every query key of the audit trail, from one place. */
export const auditKeys = {
  all: ['audit'] as const,
  project: (projectId: string) => [...auditKeys.all, projectId] as const,
  /** `GET /api/projects/:id/audit?…`. */
  list: (projectId: string, filters: AuditFilters) => [...auditKeys.project(projectId), filters] as const,
};
