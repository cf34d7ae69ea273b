import type { CurveFile } from '@channelwright/shared/curve-file';
import type { Extraction, ExtractionOptions, ExtractionResultResponse, ExtractionSummary, TableOrigin } from '@channelwright/shared/schemas';
import type { VersionFacts } from '../processes/processes.service.js';
import { toUserRef } from '../users/user-ref.js';
import type { UserCard } from '../users/users.service.js';
import type { ExtractionUploadEntity } from './extraction-upload.entity.js';
import type { ExtractionEntity } from './extraction.entity.js';

/** What reading an upload found, as kept with it; for points written from a characterised table, that table. */
export type UploadReading = Pick<CurveFile, 'convention' | 'notes' | 'curves'> & { points: number; table?: TableOrigin };

/** The upload without its bytes. */
export type UploadFacts = Omit<ExtractionUploadEntity, 'content'>;

export interface ResponseContext {
  upload: UploadFacts;
  version: VersionFacts;
  users: ReadonlyMap<string, UserCard>;
}

function processOf(version: VersionFacts) {
  return { id: version.profileId, name: version.profileName, version: version.number, latestVersion: version.latestVersion };
}

function savedAs(row: ExtractionEntity) {
  return row.savedProfileId !== null && row.savedVersion !== null ? { profileId: row.savedProfileId, version: row.savedVersion } : null;
}

/** An extraction as the API answers it (the per-point curves come from GET /:id/points). */
export function toExtraction(row: ExtractionEntity, { upload, version, users }: ResponseContext): Extraction {
  const { table, ...reading } = JSON.parse(upload.reading) as UploadReading;
  return {
    id: row.id,
    status: row.status,
    progress: { iterations: row.iterations, maxIterations: row.maxIterations },
    cancelRequested: row.cancelRequested,
    process: processOf(version),
    polarity: row.polarity,
    options: JSON.parse(row.options) as ExtractionOptions,
    source: { kind: 'upload', table: table ?? null, uploadId: upload.id, fileName: upload.fileName, sha256: upload.sha256, bytes: upload.bytes, ...reading },
    result: row.result === null ? null : (JSON.parse(row.result) as ExtractionResultResponse),
    error: row.error === null ? null : (JSON.parse(row.error) as { code: string; message: string }),
    savedAs: savedAs(row),
    rerunOf: row.rerunOfId,
    attempts: row.attempts,
    createdBy: toUserRef(row.createdById === null ? null : users.get(row.createdById)),
    createdAt: row.createdAt.toISOString(),
    startedAt: row.startedAt?.toISOString() ?? null,
    finishedAt: row.finishedAt?.toISOString() ?? null,
  };
}

/** A line of the list of extractions. */
export function toExtractionSummary(row: ExtractionEntity, fileName: string | null, version: VersionFacts, users: ReadonlyMap<string, UserCard>): ExtractionSummary {
  const result = row.result === null ? null : (JSON.parse(row.result) as ExtractionResultResponse);
  return {
    id: row.id,
    status: row.status,
    progress: { iterations: row.iterations, maxIterations: row.maxIterations },
    process: processOf(version),
    polarity: row.polarity,
    model: (JSON.parse(row.options) as ExtractionOptions).model,
    fileName,
    converged: result?.converged ?? null,
    savedAs: savedAs(row),
    createdBy: toUserRef(row.createdById === null ? null : users.get(row.createdById)),
    createdAt: row.createdAt.toISOString(),
    finishedAt: row.finishedAt?.toISOString() ?? null,
  };
}
