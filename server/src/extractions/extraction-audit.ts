import type { DeviceParams, ExtractionResultResponse } from '@channelwright/shared/schemas';
import type { AuditRecord } from '../audit/audit-record.js';

/** The audit record of a fit saved as a profile version: which parameters it changed, from the base version's values to the fitted ones. */
export function extractionSavedAudit(
  extractionId: string,
  saved: { profileId: string; name: string; number: number },
  polarity: string,
  base: DeviceParams,
  result: ExtractionResultResponse,
  author: { id: string },
): AuditRecord {
  const names = result.parameters.map((p) => p.name);
  return {
    actor: author,
    entityType: 'process-profile',
    entityId: saved.profileId,
    action: 'extraction.saved',
    before: { polarity, parameters: Object.fromEntries(names.map((name) => [name, base[name] ?? null])) },
    after: { extractionId, version: saved.number, polarity, model: result.model, converged: result.converged, parameters: Object.fromEntries(result.parameters.map((p) => [p.name, p.value])) },
    summary: `Saved the ${result.model} fit of extraction ${extractionId} as ${saved.name} version ${saved.number} (${polarity.toUpperCase()}: ${names.join(', ')})`,
  };
}
