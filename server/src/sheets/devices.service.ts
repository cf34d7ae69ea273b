import type { Device, DeviceTargets, UpdateDeviceRequest } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { deviceAudit } from '../audit/sheet-audit.js';
import { AuditService } from '../audit/audit.service.js';
import { conflict, notFound } from '../common/errors/domain-error.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { assertVersion } from '../projects/stale-edit.js';
import { assertKnownToProcess, computationColumns, computeDevice } from './device-computation.js';
import { mergeTargets } from './device-targets.js';
import { DeviceEntity } from './device.entity.js';
import { SheetReader } from './sheet-reader.js';
import { SheetTables } from './sheet-tables.js';
import { SheetEntity } from './sheet.entity.js';
import { targetsOf, toDevice, type LoadedSheet } from './sheet-response.js';

const deviceNotFound = () => notFound('DEVICE_NOT_FOUND', 'This sheet has no device with this id');

/**
 * Devices of a sheet. Every create and edit computes the result with the engine on the sheet's process
 * version and stores it with the device, in the same transaction. Callers check access.
 */
@Injectable()
export class DevicesService {
  constructor(
    private readonly unitOfWork: UnitOfWork,
    private readonly reader: SheetReader,
    private readonly audit: AuditService,
    private readonly tables: SheetTables,
  ) {}

  async list(sheetId: string): Promise<Device[]> {
    const loaded = await this.reader.load(sheetId);
    return loaded.devices.map((device) => toDevice(device, loaded));
  }

  /** 409 DEVICE_NAME_TAKEN when the sheet has a device of this name; 400 for a corner or flavour the process lacks. */
  create(sheetId: string, targets: DeviceTargets): Promise<Device> {
    return this.unitOfWork.run(async (manager) => {
      const loaded = await this.reader.load(sheetId, manager);
      assertNameFree(loaded, targets.name);
      const computation = computeDevice(targets, loaded.sheet, loaded.process, await this.tables.sourceFor(loaded.sheet, [targets], manager));
      assertKnownToProcess(computation);
      const position = Math.max(-1, ...loaded.devices.map((d) => d.position)) + 1;
      const repository = manager.getRepository(DeviceEntity);
      const device = await repository.save(repository.create({ sheetId, position, name: targets.name, targets: JSON.stringify(targets), ...computationColumns(computation) }));
      await this.audit.record(manager, deviceAudit('device.created', loaded.sheet, device, undefined, targets));
      return this.response(manager, sheetId, device.id);
    });
  }

  /** The targets merged with the change, recomputed; 409 STALE_EDIT (nothing written) when `version` is not the stored one. */
  update(sheetId: string, deviceId: string, change: UpdateDeviceRequest): Promise<Device> {
    return this.unitOfWork.run(async (manager) => {
      const loaded = await this.reader.load(sheetId, manager);
      const device = loaded.devices.find((d) => d.id === deviceId);
      if (!device) throw deviceNotFound();
      assertVersion('device', device, change.version);
      const before = targetsOf(device);
      const targets = mergeTargets(before, change);
      if (targets.name !== device.name) assertNameFree(loaded, targets.name);
      const computation = computeDevice(targets, loaded.sheet, loaded.process, await this.tables.sourceFor(loaded.sheet, [targets], manager));
      assertKnownToProcess(computation);
      await manager.getRepository(DeviceEntity).save(Object.assign(device, { name: targets.name, targets: JSON.stringify(targets), ...computationColumns(computation), version: device.version + 1 }));
      await this.audit.record(manager, deviceAudit('device.updated', loaded.sheet, device, before, targets));
      return this.response(manager, sheetId, deviceId);
    });
  }

  /** With `version`, 409 STALE_EDIT when it is not the stored one. */
  async remove(sheetId: string, deviceId: string, version: number | undefined): Promise<void> {
    await this.unitOfWork.run(async (manager) => {
      const device = await manager.getRepository(DeviceEntity).findOneBy({ id: deviceId, sheetId });
      if (!device) throw deviceNotFound();
      assertVersion('device', device, version);
      await manager.getRepository(DeviceEntity).delete({ id: deviceId });
      await this.audit.record(manager, deviceAudit('device.deleted', await manager.getRepository(SheetEntity).findOneByOrFail({ id: sheetId }), device, targetsOf(device)));
    });
  }

  private async response(manager: EntityManager, sheetId: string, deviceId: string): Promise<Device> {
    const loaded = await this.reader.load(sheetId, manager);
    return toDevice(loaded.devices.find((d) => d.id === deviceId)!, loaded);
  }
}

function assertNameFree(loaded: LoadedSheet, name: string): void {
  if (loaded.devices.some((device) => device.name === name)) throw conflict('DEVICE_NAME_TAKEN', `This sheet already has a device named ${name}`, 'name');
}
