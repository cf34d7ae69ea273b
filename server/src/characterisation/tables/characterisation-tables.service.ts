import { EngineError, type LookupTable, type PreparedTable, type TableChoice, type TableGrid, type TableSource } from '@channelwright/shared/device';
import type { Polarity, TableRef } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { type EntityManager, In, type Repository } from 'typeorm';
import { AppConfigService } from '../../config/app-config.service.js';
import { CharacterisationJobEntity } from '../jobs/characterisation-job.entity.js';
import { CharacterisationJobStore } from '../jobs/characterisation-job-store.js';
import type { PlannedDevice } from '../jobs/characterisation-plan.js';
import { CharacterisationTableEntity } from './characterisation-table.entity.js';
import { TableCorruptError, unpackTable } from '../table-storage.js';
import { PreparedTableCache } from './prepared-table-cache.js';

/** A device of a process version: its polarity and flavour (undefined or null for the plain NMOS or PMOS). */
export interface DeviceKind {
  polarity: Polarity;
  flavour?: string | null;
}

/** A stored table (its bytes are in chunks). */
export type TableRow = Omit<CharacterisationTableEntity, 'job'>;

/** The key of a device kind in maps: "nmos/", "nmos/native". */
export function deviceKey(device: DeviceKind): string {
  return `${device.polarity}/${device.flavour ?? ''}`;
}

function label(device: DeviceKind): string {
  return device.flavour ? `${device.polarity.toUpperCase()} ${device.flavour}` : device.polarity.toUpperCase();
}

export function tableRefOf(row: TableRow): TableRef {
  return { id: row.id, sha256: row.sha256, characterisationId: row.jobId, model: row.modelName };
}

/**
 * The tables of process versions as the table model uses them. A device's current table is the newest one of a
 * finished characterisation of its version; decoded tables ready for lookups are kept in a bounded cache by hash.
 * What the other modules use (compute, sheets), exported by the characterisation module.
 */
@Injectable()
export class CharacterisationTables {
  private readonly cache: PreparedTableCache;

  constructor(
    @InjectRepository(CharacterisationTableEntity) private readonly tables: Repository<CharacterisationTableEntity>,
    private readonly store: CharacterisationJobStore,
    config: AppConfigService,
  ) {
    this.cache = new PreparedTableCache(config.characterisation.tableCacheBytes, (id) => store.tableBytes(id));
  }

  /** Every table of some versions (no data), current ones marked: per version, the current table of each device first. */
  async tablesOf(processVersionIds: readonly string[], manager: EntityManager = this.tables.manager): Promise<{ row: TableRow; current: boolean }[]> {
    if (processVersionIds.length === 0) return [];
    const rows = await manager
      .getRepository(CharacterisationTableEntity)
      .createQueryBuilder('t')
      .innerJoin(CharacterisationJobEntity, 'job', 'job.id = t.jobId')
      .where('t.processVersionId IN (:...ids)', { ids: [...processVersionIds] })
      .andWhere('job.status = :done', { done: 'done' })
      .orderBy('job.finishedAt', 'DESC')
      .addOrderBy('t.createdAt', 'DESC')
      .getMany();
    const seen = new Set<string>();
    return rows.map((row) => {
      const keyOfRow = `${row.processVersionId}|${deviceKey(row)}`;
      const current = !seen.has(keyOfRow);
      seen.add(keyOfRow);
      return { row, current };
    });
  }

  /** The current table of each device of a version, by deviceKey. */
  async currentTables(processVersionId: string, manager?: EntityManager): Promise<Map<string, TableRow>> {
    const all = await this.tablesOf([processVersionId], manager);
    return new Map(all.filter((t) => t.current).map((t) => [deviceKey(t.row), t.row]));
  }

  /** The SHA-256 of the current table of each device of a version, by deviceKey (what makes a stored table result stale). */
  async currentHashes(processVersionId: string, manager?: EntityManager): Promise<Map<string, string>> {
    return new Map([...(await this.currentTables(processVersionId, manager))].map(([key, row]) => [key, row.sha256]));
  }

  /**
   * Where the table model finds the tables of these devices of a version, loaded and ready: a device without a
   * current table gets TABLE_NOT_READY while a characterisation of the version is queued or running, else
   * TABLE_NOT_CHARACTERISED (both name the field polarity).
   */
  async tableSource(processVersionId: string, devices: readonly DeviceKind[], manager: EntityManager = this.tables.manager): Promise<TableSource> {
    const current = await this.currentTables(processVersionId, manager);
    const choices = new Map<string, TableChoice | EngineError>();
    for (const device of devices) {
      const row = current.get(deviceKey(device));
      if (row && !choices.has(deviceKey(device))) choices.set(deviceKey(device), await this.choiceOf(row));
    }
    const pending = current.size === devices.length ? [] : await manager.getRepository(CharacterisationJobEntity).find({ where: { processVersionId, status: In(['queued', 'running']) }, order: { createdAt: 'ASC' } });
    return (device) => {
      const choice = choices.get(deviceKey(device));
      if (choice instanceof EngineError) throw choice;
      if (choice) return choice;
      const waiting = pending.find((job) => (JSON.parse(job.plan) as PlannedDevice[]).some((d) => d.polarity === device.polarity && d.flavour === (device.flavour ?? null)));
      if (waiting) {
        const percent = waiting.total > 0 ? Math.floor((100 * waiting.done) / waiting.total) : 0;
        throw new EngineError('TABLE_NOT_READY', `The ${label(device)} table of this process version is not ready: its characterisation is ${waiting.status} (${percent} % done); this device is computed when it finishes`, 'polarity');
      }
      throw new EngineError('TABLE_NOT_CHARACTERISED', `This process version has no ${label(device)} table: a maintainer characterises its model card first (or choose an analytic model)`, 'polarity');
    };
  }

  /**
   * The current table of one device of a version as it was characterised (currents, not the logarithms a prepared table
   * holds), with its reference: for reading its points as curves (an extraction). The refusals of tableSource.
   */
  async storedTable(processVersionId: string, device: DeviceKind): Promise<{ table: LookupTable; ref: TableRef }> {
    const source = await this.tableSource(processVersionId, [device]);
    const { ref } = source({ polarity: device.polarity, flavour: device.flavour ?? undefined });
    return { table: await unpackTable(await this.store.tableBytes(ref.id), ref.sha256), ref };
  }

  /** A stored table ready for the table model, or the reason it cannot be read (its content no longer has its hash). */
  private async choiceOf(row: TableRow): Promise<TableChoice | EngineError> {
    try {
      return { prepared: await this.prepared(row), ref: tableRefOf(row) };
    } catch (error) {
      if (error instanceof TableCorruptError) return new EngineError('TABLE_CORRUPT', `The stored ${row.modelName} table is damaged (${error.message}); characterise the version again`, 'polarity');
      throw error;
    }
  }

  /** A table ready for lookups (from the cache, or loaded, checked against its hash and prepared). */
  prepared(row: Pick<TableRow, 'id' | 'sha256'>): Promise<PreparedTable> {
    return this.cache.get(row);
  }

  /** The grid of a stored table. */
  gridOf(row: TableRow): TableGrid {
    return JSON.parse(row.grid) as TableGrid;
  }
}
