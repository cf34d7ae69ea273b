import { AUDIT_CSV_COLUMNS, type AuditEvent } from '@channelwright/shared/schemas';
import Papa from 'papaparse';

/**
 * The audit as CSV (RFC 4180 quoting by papaparse): one row per event, a header row, before/after
 * as JSON text. Cells that a spreadsheet would run as a formula are escaped (papaparse escapeFormulae).
 */
export function auditCsv(events: AuditEvent[]): string {
  const rows = events.map((event) => [
    event.id,
    event.at,
    event.actor?.displayName ?? 'system',
    event.actor?.email ?? '',
    event.action,
    event.entityType,
    event.entityId,
    event.summary,
    event.before === null ? '' : JSON.stringify(event.before),
    event.after === null ? '' : JSON.stringify(event.after),
  ]);
  return Papa.unparse({ fields: [...AUDIT_CSV_COLUMNS], data: rows }, { escapeFormulae: true, newline: '\r\n' });
}
