import type { CornersRequestInput } from '../schemas/corners.js';
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
