import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, type EntityManager, type Repository } from 'typeorm';
import { notFound, type DomainError } from '../common/errors/domain-error.js';
import { ProcessesService, type ResolvedProcess } from '../processes/processes.service.js';
import { DeviceEntity } from './device.entity.js';
import type { LoadedSheet } from './sheet-response.js';
import { SheetTables } from './sheet-tables.js';
import { SheetEntity } from './sheet.entity.js';

export const sheetNotFound = (): DomainError => notFound('SHEET_NOT_FOUND', 'There is no sheet with this id');

/** Reads sheets with their process version and devices, on the manager given (inside a transaction, or not). */
@Injectable()
export class SheetReader {
  constructor(
    @InjectRepository(SheetEntity) private readonly sheets: Repository<SheetEntity>,
    private readonly processes: ProcessesService,
    private readonly tables: SheetTables,
  ) {}

  async load(sheetId: string, manager: EntityManager = this.sheets.manager): Promise<LoadedSheet> {
    const sheet = await manager.getRepository(SheetEntity).findOneBy({ id: sheetId });
    if (!sheet) throw sheetNotFound();
    const [loaded] = await this.assemble(manager, [sheet]);
    return loaded;
  }

  /** Every sheet of a project, by name. */
  async loadProject(projectId: string, manager: EntityManager = this.sheets.manager): Promise<LoadedSheet[]> {
    const sheets = await manager.getRepository(SheetEntity).find({ where: { projectId }, order: { name: 'ASC', createdAt: 'ASC' } });
    return this.assemble(manager, sheets);
  }

  /** The sheet's name, or null when there is no such sheet. */
  async nameOf(sheetId: string, manager: EntityManager = this.sheets.manager): Promise<string | null> {
    return (await manager.getRepository(SheetEntity).findOne({ select: { id: true, name: true }, where: { id: sheetId } }))?.name ?? null;
  }

  private async assemble(manager: EntityManager, sheets: SheetEntity[]): Promise<LoadedSheet[]> {
    if (sheets.length === 0) return [];
    const devices = await manager.getRepository(DeviceEntity).find({ where: { sheetId: In(sheets.map((s) => s.id)) }, order: { position: 'ASC' } });
    const processes = new Map<string, ResolvedProcess>();
    for (const versionId of new Set(sheets.map((s) => s.processVersionId))) processes.set(versionId, await this.processes.resolveVersion(versionId, manager));
    const facts = await this.processes.versionFacts([...devices.map((d) => d.processVersionId), ...processes.keys()], manager);
    const versionNumbers = new Map([...facts].map(([id, fact]) => [id, { number: fact.number, name: fact.profileName }]));
    const tableHashes = new Map<string, Map<string, string>>();
    for (const versionId of processes.keys()) tableHashes.set(versionId, await this.tables.currentHashes(versionId, manager));
    return sheets.map((sheet) => {
      const process = processes.get(sheet.processVersionId)!;
      return {
        sheet,
        process,
        latestVersion: facts.get(sheet.processVersionId)?.latestVersion ?? process.version,
        devices: devices.filter((device) => device.sheetId === sheet.id),
        versionNumbers,
        tableHashes: tableHashes.get(sheet.processVersionId) ?? new Map(),
      };
    });
  }
}
