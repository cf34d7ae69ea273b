import type { Process, SizeRequestInput, SizeResponse } from '@channelwright/shared/schemas';
import type { ReactNode } from 'react';

/** A device the engine has sized, as the page shows it: what was asked, the answer, and the process it was sized in. */
export interface SizedDevice {
  /** The request `result` answers. */
  request: SizeRequestInput;
  result: SizeResponse;
  process: Process;
  /** Takes a VOV picked elsewhere (on a chart) into the targets; absent when the targets are read only. */
  onPickVov?: (vov: number) => void;
}

/**
 * What the page draws under a sized device. The app passes the design charts in here, so this feature
 * neither imports nor loads them.
 */
export type SizedDeviceView = (device: SizedDevice) => ReactNode;
