import type { CreateSheetRequest, Sheet, SheetSummary, UpdateSheetRequest } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { ModuleRef } from '@nestjs/core';
import { AuditService } from '../audit/audit.service.js';
import { sheetAudit, sheetFields } from '../audit/sheet-audit.js';
import { registeredUnder } from '../common/extension-points.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import type { ProcessViewer } from '../processes/process-visibility.js';
import { ProcessesService } from '../processes/processes.service.js';
import { ProjectsService } from '../projects/projects.service.js';
import { assertVersion } from '../projects/stale-edit.js';
import { computationColumns, computeDevice } from './device-computation.js';
import { budgetColumns } from './sheet-budgets.js';
import { DeviceEntity } from './device.entity.js';
import { assertSheetCorner, chosenProcess } from './sheet-process-choice.js';
import { sheetNotFound, SheetReader } from './sheet-reader.js';
import { targetsOf, toSheet, toSheetSummary } from './sheet-response.js';
import { SHEET_REMOVAL_CHECKS, type SheetRemovalCheck } from './sheet-removal-check.js';
import { SheetTables } from './sheet-tables.js';
import { SheetUsage } from './sheet-usage.js';
import { SheetEntity } from './sheet.entity.js';

/** Sheets of a project: create on a process version, edit (or move to another version), delete, recompute. Callers check access. */
@Injectable()
export class SheetsService {
  constructor(
    private readonly unitOfWork: UnitOfWork,
    private readonly processes: ProcessesService,
    private readonly projects: ProjectsService,
    private readonly reader: SheetReader,
    private readonly usage: SheetUsage,
    private readonly audit: AuditService,
    private readonly moduleRef: ModuleRef,
    private readonly tables: SheetTables,
  ) {}

  async list(projectId: string): Promise<SheetSummary[]> {
    return (await this.reader.loadProject(projectId)).map(toSheetSummary);
  }

  async get(sheetId: string): Promise<Sheet> {
    return toSheet(await this.reader.load(sheetId));
  }

  /** The process profiles the project's sheets are on (for the project's audit trail). */
  profileIdsOfProject(projectId: string): Promise<string[]> {
    return this.usage.profileIdsOfProjects([projectId]);
  }

  async create(projectId: string, request: CreateSheetRequest, editor: ProcessViewer): Promise<Sheet> {
    const id = await this.unitOfWork.run(async (manager) => {
      const process = (await chosenProcess(this.processes, manager, request, editor))!;
      assertSheetCorner(process.definition, request.corner);
      const { processId: _id, processVersion: _version, leakageBudget, offsetBudgets, ...fields } = request;
      const sheet = await manager.getRepository(SheetEntity).save(
        manager.create(SheetEntity, { ...fields, ...budgetColumns({ leakageBudget, offsetBudgets }), projectId, processVersionId: process.versionId }),
      );
      await this.audit.record(manager, sheetAudit('sheet.created', sheet, undefined, sheetFields(sheet)));
      return sheet.id;
    });
    return this.get(id);
  }

  /**
   * Edits the sheet's own fields. A move to another process version keeps every stored result, which is
   * then stale until recompute. 409 STALE_EDIT (nothing written) when `version` is not the stored one.
   */
  async update(sheetId: string, request: UpdateSheetRequest, editor: ProcessViewer): Promise<Sheet> {
    await this.unitOfWork.run(async (manager) => {
      const loaded = await this.reader.load(sheetId, manager);
      const { sheet } = loaded;
      assertVersion('sheet', sheet, request.version);
      const process = (await chosenProcess(this.processes, manager, request, editor, loaded.process.profileId)) ?? loaded.process;
      const { version: _edited, processId: _id, processVersion: _number, leakageBudget, offsetBudgets, ...fields } = request;
      const corner = fields.corner ?? sheet.corner;
      assertSheetCorner(process.definition, corner);
      const before = sheetFields(sheet);
      await manager.getRepository(SheetEntity).save(Object.assign(sheet, fields, budgetColumns({ leakageBudget, offsetBudgets }), { processVersionId: process.versionId, version: sheet.version + 1 }));
      await this.audit.record(manager, sheetAudit('sheet.updated', sheet, before, sheetFields(sheet)));
    });
    return this.get(sheetId);
  }

  /** Deletes the sheet and its devices; with `version`, 409 STALE_EDIT when it is not the stored one. */
  async remove(sheetId: string, version: number | undefined): Promise<void> {
    await this.unitOfWork.run(async (manager) => {
      const sheet = await manager.getRepository(SheetEntity).findOneBy({ id: sheetId });
      if (!sheet) throw sheetNotFound();
      assertVersion('sheet', sheet, version);
      for (const check of registeredUnder<SheetRemovalCheck>(this.moduleRef, SHEET_REMOVAL_CHECKS)) await check.assertRemovable(manager, sheetId);
      await manager.getRepository(DeviceEntity).delete({ sheetId });
      await manager.getRepository(SheetEntity).delete({ id: sheetId });
      await this.audit.record(manager, sheetAudit('sheet.deleted', sheet, sheetFields(sheet)));
    });
  }

  /** Recomputes every device with the current engine on the sheet's process version, all in one transaction. */
  async recompute(sheetId: string): Promise<Sheet> {
    await this.unitOfWork.run(async (manager) => {
      const loaded = await this.reader.load(sheetId, manager);
      const devices = manager.getRepository(DeviceEntity);
      const tables = await this.tables.sourceFor(loaded.sheet, loaded.devices.map(targetsOf), manager);
      for (const device of loaded.devices) {
        const computation = computeDevice(targetsOf(device), loaded.sheet, loaded.process, tables);
        await devices.save(Object.assign(device, computationColumns(computation), { version: device.version + 1 }));
      }
      await this.audit.record(manager, sheetAudit('sheet.recomputed', loaded.sheet, undefined, { devices: loaded.devices.length, processVersionId: loaded.process.versionId }));
    });
    return this.get(sheetId);
  }
}
