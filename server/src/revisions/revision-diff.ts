import type { RevisionDiff, ValueChange } from '@channelwright/shared/schemas';
import { canonicalJson } from './canonical-json.js';
import type { RevisionDeviceContent } from './revision-content.js';

/** What a diff compares of one revision: its label, sheet-level values and devices. */
export interface DiffSide {
  id: string;
  label: string;
  /** Sheet fields, process and engine version, flattened by the caller's shape. */
  sheet: Record<string, unknown>;
  devices: readonly RevisionDeviceContent[];
}

/**
 * Devices added, removed and changed from `against` to `revision` (matched by the sheet device id, so
 * a renamed device is a change of `name`), with every value that differs: targets.*, result.* (nested
 * objects by dotted path, arrays such as warnings compared whole), error, name. With no `against`
 * every device counts as added.
 */
export function diffRevisions(revision: DiffSide, against: DiffSide | null): RevisionDiff {
  const before = new Map((against?.devices ?? []).map((device) => [device.deviceId, device]));
  const after = new Map(revision.devices.map((device) => [device.deviceId, device]));
  const ref = (device: RevisionDeviceContent) => ({ id: device.deviceId, name: device.name });
  const changed: RevisionDiff['changed'] = [];
  for (const device of revision.devices) {
    const old = before.get(device.deviceId);
    if (!old) continue;
    const changes = valueChanges(comparable(old), comparable(device));
    if (changes.length > 0) changed.push({ ...ref(device), changes });
  }
  return {
    revisionId: revision.id,
    againstId: against?.id ?? null,
    againstLabel: against?.label ?? null,
    added: revision.devices.filter((device) => !before.has(device.deviceId)).map(ref),
    removed: (against?.devices ?? []).filter((device) => !after.has(device.deviceId)).map(ref),
    changed,
    sheetChanges: against ? valueChanges(against.sheet, revision.sheet) : [],
  };
}

function comparable(device: RevisionDeviceContent): Record<string, unknown> {
  return { name: device.name, targets: device.targets, result: device.result, error: device.error };
}

/** Every leaf that differs between two values, by dotted path; null stands for absent. */
export function valueChanges(from: unknown, to: unknown, path = ''): ValueChange[] {
  if (isPlainObject(from) && isPlainObject(to)) {
    const keys = [...new Set([...Object.keys(from), ...Object.keys(to)])].sort();
    return keys.flatMap((key) => valueChanges(from[key], to[key], path ? `${path}.${key}` : key));
  }
  const a = from ?? null;
  const b = to ?? null;
  return canonicalJson(a) === canonicalJson(b) ? [] : [{ path, from: a, to: b }];
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}
