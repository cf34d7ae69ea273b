import { defaultTableGrid, deviceParamsOf, tablePointCount } from '@channelwright/shared/device';
import { byDevice } from '../../../lib/characterisation/process-tables';
import { cornerNames, type ModelCardMapping, type Process, type TableGridResponse } from '@channelwright/shared/schemas';

/** One device's grid as a characterisation would simulate it. */
export interface DeviceGrid {
  label: string;
  model: string;
  grid: TableGridResponse;
  points: number;
}

/** How far below VT0 the VGS axis of a depletion-mode device starts, V (the server's plan uses the same margin). */
const DEPLETION_MARGIN = 0.3;

/** "NMOS", "PMOS", "NMOS native". */
export const deviceLabel = (polarity: 'nmos' | 'pmos', flavour: string | null | undefined): string =>
  flavour ? `${polarity.toUpperCase()} ${flavour}` : polarity.toUpperCase();

/**
 * The default grid of every device the card maps, as the server plans it (docs/characterisation.md, section 3):
 * shown before a maintainer starts, so the cost in points is known up front. The server's plan is the one that runs.
 */
export function defaultGridPreview(definition: Process, mapping: ModelCardMapping): DeviceGrid[] {
  const corners = cornerNames(definition).filter((corner) => corner in mapping.corners);
  const temperatures = definition.tempRange ? [definition.tempRange.min, definition.tnom, definition.tempRange.max] : [definition.tnom];
  return [...mapping.devices].sort(byDevice).map((device) => {
    const params = deviceParamsOf(definition, device.polarity, device.flavour);
    const step = 0.01;
    const vgsFrom = params.vt0 < 0 ? Number((Math.floor((params.vt0 - DEPLETION_MARGIN) / step) * step).toPrecision(12)) : 0;
    const grid = defaultTableGrid({ polarity: device.polarity, modelName: device.model, vdd: definition.vdd, lmin: params.lmin, corners, temperatures, vgsStep: step, vgsFrom });
    return { label: deviceLabel(device.polarity, device.flavour), model: device.model, grid, points: tablePointCount(grid) };
  });
}
