import { ENGINE_VERSION } from '@channelwright/shared/device';
import type { LoadedSheet } from '../sheets/sheet-response.js';
import { canonicalJson } from './canonical-json.js';
import { deviceContentOf, sheetSnapshotOf, type RevisionDeviceContent } from './revision-content.js';
import type { RevisionDeviceEntity } from './revision-device.entity.js';
import type { RevisionEntity } from './revision.entity.js';

/** Whether the sheet as it is now holds exactly what the revision froze (fields, process, engine, devices). */
export function sheetMatchesRevision(loaded: LoadedSheet, revision: RevisionEntity, devices: readonly RevisionDeviceEntity[]): boolean {
  const { sheet, process } = loaded;
  const now = frozenState(
    { name: sheet.name, description: sheet.description, temperature: sheet.temperature, corner: sheet.corner, model: sheet.model },
    process.versionId,
    ENGINE_VERSION,
    loaded.devices.map((device) => ({
      deviceId: device.id,
      position: device.position,
      name: device.name,
      targets: JSON.parse(device.targets),
      result: device.result === null ? null : JSON.parse(device.result),
      error: device.error === null ? null : JSON.parse(device.error),
      engineVersion: device.engineVersion,
      processVersionId: device.processVersionId,
      computedAt: device.computedAt.toISOString(),
    })),
  );
  return now === frozenState(sheetSnapshotOf(revision), revision.processVersionId, revision.engineVersion, devices.map(deviceContentOf));
}

function frozenState(sheet: unknown, processVersionId: string, engineVersion: string, devices: RevisionDeviceContent[]): string {
  return canonicalJson({ sheet, processVersionId, engineVersion, devices: devices.toSorted((a, b) => a.position - b.position) });
}
