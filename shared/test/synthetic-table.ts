import { type LookupTable, lineOffset, TABLE_FIELDS, type TableField, type TableGrid, tablePointCount, vgsOfNode } from '../src/device/index.js';

/** One point of a synthetic device: every table field as a function of the grid coordinates. */
export type SyntheticDevice = (corner: number, temperature: number, l: number, vgs: number, vds: number, vsb: number) => Record<TableField, number>;

/** Fills a table on the grid from a known function (Float64 columns unless asked otherwise). */
export function synthesiseTable(grid: TableGrid, device: SyntheticDevice, type: 'float32' | 'float64' = 'float64'): LookupTable {
  const points = tablePointCount(grid);
  const columns = Object.fromEntries(TABLE_FIELDS.map((field) => [field, type === 'float64' ? new Float64Array(points) : new Float32Array(points)])) as LookupTable['columns'];
  grid.corners.forEach((_, c) =>
    grid.temperatures.forEach((temperature, t) =>
      grid.lengths.forEach((l, k) =>
        grid.vsb.forEach((vsb, s) =>
          grid.vds.forEach((vds, d) => {
            const offset = lineOffset(grid, c, t, k, s, d);
            for (let g = 0; g < grid.vgs.count; g++) {
              const values = device(c, temperature, l, vgsOfNode(grid.vgs, g), vds, vsb);
              for (const field of TABLE_FIELDS) columns[field][offset + g] = values[field];
            }
          }),
        ),
      ),
    ),
  );
  return { grid, columns };
}

/**
 * A device whose interpolated fields are linear in every axis of the interpolation (ln ID, ln gm, ln gds, ln gmb,
 * ln Cgg linear in VGS, ln L, VDS, VSB and T; VT, VDSsat, Cgs, Cgd, Cgb linear), so that the table model must
 * reproduce it exactly, between grid points too.
 */
export const logLinearDevice: SyntheticDevice = (corner, temperature, l, vgs, vds, vsb) => {
  const nUt = 0.035;
  const vt = 0.45 + 0.03 * corner + 0.02 * Math.log(l / 1e-6) + 0.2 * vsb - 0.03 * vds - 1e-3 * (temperature - 27);
  const id = 1e-7 * Math.exp((vgs - 0.45) / nUt - Math.log(l / 1e-6) + 0.1 * vds - 0.5 * vsb + 0.004 * (temperature - 27) - 0.2 * corner);
  return {
    id,
    gm: id / nUt,
    gds: id * 0.08,
    gmb: id * 0.3,
    vt,
    vdsat: 0.05 + 0.3 * vgs + 0.01 * vds,
    cgg: 1e-14 * (l / 1e-6) * Math.exp(0.2 * vgs - 0.1 * vsb),
    cgs: 1e-14 * (0.5 + 0.2 * vgs + 0.1 * vds),
    cgd: 1e-15 * (1 + 0.3 * vgs - 0.2 * vds),
    cgb: 1e-15 * (2 - vgs + 0.5 * vsb),
  };
};

/** Thermal voltage kT/q at a temperature in °C (CODATA 2018 k and q). */
export function thermalVoltageAt(celsius: number): number {
  return (1.380649e-23 * (celsius + 273.15)) / 1.602176634e-19;
}

/**
 * A smooth all-region device: ID = 2nβUT²·ln²(1 + e^((VGS−VT)/(2nUT)))·(1 + λVDS) (the EKV interpolation:
 * Enz, Krummenacher & Vittoz, Analog Integr. Circuits Signal Process. 8, 83–114, 1995), with threshold
 * roll-off with L, DIBL, body effect and λ ∝ 1/L; gm, gds, gmb its exact derivatives.
 */
export const smoothDevice: SyntheticDevice = (corner, temperature, l, vgs, vds, vsb) => {
  const ut = thermalVoltageAt(temperature);
  const n = 1.3;
  const lMicron = l / 1e-6;
  const eta = 0.03 * Math.exp(-(lMicron - 0.18) / 0.1);
  const gamma = 0.45;
  const phi = 0.8;
  const vt = 0.45 + 0.04 * corner - 0.05 * Math.exp(-(lMicron - 0.18) / 0.15) + gamma * (Math.sqrt(phi + vsb) - Math.sqrt(phi)) - eta * vds - 1e-3 * (temperature - 27);
  const beta = (300e-6 * 10) / lMicron;
  const lambda = 0.05 / lMicron;
  const x = (vgs - vt) / (2 * n * ut);
  const f = Math.log1p(Math.exp(x));
  const sigma = 1 / (1 + Math.exp(-x));
  const clm = 1 + lambda * vds;
  const id = 2 * n * beta * ut * ut * f * f * clm;
  const gm = 2 * beta * ut * f * sigma * clm;
  const cox = 8.4e-3 * 10e-6 * l;
  return {
    id,
    gm,
    gds: 2 * n * beta * ut * ut * f * f * lambda + gm * eta,
    gmb: (gm * gamma) / (2 * Math.sqrt(phi + vsb)),
    vt,
    vdsat: 2 * ut * f * sigma + 0.05,
    cgg: cox * (0.2 + 0.6 * sigma),
    cgs: cox * 0.5 * sigma,
    cgd: cox * 0.02,
    cgb: cox * (0.18 + 0.08 * (1 - sigma)),
  };
};
