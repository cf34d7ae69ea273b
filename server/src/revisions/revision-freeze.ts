import { randomUUID } from 'node:crypto';
import { ENGINE_VERSION } from '@channelwright/shared/device';
import type { EntityManager } from 'typeorm';
import { conflict } from '../common/errors/domain-error.js';
import { staleReasonsOf, type LoadedSheet } from '../sheets/sheet-response.js';
import { revisionHash } from './revision-content.js';
import { RevisionDeviceEntity } from './revision-device.entity.js';
import { RevisionEntity } from './revision.entity.js';

/**
 * Freezes a loaded sheet into the next revision, on the manager of the caller's transaction: the
 * snapshot rows and their SHA-256 hash, inserted together. Refuses a sheet without devices (409
 * SHEET_HAS_NO_DEVICES) and one whose results are stale (409 SHEET_RESULTS_STALE: recompute first),
 * so a revision always holds results of its own process version and engine.
 */
export async function freezeSheet(manager: EntityManager, loaded: LoadedSheet, message: string, authorId: string): Promise<RevisionEntity> {
  const { sheet, process, devices } = loaded;
  if (devices.length === 0) throw conflict('SHEET_HAS_NO_DEVICES', 'The sheet has no devices to freeze');
  const stale = devices.filter((device) => staleReasonsOf(device, sheet, loaded.tableHashes).length > 0);
  if (stale.length > 0) {
    throw conflict('SHEET_RESULTS_STALE', `Recompute the sheet first: the results of ${stale.map((d) => d.name).join(', ')} were made on another process or engine version, or from another table`);
  }
  const revisions = manager.getRepository(RevisionEntity);
  const last = (await revisions.maximum('number', { sheetId: sheet.id })) ?? 0;
  const revision = revisions.create({
    id: randomUUID(),
    sheetId: sheet.id,
    projectId: sheet.projectId,
    number: last + 1,
    message,
    authorId,
    createdAt: new Date(),
    sheetSnapshot: JSON.stringify({ name: sheet.name, description: sheet.description, temperature: sheet.temperature, corner: sheet.corner, model: sheet.model }),
    processVersionId: process.versionId,
    processProfileId: process.profileId,
    processName: process.name,
    processVersionNumber: process.version,
    engineVersion: ENGINE_VERSION,
    hash: '',
  });
  const rows = devices.map((device) =>
    manager.getRepository(RevisionDeviceEntity).create({
      id: randomUUID(),
      revisionId: revision.id,
      deviceId: device.id,
      position: device.position,
      name: device.name,
      targets: device.targets,
      result: device.result,
      error: device.error,
      engineVersion: device.engineVersion,
      processVersionId: device.processVersionId,
      computedAt: device.computedAt.toISOString(),
    }),
  );
  revision.hash = revisionHash(revision, rows);
  await revisions.insert(revision);
  await manager.getRepository(RevisionDeviceEntity).insert(rows);
  return revision;
}
