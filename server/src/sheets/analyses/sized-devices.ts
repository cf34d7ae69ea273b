import type { SizedDevice } from '@channelwright/shared/device';
import type { DeviceResult, DeviceTargets } from '@channelwright/shared/schemas';
import { DomainError } from '../../common/errors/domain-error.js';
import { errorOf, resultOf, targetsOf, type LoadedSheet } from '../sheet-response.js';

/** A sheet device with a stored result: what the analyses check, sized and drawn as it was stored. */
export interface SizedSheetDevice {
  device: { id: string; version: number; targets: DeviceTargets; result: DeviceResult };
  size: SizedDevice & { reference: { id: number; vgs: number }; multiplier: number };
}

/**
 * The devices of a sheet that have a stored result (all, or those of `ids`, in sheet order), each with its
 * drawn size and bias from that result; the others are skipped with the reason. 404 DEVICE_NOT_FOUND (field
 * deviceIds) for an id that is not the sheet's.
 */
export function sizedDevicesOf(loaded: LoadedSheet, ids?: readonly string[]): { sized: SizedSheetDevice[]; skipped: Array<{ deviceId: string; name: string; reason: string }> } {
  const unknown = ids?.find((id) => !loaded.devices.some((d) => d.id === id));
  if (unknown !== undefined) throw new DomainError('DEVICE_NOT_FOUND', `This sheet has no device with the id ${unknown}`, 404, 'deviceIds');
  const chosen = ids ? loaded.devices.filter((d) => ids.includes(d.id)) : loaded.devices;
  const sized: SizedSheetDevice[] = [];
  const skipped: Array<{ deviceId: string; name: string; reason: string }> = [];
  for (const entity of chosen) {
    const targets = targetsOf(entity);
    const result = resultOf(entity);
    if (!result) {
      // A device waiting for its table says so (the engine's TABLE_NOT_READY / TABLE_NOT_CHARACTERISED message).
      skipped.push({ deviceId: entity.id, name: targets.name, reason: `Not sized: ${errorOf(entity)?.message ?? 'the engine gave no result for its targets'}` });
      continue;
    }
    sized.push({
      device: { id: entity.id, version: entity.version, targets, result },
      size: {
        polarity: targets.polarity,
        ...(targets.flavour === undefined ? {} : { flavour: targets.flavour }),
        model: result.model,
        w: result.w,
        l: result.l,
        vds: result.vds,
        vsb: result.vsb,
        reference: { id: result.id, vgs: result.vgs },
        multiplier: targets.multiplier,
      },
    });
  }
  return { sized, skipped };
}
