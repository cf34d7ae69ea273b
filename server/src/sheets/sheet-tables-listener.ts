import { Injectable } from '@nestjs/common';
import { In } from 'typeorm';
import { sheetAudit } from '../audit/sheet-audit.js';
import { AuditService } from '../audit/audit.service.js';
import type { TablesListener } from '../characterisation/tables/tables-listener.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { computationColumns, computeDevice } from './device-computation.js';
import { DeviceEntity } from './device.entity.js';
import { SheetReader } from './sheet-reader.js';
import { errorOf, targetsOf, WAITING_FOR_TABLE } from './sheet-response.js';
import { SheetTables } from './sheet-tables.js';
import { SheetEntity } from './sheet.entity.js';

/**
 * When a process version gets new tables, the devices of its sheets that were waiting for a table (stored with
 * TABLE_NOT_READY or TABLE_NOT_CHARACTERISED) are computed, one transaction per sheet, recorded as a recompute by the
 * system. Devices that had a result keep it (it is marked stale if the table changed: a result someone reviewed is
 * never replaced behind their back).
 */
@Injectable()
export class SheetTablesListener implements TablesListener {
  constructor(
    private readonly unitOfWork: UnitOfWork,
    private readonly reader: SheetReader,
    private readonly tables: SheetTables,
    private readonly audit: AuditService,
  ) {}

  async tablesChanged(processVersionId: string): Promise<void> {
    const sheets = await this.unitOfWork.manager.getRepository(SheetEntity).find({ select: { id: true }, where: { processVersionId: In([processVersionId]) } });
    for (const { id } of sheets) {
      await this.unitOfWork.run(async (manager) => {
        const loaded = await this.reader.load(id, manager);
        const waiting = loaded.devices.filter((device) => WAITING_FOR_TABLE.has(errorOf(device)?.code ?? '') && device.processVersionId === loaded.sheet.processVersionId);
        if (waiting.length === 0) return;
        const source = await this.tables.sourceFor(loaded.sheet, waiting.map(targetsOf), manager);
        for (const device of waiting) {
          const computation = computeDevice(targetsOf(device), loaded.sheet, loaded.process, source);
          await manager.getRepository(DeviceEntity).save(Object.assign(device, computationColumns(computation), { version: device.version + 1 }));
        }
        await this.audit.record(manager, { ...sheetAudit('sheet.recomputed', loaded.sheet, undefined, { devices: waiting.map((d) => d.name), reason: 'tables characterised' }), actor: null });
      });
    }
  }
}
