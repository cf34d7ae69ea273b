import {
  DEVICE_CONSTRAINTS,
  deviceTargetsSchema,
  type DeviceConstraint,
  type DeviceTargets,
  type SizeRequest,
  type UpdateDeviceRequest,
} from '@channelwright/shared/schemas';
import { validationError } from '../common/validation/zod-issues.js';
import type { SheetEntity } from './sheet.entity.js';

/** The process a sheet sizes on, as a compute request names it. */
export interface ProcessRef {
  profileId: string;
  version: number;
}

/**
 * The targets after a PATCH: fields given replace the stored ones, null clears an optional one, and a
 * constraint given (vov, gmId, w or vgs) replaces the stored constraint. Validated again as a whole:
 * 400 VALIDATION_FAILED naming the field.
 */
export function mergeTargets(stored: DeviceTargets, patch: UpdateDeviceRequest): DeviceTargets {
  const { version: _edited, ...change } = patch;
  const merged: Record<string, unknown> = { ...stored };
  if (DEVICE_CONSTRAINTS.some((name) => change[name] !== undefined)) {
    for (const name of DEVICE_CONSTRAINTS) delete merged[name];
  }
  for (const [key, value] of Object.entries(change)) {
    if (value === null) delete merged[key];
    else if (value !== undefined) merged[key] = value;
  }
  const result = deviceTargetsSchema.safeParse(merged);
  if (!result.success) throw validationError(result.error);
  return result.data;
}

export function constraintOf(targets: DeviceTargets): DeviceConstraint {
  return DEVICE_CONSTRAINTS.find((name) => targets[name] !== undefined) ?? 'vov';
}

/** The compute API's size request for a device: its targets with the sheet's defaults where it has none. */
export function sizeRequestOf(targets: DeviceTargets, sheet: Pick<SheetEntity, 'temperature' | 'corner' | 'model'>, process: ProcessRef): SizeRequest {
  const constraint = constraintOf(targets);
  const temperature = targets.temperature ?? sheet.temperature ?? undefined;
  return {
    processId: process.profileId,
    processVersion: process.version,
    polarity: targets.polarity,
    ...(targets.flavour === undefined ? {} : { flavour: targets.flavour }),
    model: targets.model ?? sheet.model,
    corner: targets.corner ?? sheet.corner,
    ...(temperature === undefined ? {} : { temperature }),
    id: targets.id,
    [constraint]: targets[constraint],
    ...(targets.maxFingerWidth === undefined ? {} : { maxFingerWidth: targets.maxFingerWidth }),
    l: targets.l,
    vds: targets.vds,
    vsb: targets.vsb,
  };
}
