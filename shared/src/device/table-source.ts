import type { TableRef } from '../schemas/characterisation-table.js';
import type { ModelAccuracy } from '../schemas/operating-point.js';
import type { Polarity } from '../schemas/process.js';
import { EngineError } from './errors.js';
import type { PreparedTable } from './table-lookup.js';

/** What a table result says of its accuracy (measured: docs/model.md, section 22.3; docs/characterisation.md). */
export const TABLE_ACCURACY: ModelAccuracy = {
  basis: 'table',
  summary:
    'Interpolated in tables simulated from the model card: against the card in ngspice, ID within 1 % and gm/ID within 2 % at characterised lengths, 3 % between (in saturation; up to 7 % in triode between VDS values; far more between characterised temperatures); as good as the card',
};

/** A device's table, ready for lookups, and how a result names it. */
export interface TableChoice {
  prepared: PreparedTable;
  ref: TableRef;
}

/**
 * Where the table model finds the table of a device (polarity, and flavour when given) of the process it sizes
 * on. The server resolves it from the process version's characterisations; it throws an EngineError
 * (TABLE_NOT_READY while a characterisation runs, TABLE_NOT_CHARACTERISED when there is none) when it has none.
 */
export type TableSource = (device: { polarity: Polarity; flavour?: string }) => TableChoice;

/** The table of a device, or TABLE_NOT_CHARACTERISED when the caller has no table source (an inline process has no tables). */
export function tableOf(tables: TableSource | undefined, polarity: Polarity, flavour: string | undefined): TableChoice {
  if (!tables) {
    throw new EngineError('TABLE_NOT_CHARACTERISED', 'The table model sizes from tables characterised from a stored process version\'s model card: give a processId (an inline process has no tables)', 'model');
  }
  return tables({ polarity, ...(flavour === undefined ? {} : { flavour }) });
}
