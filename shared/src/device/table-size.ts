import type { SizeRequest, SizeResponse } from '../schemas/size.js';
import type { Process } from '../schemas/process.js';
import { ENGINE_VERSION } from './engine-version.js';
import { EngineError } from './errors.js';
import { prepareDevice } from './resolve-device.js';
import { say } from './say.js';
import { DEFAULT_MAX_FINGER_WIDTH, snapWidth } from './snap-width.js';
import { constraintOf } from './solve.js';
import { tableFigures, tableZtcVgs } from './table-figures.js';
import { tableLine } from './table-lookup.js';
import { operatingPointOnLine } from './table-operating-point.js';
import { sizeFromTable } from './table-sizing.js';
import { TABLE_ACCURACY, type TableChoice } from './table-source.js';
import { tableWarnings } from './table-warnings.js';

/** A size answer of the table model, without a comparison. */
export type TableSizeResponse = Omit<SizeResponse, 'comparison'>;

/**
 * POST /api/compute/size with model "table" (the request parsed and checked against the process): the width from
 * the table's current density (sizeFromTable), snapped like every model's (fingers no wider than the limit, each on
 * wgrid and at least wmin), then sized again at the drawn width, so that VGS is re-solved for ID (a vgs target keeps
 * VGS and reports the ID reached, as the analytic models do). Every figure the tables hold comes from them.
 */
export function sizeWithTable(request: SizeRequest, process: Process, choice: TableChoice): TableSizeResponse {
  const device = prepareDevice(process, request.polarity, { corner: request.corner, temperature: request.temperature, flavour: request.flavour });
  const { prepared } = choice;
  const conditions = { corner: device.corner, temperature: device.temperature, l: request.l, vds: request.vds, vsb: request.vsb };
  const constraint = constraintOf(request);
  const { params } = device;
  if (constraint === 'w' && (request.w as number) < params.wmin) {
    throw new EngineError('W_BELOW_WMIN', `W = ${say(request.w as number, 'm')} is below the process minimum ${say(params.wmin, 'm')}`, 'w');
  }
  const maxFingerWidth = request.maxFingerWidth ?? DEFAULT_MAX_FINGER_WIDTH;
  const oneFinger = sizeFromTable(prepared, { ...conditions, id: request.id, [constraint]: request[constraint] }).w;
  // Split in fingers, each finger loses the card's width reduction: the width grows by it for every finger but the first.
  const wRequired = constraint === 'w' ? oneFinger : oneFinger + (Math.max(1, Math.ceil(oneFinger / maxFingerWidth - 1e-9)) - 1) * (prepared.grid.widthOffset ?? 0);
  const snapped = snapWidth(wRequired, params.wgrid, params.wmin, maxFingerWidth);
  const line = tableLine(prepared, conditions);
  const op =
    constraint === 'vgs'
      ? operatingPointOnLine(line, snapped.w, request.vgs as number, snapped.fingers)
      : sizeFromTable(prepared, { ...conditions, id: request.id, w: snapped.w, fingers: snapped.fingers });
  const { point, analyticFigures } = tableFigures(op, line, device, prepared);
  const warnings = tableWarnings(device, point, line);
  if (snapped.raisedToWmin) {
    warnings.push({
      code: 'W_BELOW_WMIN',
      message: `The width needed, ${say(wRequired / snapped.fingers, 'm')} per finger, is below wmin = ${say(params.wmin, 'm')}: the finger was widened to wmin${constraint === 'vgs' ? ', so ID is above the target' : ' and VGS lowered to keep ID'}; a longer L brings W back above wmin.`,
    });
  }
  return {
    ...point,
    fingers: snapped.fingers,
    fingerWidth: snapped.fingerWidth,
    wRequired,
    constraint,
    warnings,
    engineVersion: ENGINE_VERSION,
    accuracy: TABLE_ACCURACY,
    polarity: request.polarity,
    ...(request.flavour === undefined ? {} : { flavour: request.flavour }),
    model: 'table',
    table: choice.ref,
    analyticFigures,
    corner: device.corner,
    temperature: device.temperature,
    ztcVgs: tableZtcVgs(prepared, conditions),
  };
}
