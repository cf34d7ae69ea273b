import type { CornersRequest } from '../schemas/corners.js';
import { cornerNames, type Process } from '../schemas/process.js';
import { type CornerAnalysis, type CornerPoint, extremesOf } from './corners.js';
import { EngineError, isEngineError } from './errors.js';
import { prepareDevice } from './resolve-device.js';
import { say } from './say.js';
import { widthScale } from './lookup-table.js';
import { tableFigures } from './table-figures.js';
import { tableLine } from './table-lookup.js';
import { operatingPointOnLine } from './table-operating-point.js';
import { vgsForCurrentDensity } from './table-sizing.js';
import type { TableChoice } from './table-source.js';
import { tableWarnings } from './table-warnings.js';

/**
 * POST /api/compute/corners with model "table": the sized device (w, l) at every corner × temperature, biased by
 * current (VGS solved from the table so that ID is the same everywhere) or by voltage (ID follows). Without a list,
 * the corners and temperatures the table was characterised at (corners in the process's order). A point the table
 * does not reach has its error instead of an operating point.
 */
export function cornersWithTable(request: CornersRequest, process: Process, choice: TableChoice): CornerAnalysis {
  const { grid } = choice.prepared;
  const characterised = new Set(grid.corners.map((name) => name.toLowerCase()));
  const corners = request.corners ?? cornerNames(process).filter((name) => characterised.has(name.toLowerCase()));
  const temperatures = request.temperatures ?? grid.temperatures;
  const points: CornerPoint[] = [];
  for (const [index, corner] of corners.entries()) {
    for (const temperature of temperatures) {
      const device = prepareDevice(process, request.polarity, { corner, temperature, flavour: request.flavour, cornerField: request.corners ? `corners.${index}` : 'corner' });
      try {
        const line = tableLine(choice.prepared, { corner, temperature, l: request.l, vds: request.vds, vsb: request.vsb });
        const fingers = request.fingers ?? 1;
        const vgs = request.bias === 'current' ? vgsForCurrentDensity(line, (request.id as number) / widthScale(grid, request.w, fingers), 'id') : (request.vgs as number);
        const { point } = tableFigures(operatingPointOnLine(line, request.w, vgs, fingers), line, device, choice.prepared);
        const warnings = tableWarnings(device, point, line);
        if (request.w < device.params.wmin) warnings.push({ code: 'W_BELOW_WMIN', message: `W = ${say(request.w, 'm')} is below wmin = ${say(device.params.wmin, 'm')}` });
        points.push({ corner, temperature, op: point, warnings });
      } catch (error) {
        if (!isEngineError(error)) throw error;
        points.push({ corner, temperature, op: null, warnings: [], error: { code: error.code, message: error.message } });
      }
    }
  }
  if (points.length === 0) throw new EngineError('CORNER_NOT_IN_TABLE', `None of the process's corners is in the table (characterised: ${grid.corners.join(', ')})`, 'corners');
  return { points, ...extremesOf(points) };
}
