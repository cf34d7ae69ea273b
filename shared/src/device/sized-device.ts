import type { CornersRequestInput, CornersResponse } from '../schemas/corners.js';
import type { Process } from '../schemas/process.js';
import type { Polarity } from '../schemas/process.js';
import type { Model } from '../schemas/request-fields.js';

/** A device as sized and drawn: what the sheet analyses hand to computeCorners. */
export interface SizedDevice {
  polarity: Polarity;
  flavour?: string;
  model: Model;
  /** Drawn width of all fingers, m. */
  w: number;
  l: number;
  vds: number;
  vsb: number;
}

/** The corners request of a sized device held at ID (current) or VGS (voltage). */
export function cornersRequestOf(processId: string, device: SizedDevice, held: { bias: 'current'; id: number } | { bias: 'voltage'; vgs: number }): CornersRequestInput {
  return {
    processId,
    polarity: device.polarity,
    ...(device.flavour === undefined ? {} : { flavour: device.flavour }),
    model: device.model,
    w: device.w,
    l: device.l,
    vds: device.vds,
    vsb: device.vsb,
    ...held,
  };
}

/**
 * The engine call the sheet analyses make for each device: computeCorners by default. A caller whose devices
 * need more than the process to be computed (a model that reads stored tables) passes the same call with
 * that data bound, so the analyses follow whatever model a device uses.
 */
export type CornersCall = (request: CornersRequestInput, process: Process) => CornersResponse;
