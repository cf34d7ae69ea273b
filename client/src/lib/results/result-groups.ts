import type { Polarity, SizeResponse } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';

/** One line of a results group: a symbol, what it means, and its value in SI units (or a word). */
export interface ResultRow {
  symbol: string;
  meaning: string;
  value: number | string | null;
  unit?: string;
  /** How to read null, e.g. "∞" for ro when gds = 0. */
  nullText?: string;
}

export interface ResultGroup {
  title: string;
  rows: ResultRow[];
}

const REGION_WORDS = { weak: 'weak inversion', moderate: 'moderate inversion', strong: 'strong inversion' } as const;
export const regionWords = (region: SizeResponse['region']): string => REGION_WORDS[region];

const percent = (fraction: number) => fraction * 100;

/**
 * The results of one sized device, grouped as a designer reads them. PMOS voltages are
 * polarity-normalised, so their symbols read VSG, VSD, VBS and VT is −VTP.
 */
export function resultGroups(r: SizeResponse, polarity: Polarity): ResultGroup[] {
  const p = polarity === 'pmos';
  const leak = r.leakage;
  return [
    {
      title: 'Geometry',
      rows: [
        { symbol: 'W', meaning: 'drawn width, on the process grid', value: r.w, unit: 'm' },
        { symbol: 'L', meaning: 'drawn length', value: r.l, unit: 'm' },
        { symbol: 'W/L', meaning: 'aspect ratio', value: r.wOverL },
        { symbol: 'Fingers', meaning: `of ${formatQuantity(r.fingerWidth, 'm')} each`, value: r.fingers },
        { symbol: 'W (exact)', meaning: 'before snapping to the grid', value: r.wRequired, unit: 'm' },
      ],
    },
    {
      title: 'Bias',
      rows: [
        { symbol: p ? 'VSG' : 'VGS', meaning: 'gate–source voltage', value: r.vgs, unit: 'V' },
        { symbol: p ? 'VT (−VTP)' : 'VT', meaning: 'threshold, with body effect', value: r.vt, unit: 'V' },
        { symbol: 'VOV', meaning: 'overdrive VGS − VT', value: r.vov, unit: 'V' },
        { symbol: 'VDSsat', meaning: 'saturation voltage', value: r.vdsat, unit: 'V' },
        { symbol: 'Saturated', meaning: `at ${p ? 'VSD' : 'VDS'} = ${r.vds} V`, value: r.saturated ? 'yes' : 'no' },
      ],
    },
    {
      title: 'Small signal',
      rows: [
        { symbol: 'gm', meaning: 'transconductance', value: r.gm, unit: 'S' },
        { symbol: 'gmb', meaning: 'body transconductance', value: r.gmb, unit: 'S' },
        { symbol: 'gds', meaning: 'output conductance', value: r.gds, unit: 'S' },
        { symbol: 'ro', meaning: '1/gds', value: r.ro, unit: 'Ω', nullText: '∞' },
        { symbol: 'gm/ID', meaning: 'transconductance efficiency', value: r.gmId, unit: '1/V' },
        { symbol: 'gm/gds', meaning: 'intrinsic gain', value: r.intrinsicGain, unit: 'V/V', nullText: '∞' },
        { symbol: 'IC', meaning: 'inversion coefficient', value: r.ic },
        { symbol: 'Region', meaning: 'weak < 0.1 ≤ IC ≤ 10 < strong', value: regionWords(r.region) },
      ],
    },
    {
      title: 'Capacitance and speed',
      rows: [
        { symbol: 'Cgs', meaning: 'gate–source', value: r.cgs, unit: 'F' },
        { symbol: 'Cgd', meaning: 'gate–drain overlap', value: r.cgd, unit: 'F' },
        { symbol: 'Cdb', meaning: 'drain junction', value: r.cdb, unit: 'F' },
        { symbol: 'Csb', meaning: 'source junction', value: r.csb, unit: 'F' },
        { symbol: 'fT', meaning: 'gm / 2π(Cgs + Cgd)', value: r.ft, unit: 'Hz' },
      ],
    },
    {
      title: 'Mismatch',
      rows: [
        { symbol: 'σ(ΔVT)', meaning: 'of a matched pair', value: r.sigmaVt, unit: 'V' },
        { symbol: 'σ(VOS)', meaning: 'gate-referred offset of the pair', value: r.sigmaVos, unit: 'V' },
        { symbol: 'σ(ΔID/ID)', meaning: 'current mismatch at equal VGS', value: percent(r.sigmaId), unit: '%' },
        { symbol: 'σ(Δβ/β)', meaning: 'current-factor mismatch', value: percent(r.sigmaBeta), unit: '%' },
      ],
    },
    {
      title: 'Leakage',
      rows: leak.conductsAtZeroVgs
        ? [
            { symbol: 'At VGS = 0', meaning: 'depletion mode: conducts, not leakage', value: leak.idAtZeroVgs, unit: 'A' },
            { symbol: 'Gate', meaning: 'JG·W·L', value: leak.gate, unit: 'A' },
            { symbol: 'Junction', meaning: 'JS × drain area', value: leak.junction, unit: 'A' },
          ]
        : [
            { symbol: 'Ioff', meaning: 'total at VGS = 0, VDS = VDD', value: r.ioff, unit: 'A' },
            { symbol: 'Subthreshold', meaning: 'channel current at VGS = 0', value: leak.subthreshold, unit: 'A' },
            { symbol: 'Gate', meaning: 'JG·W·L', value: leak.gate, unit: 'A' },
            { symbol: 'Junction', meaning: 'JS × drain area', value: leak.junction, unit: 'A' },
            { symbol: 'Ion/Ioff', meaning: 'at VGS = VDS = VDD', value: r.ionIoff },
          ],
    },
  ];
}

