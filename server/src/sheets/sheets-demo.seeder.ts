import { createSheetRequestSchema, deviceTargetsSchema } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { AppConfigService } from '../config/app-config.service.js';
import type { EntityManager } from 'typeorm';
import { ProcessesService } from '../processes/processes.service.js';
import { WRENMOSS_PROJECT } from '../projects/projects-demo.seeder.js';
import { ProjectsService } from '../projects/projects.service.js';
import type { DemoSeeder } from '../seed/demo-seeder.js';
import { WRENMOSS_PROCESS_NAME, WRENMOSS_SHEETS } from './demo/wrenmoss-sheets.js';
import { computationColumns, computeDevice } from './device-computation.js';
import { budgetColumns } from './sheet-budgets.js';
import { DeviceEntity } from './device.entity.js';
import { SheetTables } from './sheet-tables.js';
import { SheetEntity } from './sheet.entity.js';

/**
 * The three invented Wrenmoss sheets on BF180-G's latest version, every result computed and stored. After the project
 * (20) and the demo's characterisations (25): when the demo is characterised (DEMO_CHARACTERISATION), the sheets use the
 * table model and their devices wait for the tables (and are computed when they come); otherwise the all-region model.
 */
@Injectable()
export class SheetsDemoSeeder implements DemoSeeder {
  readonly order = 30;

  constructor(
    private readonly processes: ProcessesService,
    private readonly projects: ProjectsService,
    private readonly tables: SheetTables,
    private readonly config: AppConfigService,
  ) {}

  async seed(manager: EntityManager): Promise<void> {
    const projectId = (await this.projects.idByName(WRENMOSS_PROJECT.name, manager))!;
    const profileId = (await this.processes.profileIdByName(WRENMOSS_PROCESS_NAME, manager))!;
    const process = await this.processes.resolveDefinition(profileId, undefined, manager);
    const model = this.config.characterisation.demo ? 'table' : 'all-region';
    for (const demo of WRENMOSS_SHEETS) {
      const { processId: _id, processVersion: _version, leakageBudget, offsetBudgets, ...fields } = createSheetRequestSchema.parse({ ...demo.sheet, model, processId: profileId });
      const sheet = await manager
        .getRepository(SheetEntity)
        .save(manager.create(SheetEntity, { ...fields, ...budgetColumns({ leakageBudget, offsetBudgets }), projectId, processVersionId: process.versionId }));
      const devices = demo.devices.map((input) => deviceTargetsSchema.parse(input));
      const tables = await this.tables.sourceFor(sheet, devices, manager);
      for (const [position, targets] of devices.entries()) {
        const computation = computeDevice(targets, sheet, process, tables);
        await manager.getRepository(DeviceEntity).insert({ sheetId: sheet.id, position, name: targets.name, targets: JSON.stringify(targets), ...computationColumns(computation) });
      }
    }
  }
}
