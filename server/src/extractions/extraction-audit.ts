import type { DeviceParams, ExtractionResultResponse, TableOrigin } from '@channelwright/shared/schemas';
import type { AuditRecord } from '../audit/audit-record.js';
import type { UploadFacts, UploadReading } from './extraction-response.js';

/** Where a fit's points came from, as its audit records it: the kept upload, and the characterised table it was written from. */
export interface FitSource {
  fileName: string;
  sha256: string;
  table: TableOrigin | null;
}

export function uploadSource(upload: Pick<UploadFacts, 'fileName' | 'sha256' | 'reading'>): FitSource {
  return { fileName: upload.fileName, sha256: upload.sha256, table: (JSON.parse(upload.reading) as UploadReading).table ?? null };
}

function sourceText({ fileName, table }: FitSource): string {
  if (!table) return `the upload ${fileName}`;
  const device = `${table.polarity.toUpperCase()}${table.flavour ? ` ${table.flavour}` : ''}`;
  return `the ${table.corner} lines of the ${device} table of ${table.processName} version ${table.version} (SHA-256 ${table.sha256.slice(0, 12)}…)`;
}

/** The audit record of a fit saved as a profile version: which parameters it changed, from the base version's values to the fitted ones. */
export function extractionSavedAudit(
  extractionId: string,
  saved: { profileId: string; name: string; number: number },
  polarity: string,
  base: DeviceParams,
  result: ExtractionResultResponse,
  source: FitSource,
  author: { id: string },
): AuditRecord {
  const names = result.parameters.map((p) => p.name);
  return {
    actor: author,
    entityType: 'process-profile',
    entityId: saved.profileId,
    action: 'extraction.saved',
    before: { polarity, parameters: Object.fromEntries(names.map((name) => [name, base[name] ?? null])) },
    after: { extractionId, source: source.table ? { kind: 'table', ...source.table } : { kind: 'upload', fileName: source.fileName, sha256: source.sha256 }, version: saved.number, polarity, model: result.model, converged: result.converged, parameters: Object.fromEntries(result.parameters.map((p) => [p.name, p.value])) },
    summary: `Saved the ${result.model} fit of extraction ${extractionId} to ${sourceText(source)} as ${saved.name} version ${saved.number} (${polarity.toUpperCase()}: ${names.join(', ')})`,
  };
}
