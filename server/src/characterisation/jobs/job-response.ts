import type { CharacterisationJob } from '@channelwright/shared/schemas';
import { toUserRef } from '../../users/user-ref.js';
import type { UserCard } from '../../users/users.service.js';
import type { TableRow } from '../tables/characterisation-tables.service.js';
import type { CharacterisationJobEntity } from './characterisation-job.entity.js';
import type { PlannedDevice } from './characterisation-plan.js';

/** The process version of a job as its answer names it. */
export interface JobVersion {
  profileId: string;
  name: string;
  version: number;
}

/** A job as the API answers it, with the tables it has stored (by device) and who asked for it. */
export function toJob(job: CharacterisationJobEntity, version: JobVersion, users: ReadonlyMap<string, UserCard>, tables: readonly TableRow[]): CharacterisationJob {
  const plan = JSON.parse(job.plan) as PlannedDevice[];
  const error = job.error === null ? null : (JSON.parse(job.error) as { code: string; message: string });
  // The estimate was written at the last report: what has passed since comes off it.
  const sinceReport = job.heartbeatAt ? (Date.now() - job.heartbeatAt.getTime()) / 1000 : 0;
  return {
    id: job.id,
    processId: version.profileId,
    processName: version.name,
    version: version.version,
    processVersionId: job.processVersionId,
    status: job.status,
    progress: { done: job.done, total: job.total },
    etaSeconds: job.status === 'running' && job.etaSeconds !== null ? Math.max(0, Math.round(job.etaSeconds - sinceReport)) : null,
    error,
    cancelRequested: job.cancelRequested,
    engine: job.engine,
    gridHash: job.gridHash,
    devices: plan.map((device) => {
      const table = tables.find((t) => t.jobId === job.id && t.polarity === device.polarity && t.flavour === (device.flavour ?? ''));
      return { polarity: device.polarity, flavour: device.flavour, model: device.model, points: device.points, grid: device.grid, tableId: table?.id ?? null, sha256: table?.sha256 ?? null };
    }),
    attempts: job.attempts,
    requestedBy: toUserRef(job.requestedById === null ? null : users.get(job.requestedById)),
    createdAt: job.createdAt.toISOString(),
    startedAt: job.startedAt?.toISOString() ?? null,
    finishedAt: job.finishedAt?.toISOString() ?? null,
  };
}
