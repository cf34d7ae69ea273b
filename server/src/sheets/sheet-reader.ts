import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { In, type DataSource, type EntityManager } from 'typeorm';
import { notFound, type DomainError } from '../common/errors/domain-error.js';
import { ProcessProfileEntity } from '../processes/process-profile.entity.js';
import { ProcessVersionEntity } from '../processes/process-version.entity.js';
import { ProcessesService, type ResolvedProcess } from '../processes/processes.service.js';
import { DeviceEntity } from './device.entity.js';
import type { LoadedSheet } from './sheet-response.js';
import { SheetEntity } from './sheet.entity.js';

export const sheetNotFound = (): DomainError => notFound('SHEET_NOT_FOUND', 'There is no sheet with this id');

/** Reads sheets with their process version and devices, on the manager given (inside a transaction, or not). */
@Injectable()
export class SheetReader {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    private readonly processes: ProcessesService,
  ) {}

  async load(sheetId: string, manager: EntityManager = this.dataSource.manager): Promise<LoadedSheet> {
    const sheet = await manager.getRepository(SheetEntity).findOneBy({ id: sheetId });
    if (!sheet) throw sheetNotFound();
    const [loaded] = await this.assemble(manager, [sheet]);
    return loaded;
  }

  /** Every sheet of a project, by name. */
  async loadProject(projectId: string, manager: EntityManager = this.dataSource.manager): Promise<LoadedSheet[]> {
    const sheets = await manager.getRepository(SheetEntity).find({ where: { projectId }, order: { name: 'ASC', createdAt: 'ASC' } });
    return this.assemble(manager, sheets);
  }

  private async assemble(manager: EntityManager, sheets: SheetEntity[]): Promise<LoadedSheet[]> {
    if (sheets.length === 0) return [];
    const devices = await manager.getRepository(DeviceEntity).find({ where: { sheetId: In(sheets.map((s) => s.id)) }, order: { position: 'ASC' } });
    const processes = new Map<string, ResolvedProcess>();
    for (const versionId of new Set(sheets.map((s) => s.processVersionId))) processes.set(versionId, await this.processes.resolveVersion(versionId, manager));
    const profiles = await manager.getRepository(ProcessProfileEntity).findBy({ id: In([...processes.values()].map((p) => p.profileId)) });
    const latest = new Map(profiles.map((profile) => [profile.id, profile.latestVersion]));
    const versionIds = [...new Set([...devices.map((d) => d.processVersionId), ...processes.keys()])];
    const versions = await manager.getRepository(ProcessVersionEntity).find({ select: { id: true, number: true }, where: { id: In(versionIds) } });
    const versionNumbers = new Map(versions.map((version) => [version.id, version.number]));
    return sheets.map((sheet) => {
      const process = processes.get(sheet.processVersionId)!;
      return {
        sheet,
        process,
        latestVersion: latest.get(process.profileId) ?? process.version,
        devices: devices.filter((device) => device.sheetId === sheet.id),
        versionNumbers,
      };
    });
  }
}
