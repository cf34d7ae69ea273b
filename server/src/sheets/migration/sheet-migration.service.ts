import { migrateTargets, type MigratedTargets, type TableSource } from '@channelwright/shared/device';
import { cornerNames, type DeviceResult, type DeviceTargets, type MigrateSheetRequest, type MigrationFigures, type SheetMigration } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { AuditService } from '../../audit/audit.service.js';
import { sheetAudit } from '../../audit/sheet-audit.js';
import { UnitOfWork } from '../../database/unit-of-work.js';
import type { ProcessViewer } from '../../processes/process-visibility.js';
import { ProcessesService, type ResolvedProcess } from '../../processes/processes.service.js';
import { computationColumns, computeDevice, type DeviceComputation } from '../device-computation.js';
import { DeviceEntity } from '../device.entity.js';
import { SheetTables } from '../sheet-tables.js';
import { SheetReader } from '../sheet-reader.js';
import { resultOf, targetsOf, toSheetSummary, type LoadedSheet } from '../sheet-response.js';
import { SheetEntity } from '../sheet.entity.js';

/** A device of the source with its moved targets and what the new process gives for them. */
interface MigratedRow {
  device: DeviceEntity;
  targets: DeviceTargets;
  moved: MigratedTargets;
  computation: DeviceComputation;
}

type SheetDefaults = Pick<SheetEntity, 'temperature' | 'corner' | 'model'>;

function figuresOf(result: DeviceResult | null, multiplier: number): MigrationFigures | null {
  if (!result) return null;
  return {
    w: result.w,
    l: result.l,
    area: result.w * result.l * multiplier,
    vgs: result.vgs,
    gmId: result.gmId,
    intrinsicGain: result.intrinsicGain,
    ft: result.ft,
    ioff: result.ioff === null ? null : result.ioff * multiplier,
  };
}

/**
 * "Migrate this sheet": every device's targets moved to another process (the engine's migrateTargets) and
 * sized there by the sheet's own computation, compared side by side with the source, and written as a new
 * sheet of the same project in one transaction; the source sheet is only read. Callers check access.
 */
@Injectable()
export class SheetMigrationService {
  constructor(
    private readonly unitOfWork: UnitOfWork,
    private readonly reader: SheetReader,
    private readonly processes: ProcessesService,
    private readonly audit: AuditService,
    private readonly tables: SheetTables,
  ) {}

  async migrate(sheetId: string, request: MigrateSheetRequest, editor: ProcessViewer): Promise<SheetMigration> {
    return this.unitOfWork.run(async (manager) => {
      const source = await this.reader.load(sheetId, manager);
      const target = await this.processes.resolveDefinition(request.processId, request.processVersion, manager, editor);
      // Table-model devices are sized from the target version's own tables (or wait for them, saying so).
      const defaults = this.defaultsOn(source, target);
      const tables = await this.tables.sourceFor({ model: defaults.model, processVersionId: target.versionId }, source.devices.map(targetsOf), manager);
      const planned = this.plan(source, target, request, tables);
      if (request.preview) return planned.answer;
      const summary = await this.write(manager, source, target, request, planned);
      return { ...planned.answer, sheet: summary };
    });
  }

  private defaultsOn(source: LoadedSheet, target: ResolvedProcess): SheetDefaults {
    const { sheet } = source;
    return { temperature: sheet.temperature, corner: cornerNames(target.definition).includes(sheet.corner) ? sheet.corner : 'TT', model: sheet.model };
  }

  private plan(source: LoadedSheet, target: ResolvedProcess, request: MigrateSheetRequest, tables: TableSource | undefined): { answer: SheetMigration; rows: MigratedRow[]; defaults: SheetDefaults } {
    const from = source.process.definition;
    const to = target.definition;
    const defaults = this.defaultsOn(source, target);
    const rows = source.devices.map((device): MigratedRow => {
      const targets = targetsOf(device);
      const moved = migrateTargets(targets, from, to, { fixedLength: request.fixedLengths.includes(device.id), scaleVoltages: request.scaleVoltages, currentScale: request.currentScale });
      const computation = computeDevice(moved.targets, defaults, target, tables);
      return { device, targets, moved, computation };
    });
    const answer: SheetMigration = {
      sheet: null,
      from: { processName: source.process.name, version: source.process.version, vdd: from.vdd },
      to: { processName: target.name, version: target.version, vdd: to.vdd },
      voltageScale: request.scaleVoltages ? to.vdd / from.vdd : 1,
      devices: rows.map(({ device, targets, moved, computation }) => ({
        sourceDeviceId: device.id,
        name: targets.name,
        lengthScale: moved.lengthScale,
        notes: [...moved.notes, ...(defaults.corner !== source.sheet.corner ? [`${to.name} has no corner ${source.sheet.corner}: the new sheet uses TT`] : [])],
        old: figuresOf(resultOf(device), targets.multiplier),
        new: figuresOf(computation.result, targets.multiplier),
        error: computation.error ? { code: computation.error.code, message: computation.error.message } : null,
      })),
    };
    return { answer, rows, defaults };
  }

  private async write(manager: EntityManager, source: LoadedSheet, target: ResolvedProcess, request: MigrateSheetRequest, planned: { rows: MigratedRow[]; defaults: SheetDefaults }) {
    const { sheet } = source;
    const created = await manager.getRepository(SheetEntity).save(
      manager.create(SheetEntity, {
        projectId: sheet.projectId,
        name: request.name ?? `${sheet.name} on ${target.name}`.slice(0, 100),
        description: `Migrated from "${sheet.name}" on ${source.process.name} v${source.process.version}.${sheet.description ? ` ${sheet.description}` : ''}`.slice(0, 2000),
        processVersionId: target.versionId,
        ...planned.defaults,
        leakageBudget: sheet.leakageBudget,
        offsetBudgets: sheet.offsetBudgets,
      }),
    );
    const devices = manager.getRepository(DeviceEntity);
    for (const { device, moved, computation } of planned.rows) {
      await devices.insert({ sheetId: created.id, position: device.position, name: moved.targets.name, targets: JSON.stringify(moved.targets), ...computationColumns(computation) });
    }
    await this.audit.record(manager, sheetAudit('sheet.migrated', created, undefined, { fromSheetId: sheet.id, fromProcessVersionId: source.process.versionId, processVersionId: target.versionId, devices: planned.rows.length }));
    return toSheetSummary(await this.reader.load(created.id, manager));
  }
}
