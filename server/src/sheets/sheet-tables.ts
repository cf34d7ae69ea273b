import { computeCorners, type CornersCall, type TableSource } from '@channelwright/shared/device';
import type { DeviceTargets } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { CharacterisationTables } from '../characterisation/tables/characterisation-tables.service.js';
import type { SheetEntity } from './sheet.entity.js';

/** The model a device is sized with: its own, else its sheet's. */
export function modelOf(targets: Pick<DeviceTargets, 'model'>, sheet: Pick<SheetEntity, 'model'>): string {
  return targets.model ?? sheet.model;
}

/** The tables a sheet's devices are sized from when they use the table model (from the characterisation module). */
@Injectable()
export class SheetTables {
  constructor(private readonly tables: CharacterisationTables) {}

  /** The tables of the devices among `targets` that use the table model, on the sheet's version; undefined when none does. */
  async sourceFor(sheet: Pick<SheetEntity, 'model' | 'processVersionId'>, targets: readonly Pick<DeviceTargets, 'model' | 'polarity' | 'flavour'>[], manager?: EntityManager): Promise<TableSource | undefined> {
    const devices = targets.filter((t) => modelOf(t, sheet) === 'table').map((t) => ({ polarity: t.polarity, flavour: t.flavour }));
    return devices.length === 0 ? undefined : this.tables.tableSource(sheet.processVersionId, devices, manager);
  }

  /**
   * The corners call the sheet analyses make (corner matrix, leakage) with the tables of those of `devices` that
   * use the table model bound; undefined when none does (the analyses then call computeCorners as it is). A device
   * whose table is missing gets the engine's TABLE_NOT_READY / TABLE_NOT_CHARACTERISED message in its row.
   */
  async cornersCallFor(sheet: Pick<SheetEntity, 'model' | 'processVersionId'>, devices: readonly Pick<DeviceTargets, 'model' | 'polarity' | 'flavour'>[], manager?: EntityManager): Promise<CornersCall | undefined> {
    const tables = await this.sourceFor(sheet, devices, manager);
    return tables ? (request, process) => computeCorners(request, process, tables) : undefined;
  }

  /** The SHA-256 of the current table of each device of a version (what makes a stored table result stale). */
  currentHashes(processVersionId: string, manager?: EntityManager): Promise<Map<string, string>> {
    return this.tables.currentHashes(processVersionId, manager);
  }
}
