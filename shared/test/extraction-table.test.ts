import { beforeAll, describe, expect, it } from 'vitest';
import { BF180G, type LookupTable, TABLE_FIELDS, type TableGrid, lineOffset, tablePointCount } from '../src/device/index.js';
import { extractParameters, pointsOfTable } from '../src/extraction/index.js';
import { ngspiceAvailable, onCi, runDc, runFolder } from './support/ngspice.js';

if (!ngspiceAvailable && !onCi) console.warn('ngspice is not installed: the extraction from a table is skipped (it fails instead when CI=true)');

// A lookup table (the layout of the characterisation tables) whose ID column Debian's ngspice filled from a MOS level 1
// card with known parameters (Shichman & Hodges, IEEE JSSC 3(3), 1968): read as curves and fitted with the square law,
// it must give the card's parameters back, as curves from a file do.
const KNOWN = { vto: 0.55, kp: 100e-6, gamma: 0.6, phi: 0.8, lambda: 0.05 };
const GRID: TableGrid = {
  polarity: 'nmos',
  modelName: 'known',
  referenceWidth: 4e-6,
  lengths: [2e-6],
  vgs: { start: 0, step: 0.01, count: 331 },
  vds: [0.1, 1.5, 3],
  vsb: [0, 0.5, 1, 2, 3],
  corners: ['TT', 'FF'],
  temperatures: [27],
};

function simulatedTable(): LookupTable {
  const columns = Object.fromEntries(TABLE_FIELDS.map((field) => [field, new Float64Array(tablePointCount(GRID))])) as LookupTable['columns'];
  const lines = [`.model known nmos level=1 vto=${KNOWN.vto} kp=${KNOWN.kp} gamma=${KNOWN.gamma} phi=${KNOWN.phi} lambda=${KNOWN.lambda} is=0 tnom=27`, 'vg g 0 0'];
  const devices = GRID.vsb.flatMap((vsb, s) => GRID.vds.map((vds, d) => ({ vsb, vds, s, d })));
  devices.forEach(({ vsb, vds }, k) => lines.push(`m${k} d${k} g 0 b${k} known w=${GRID.referenceWidth} l=${GRID.lengths[0]}`, `vd${k} d${k} 0 ${vds}`, `vb${k} b${k} 0 ${-vsb}`));
  const run = runDc(runFolder(), lines, 'dc vg 0 3.3 0.01', devices.map((_, k) => `i(vd${k})`));
  devices.forEach(({ s, d }, k) => {
    // The TT lines hold the card; the FF lines a current twice as large, so that reading the wrong corner shows.
    const current = run.get(`i(vd${k})`) as number[];
    current.forEach((i, g) => {
      columns.id[lineOffset(GRID, 0, 0, 0, s, d) + g] = -i;
      columns.id[lineOffset(GRID, 1, 0, 0, s, d) + g] = -2 * i;
    });
  });
  return { grid: GRID, columns };
}

const base = { tnom: 27, vdd: 3.3, params: { ...BF180G.nmos, lmin: 0.5e-6, vt0: 0.4, kp: 200e-6, gamma: 0.3, twoPhiF: 0.9, lambda: 0.01, n: undefined, lRef: undefined } };

describe.runIf(ngspiceAvailable || onCi)('extraction from a characterised table (Debian ngspice 39, MOS level 1)', () => {
  let table: LookupTable;
  beforeAll(() => {
    table = simulatedTable();
  });

  it('reads one corner\'s lines as VGS sweeps at the reference width and fits the card back (VTO within 5 mV, the others within 1 %)', () => {
    const points = pointsOfTable(table, { corner: 'TT' });
    expect(points).toHaveLength(GRID.vds.length * GRID.vsb.length * GRID.vgs.count);
    expect(points.every((p) => p.w === GRID.referenceWidth && p.l === 2e-6 && p.temperature === 27)).toBe(true);
    const { fitted } = extractParameters({ polarity: 'nmos', points, base, model: 'square-law' });
    expect(Math.abs(fitted.vt0 - KNOWN.vto)).toBeLessThan(5e-3);
    for (const [name, known] of [['kp', KNOWN.kp], ['gamma', KNOWN.gamma], ['twoPhiF', KNOWN.phi], ['lambda', KNOWN.lambda]] as const) {
      expect(Math.abs(fitted[name] / known - 1), name).toBeLessThan(0.01);
    }
  });

  it('reads only the chosen values of an axis, and refuses a value or a corner the table does not have', () => {
    const points = pointsOfTable(table, { corner: 'FF', vds: [3], vsb: [0, 1] });
    expect(new Set(points.map((p) => `${p.vds}/${p.vsb}`))).toEqual(new Set(['3/0', '3/1']));
    expect(() => pointsOfTable(table, { corner: 'TT', vds: [2] })).toThrow(/2 V is not a VDS of the table \(it has 100 mV, 1.5 V, 3 V\)/);
    expect(() => pointsOfTable(table, { corner: 'SS' })).toThrow(/no corner SS/);
  });
});
