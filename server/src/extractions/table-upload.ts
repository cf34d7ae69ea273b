import { writeCurveFile } from '@channelwright/shared/curve-file';
import type { LookupTable } from '@channelwright/shared/device';
import { pointsOfTable, type TableSelection } from '@channelwright/shared/extraction';
import { CURVE_FILE_MAX_POINTS, type Polarity, type TableOrigin, type TableRef } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import { DomainError } from '../common/errors/domain-error.js';

/** The curve file written from a table's lines, as an upload keeps it. */
export interface TableUpload {
  fileName: string;
  text: string;
  origin: TableOrigin;
}

const list = (values: readonly number[], unit: string) => values.map((v) => formatQuantity(v, unit, { digits: 6 })).join(', ');

/**
 * The points of one corner (and the chosen temperatures, lengths, VDS and VSB) of a characterised table, written as
 * the CSV an upload is, with "#" lines naming the process, version, device, table and its hash, and the corner: so the
 * kept upload says where its points came from, and the job, re-run and audit paths read it as any other upload. A
 * value not on the grid is refused by the engine naming its field (400); more points than a file may have, here.
 */
export function tableUpload(stored: { table: LookupTable; ref: TableRef }, version: { processId: string; processName: string; version: number }, device: { polarity: Polarity; flavour: string | null }, selection: TableSelection): TableUpload {
  const { grid } = stored.table;
  // Counted before the points are made: a whole table can hold millions.
  const count = [selection.temperatures ?? grid.temperatures, selection.lengths ?? grid.lengths, selection.vds ?? grid.vds, selection.vsb ?? grid.vsb].reduce((n, values) => n * values.length, grid.vgs.count);
  if (count > CURVE_FILE_MAX_POINTS) {
    const field = selection.lengths === undefined ? 'lengths' : selection.vds === undefined ? 'vds' : selection.vsb === undefined ? 'vsb' : 'temperatures';
    throw new DomainError('VALIDATION_FAILED', `This choice gives ${count} points; a fit reads at most ${CURVE_FILE_MAX_POINTS}: choose fewer lengths, VDS, VSB or temperatures`, 400, field);
  }
  const points = pointsOfTable(stored.table, selection);
  const origin: TableOrigin = {
    processId: version.processId,
    processName: version.processName,
    version: version.version,
    polarity: device.polarity,
    flavour: device.flavour,
    tableId: stored.ref.id,
    sha256: stored.ref.sha256,
    characterisationId: stored.ref.characterisationId,
    model: stored.ref.model,
    corner: selection.corner,
  };
  const deviceName = `${device.polarity.toUpperCase()}${device.flavour ? ` ${device.flavour}` : ''}`;
  const comments = [
    `Points of a characterised table, not measured: ${version.processName} version ${version.version}, ${deviceName} (card model ${origin.model}), corner ${origin.corner}`,
    `Table ${origin.tableId} (SHA-256 ${origin.sha256}) of characterisation ${origin.characterisationId}`,
    `Temperatures ${list(selection.temperatures ?? grid.temperatures, '°C')}; L ${list(selection.lengths ?? grid.lengths, 'm')}; VDS ${list(selection.vds ?? grid.vds, 'V')}; VSB ${list(selection.vsb ?? grid.vsb, 'V')}; W ${list([grid.referenceWidth], 'm')} (the table's reference width)`,
    ...(device.polarity === 'pmos' ? ['A PMOS in the positive convention: VSG, VSD, VBS and the source-to-drain current'] : []),
  ];
  const fileName = `${version.processName}-v${version.version}-${deviceName.replace(/\s+/g, '-').toLowerCase()}-${origin.corner}-table.csv`.replace(/[^\w.+-]+/g, '_').slice(0, 255);
  return { fileName, text: writeCurveFile(device.polarity, points, comments), origin };
}
