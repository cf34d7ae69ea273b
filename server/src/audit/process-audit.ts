import type { AuditRecord } from './audit-record.js';

/** The audit record of a new process-profile version (installation-wide: no project of its own). */
export function processVersionAudit(profileId: string, number: number, name: string, message: string, author: { id: string } | null): AuditRecord {
  return {
    actor: author,
    entityType: 'process-profile',
    entityId: profileId,
    action: 'process.version-created',
    after: { version: number, name, message },
    summary: `Saved ${name} version ${number}${message ? `: ${message}` : ''}`,
  };
}
