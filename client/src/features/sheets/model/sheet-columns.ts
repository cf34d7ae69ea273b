import type { Device } from '@channelwright/shared/schemas';

/** A column of the device table: its title, the unit of its numbers, and how to read it from a device. */
export interface SheetColumn {
  key: string;
  title: string;
  /** Written after every number of the column in engineering notation ('' for plain ratios). */
  unit?: string;
  /** What the title abbreviates, for the header's tooltip. */
  meaning: string;
  numeric: boolean;
  value: (device: Device) => number | string | null;
}

const result = <K extends keyof NonNullable<Device['result']>>(key: K) => (device: Device) => device.result?.[key] ?? null;

export const SHEET_COLUMNS: SheetColumn[] = [
  { key: 'name', title: 'Name', meaning: 'Device name', numeric: false, value: (d) => d.targets.name },
  { key: 'function', title: 'Function', meaning: 'What the device does in the circuit', numeric: false, value: (d) => d.targets.function },
  { key: 'polarity', title: 'Type', meaning: 'Polarity and flavour', numeric: false, value: (d) => `${d.targets.polarity.toUpperCase()}${d.targets.flavour ? ` ${d.targets.flavour}` : ''}` },
  { key: 'warnings', title: 'Warnings', meaning: 'Cautions of the first-order model', numeric: false, value: (d) => (d.result ? d.result.warnings.length : null) },
  { key: 'w', title: 'W', unit: 'm', meaning: 'Drawn width, on the grid', numeric: true, value: result('w') },
  { key: 'l', title: 'L', unit: 'm', meaning: 'Drawn length', numeric: true, value: (d) => d.result?.l ?? d.targets.l },
  { key: 'wOverL', title: 'W/L', unit: '', meaning: 'Aspect ratio', numeric: true, value: result('wOverL') },
  { key: 'fingers', title: 'Fingers', unit: '', meaning: 'Fingers of the device (per multiplier)', numeric: true, value: result('fingers') },
  { key: 'id', title: 'ID', unit: 'A', meaning: 'Drain current (PMOS: source to drain)', numeric: true, value: (d) => d.result?.id ?? d.targets.id },
  { key: 'vov', title: 'VOV', unit: 'V', meaning: 'Overdrive VGS − VT', numeric: true, value: result('vov') },
  { key: 'vgs', title: 'VGS', unit: 'V', meaning: 'Gate–source voltage (PMOS: VSG)', numeric: true, value: result('vgs') },
  { key: 'vt', title: 'VT', unit: 'V', meaning: 'Threshold with body effect (PMOS: −VTP)', numeric: true, value: result('vt') },
  { key: 'gmId', title: 'gm/ID (1/V)', unit: '', meaning: 'Transconductance efficiency, 1/V', numeric: true, value: result('gmId') },
  { key: 'gm', title: 'gm', unit: 'S', meaning: 'Transconductance', numeric: true, value: result('gm') },
  { key: 'ro', title: 'ro', unit: 'Ω', meaning: 'Output resistance 1/gds', numeric: true, value: result('ro') },
  { key: 'intrinsicGain', title: 'Gain (V/V)', unit: '', meaning: 'Intrinsic gain gm/gds, V/V', numeric: true, value: result('intrinsicGain') },
  { key: 'ft', title: 'fT', unit: 'Hz', meaning: 'Transit frequency', numeric: true, value: result('ft') },
  { key: 'region', title: 'Region', meaning: 'Inversion: weak < 0.1 ≤ IC ≤ 10 < strong', numeric: false, value: (d) => d.result?.region ?? null },
];

export type SortDirection = 'ascending' | 'descending';
export interface SortState {
  key: string;
  direction: SortDirection;
}

/**
 * The devices ordered by one column; without a sort, by their position in the sheet. Empty values
 * (a device the engine could not size) go last in either direction; ties keep the sheet's order.
 */
export function sortDevices(devices: Device[], sort: SortState | null): Device[] {
  const byPosition = [...devices].sort((a, b) => a.position - b.position);
  if (!sort) return byPosition;
  const column = SHEET_COLUMNS.find((c) => c.key === sort.key);
  if (!column) return byPosition;
  const sign = sort.direction === 'ascending' ? 1 : -1;
  return byPosition
    .map((device, index) => ({ device, index, value: column.value(device) }))
    .sort((a, b) => {
      if (a.value === null || b.value === null) return a.value === b.value ? a.index - b.index : a.value === null ? 1 : -1;
      const order = typeof a.value === 'number' && typeof b.value === 'number' ? a.value - b.value : String(a.value).localeCompare(String(b.value), 'en', { numeric: true });
      return order === 0 ? a.index - b.index : sign * order;
    })
    .map((entry) => entry.device);
}
