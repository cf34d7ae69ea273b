import type { TableSource } from '@channelwright/shared/device';
import { readSheetCsv, type SheetCsvReading } from '@channelwright/shared/formats';
import { SHEET_CSV_COLUMNS, sheetCsvTitle, type DeviceTargets, type Problem, type SheetImportFields, type SheetImportResult } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { AuditService } from '../../audit/audit.service.js';
import { deviceAudit, sheetAudit } from '../../audit/sheet-audit.js';
import { UnitOfWork } from '../../database/unit-of-work.js';
import { importInvalid } from '../../processes/import/import-problems.js';
import { computationColumns, computeDevice, isBadReference, type DeviceComputation } from '../device-computation.js';
import { DeviceEntity } from '../device.entity.js';
import { SheetTables } from '../sheet-tables.js';
import { SheetReader } from '../sheet-reader.js';
import { targetsOf, type LoadedSheet } from '../sheet-response.js';
import { decodeCsvUpload } from './decode-csv-upload.js';
import { mergeImportedTargets } from './merge-imported-targets.js';

/** One row of the file as it would land: a new device, or an update of the device of that name. */
interface PlannedRow {
  row: number;
  targets: DeviceTargets;
  existing?: DeviceEntity;
  computation: DeviceComputation;
}

/** The column title (as the export writes it) of a field the engine named. */
function titleOfField(field: string | undefined): string {
  const key = field === 'vov' || field === 'gmId' || field === 'w' || field === 'vgs' ? `target${field[0].toUpperCase()}${field.slice(1)}` : (field ?? 'name');
  const column = SHEET_CSV_COLUMNS.find((c) => c.key === key) ?? SHEET_CSV_COLUMNS[0];
  return sheetCsvTitle(column);
}

/**
 * POST /api/sheets/:id/import: a CSV of devices (the export's columns) read, checked against the sheet's
 * process, and either shown (preview) or written in one transaction (apply). A file with any row in error
 * writes nothing unless only the good rows are asked for. Callers check access.
 */
@Injectable()
export class SheetImportService {
  constructor(
    private readonly unitOfWork: UnitOfWork,
    private readonly reader: SheetReader,
    private readonly audit: AuditService,
    private readonly tables: SheetTables,
  ) {}

  async import(sheetId: string, bytes: Uint8Array, fields: SheetImportFields): Promise<SheetImportResult> {
    const reading = readSheetCsv(decodeCsvUpload(bytes));
    if (fields.mode === 'preview') {
      const loaded = await this.reader.load(sheetId);
      return this.answer(reading, this.plan(loaded, reading, await this.tablesFor(loaded, reading)), 'preview', false);
    }
    return this.unitOfWork.run(async (manager) => {
      const loaded = await this.reader.load(sheetId, manager);
      const planned = this.plan(loaded, reading, await this.tablesFor(loaded, reading, manager));
      if (planned.problems.length > 0 && !fields.onlyValid) throw importInvalid(planned.problems);
      await this.write(manager, loaded, planned.rows, reading);
      return this.answer(reading, planned, 'apply', planned.rows.length > 0);
    });
  }

  /** The stored tables of the rows that use the table model (they are sized as the sheet's own devices are). */
  private tablesFor(loaded: LoadedSheet, reading: SheetCsvReading, manager?: EntityManager): Promise<TableSource | undefined> {
    return this.tables.sourceFor(loaded.sheet, reading.rows.map((r) => r.targets), manager);
  }

  private plan(loaded: LoadedSheet, reading: SheetCsvReading, tables: TableSource | undefined): { rows: PlannedRow[]; problems: Problem[] } {
    const problems: Problem[] = [...reading.problems];
    const rows: PlannedRow[] = [];
    for (const { row, targets: read } of reading.rows) {
      const existing = loaded.devices.find((device) => device.name === read.name);
      const targets = existing ? mergeImportedTargets(targetsOf(existing), read, reading.columns) : read;
      if (typeof targets === 'string') {
        problems.push({ row, field: 'Name', message: targets });
        continue;
      }
      const computation = computeDevice(targets, loaded.sheet, loaded.process, tables);
      if (isBadReference(computation)) {
        problems.push({ row, field: titleOfField(computation.error?.field), message: computation.error?.message ?? 'Not known to the sheet\'s process' });
        continue;
      }
      rows.push({ row, targets, existing, computation });
    }
    return { rows, problems: problems.toSorted((a, b) => (a.row ?? 0) - (b.row ?? 0)) };
  }

  private async write(manager: EntityManager, loaded: LoadedSheet, rows: PlannedRow[], reading: SheetCsvReading): Promise<void> {
    const repository = manager.getRepository(DeviceEntity);
    let position = Math.max(-1, ...loaded.devices.map((d) => d.position)) + 1;
    for (const { targets, existing, computation } of rows) {
      const columns = { name: targets.name, targets: JSON.stringify(targets), ...computationColumns(computation) };
      if (existing) {
        const before = targetsOf(existing);
        await repository.save(Object.assign(existing, columns, { version: existing.version + 1 }));
        await this.audit.record(manager, deviceAudit('device.updated', loaded.sheet, existing, before, targets));
      } else {
        const device = await repository.save(repository.create({ sheetId: loaded.sheet.id, position: position++, ...columns }));
        await this.audit.record(manager, deviceAudit('device.created', loaded.sheet, device, undefined, targets));
      }
    }
    await this.audit.record(manager, sheetAudit('sheet.imported', loaded.sheet, undefined, { rows: rows.length, delimiter: reading.delimiter, ignoredColumns: reading.ignoredColumns }));
  }

  private answer(reading: SheetCsvReading, planned: { rows: PlannedRow[]; problems: Problem[] }, mode: 'preview' | 'apply', applied: boolean): SheetImportResult {
    return {
      mode,
      applied,
      delimiter: reading.delimiter,
      created: planned.rows.filter((r) => !r.existing).map((r) => ({ row: r.row, name: r.targets.name })),
      updated: planned.rows.flatMap((r) => (r.existing ? [{ row: r.row, name: r.targets.name, deviceId: r.existing.id }] : [])),
      problems: planned.problems,
      ignoredColumns: reading.ignoredColumns,
    };
  }
}

