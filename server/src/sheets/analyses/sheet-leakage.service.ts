import { ENGINE_VERSION } from '@channelwright/shared/device';
import type { SheetLeakage } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { leakageBudgetOf } from '../sheet-budgets.js';
import { SheetReader } from '../sheet-reader.js';
import { SheetTables } from '../sheet-tables.js';
import { AnalysisPool } from './analysis-pool.js';
import { sizedDevicesOf } from './sized-devices.js';

/** GET /api/sheets/:id/leakage: the sheet's off-state leakage over temperature and corners against its budget. Callers check access. */
@Injectable()
export class SheetLeakageService {
  constructor(
    private readonly reader: SheetReader,
    private readonly pool: AnalysisPool,
    private readonly tables: SheetTables,
  ) {}

  async leakage(sheetId: string): Promise<SheetLeakage> {
    const loaded = await this.reader.load(sheetId);
    const { sized, skipped } = sizedDevicesOf(loaded);
    const devices = sized.map(({ device, size }) => ({ ...size, key: device.id, name: device.targets.name, vgs: size.reference.vgs }));
    const corners = await this.tables.cornersCallFor(loaded.sheet, devices);
    const answer = await this.pool.leakage({ process: loaded.process.definition, processId: loaded.process.profileId, devices, budget: leakageBudgetOf(loaded.sheet), engineVersion: ENGINE_VERSION, corners });
    return { ...answer, skipped: [...skipped, ...answer.skipped] };
  }
}
