import type { Polarity } from '@channelwright/shared/schemas';

/** A design point taken from the charts into a device: the chart's device and bias, and the chosen length and gm/ID. */
export interface DeviceFromChart {
  processId: string;
  version: number;
  polarity: Polarity;
  flavour: string | null;
  corner: string;
  /** °C */
  temperature: number;
  /** V, polarity-normalised */
  vds: number;
  vsb: number;
  /** m */
  l: number;
  /** 1/V */
  gmId: number;
}

/** Where a device page opens with that point filled in; the app composes it (features do not link to each other). */
export type SizeDeviceHref = (device: DeviceFromChart) => string;
