import { cornerShiftOf, ENGINE_VERSION, matrixColumns, type MatrixDevice } from '@channelwright/shared/device';
import type { MatrixRow, SheetCornersRequest, SheetCornersResponse } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { SheetReader } from '../sheet-reader.js';
import { SheetTables } from '../sheet-tables.js';
import { AnalysisPool } from './analysis-pool.js';
import { sizedDevicesOf } from './sized-devices.js';

/** POST /api/sheets/:id/corners: the sheet's sized devices over corners × temperatures (× supply). Callers check access. */
@Injectable()
export class CornerMatrixService {
  constructor(
    private readonly reader: SheetReader,
    private readonly pool: AnalysisPool,
    private readonly tables: SheetTables,
  ) {}

  async matrix(sheetId: string, request: SheetCornersRequest): Promise<SheetCornersResponse> {
    const loaded = await this.reader.load(sheetId);
    const process = loaded.process.definition;
    request.corners?.forEach((corner, index) => cornerShiftOf(process, 'nmos', corner, `corners.${index}`));
    const columns = matrixColumns(process, request);
    const { sized, skipped } = sizedDevicesOf(loaded, request.deviceIds);
    const devices: MatrixDevice[] = sized.map(({ device, size }) => ({ ...size, limits: device.targets.limits ?? [] }));
    const corners = await this.tables.cornersCallFor(loaded.sheet, devices);
    const cells = await this.pool.matrixRows({ process, processId: loaded.process.profileId, devices, bias: request.bias, columns, corners });
    const rows: MatrixRow[] = sized.map(({ device, size }, index) => ({
      deviceId: device.id,
      name: device.targets.name,
      polarity: size.polarity,
      ...(size.flavour === undefined ? {} : { flavour: size.flavour }),
      model: size.model,
      w: size.w,
      l: size.l,
      vds: size.vds,
      reference: size.reference,
      limits: device.targets.limits ?? [],
      ...cells[index],
    }));
    return { bias: request.bias, engineVersion: ENGINE_VERSION, columns, rows, skipped };
  }
}
