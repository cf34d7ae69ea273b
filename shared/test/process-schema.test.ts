import { describe, expect, it } from 'vitest';
import { BF130G, BF180G, DEMO_DATA_NOTICE, DEMO_PROCESSES } from '../src/device/index.js';
import { DEVICE_PARAMETERS, PROCESS_FIELDS, cornerNames, deviceParamsSchema, processSchema } from '../src/schemas/index.js';
import { parseQuantity } from '../src/units/index.js';

const firstIssue = (value: unknown) => {
  const result = processSchema.safeParse(value);
  if (result.success) throw new Error('accepted');
  return { field: result.error.issues[0].path.join('.'), message: result.error.issues[0].message };
};

describe('processSchema', () => {
  it('accepts the invented demo processes BF180-G and BF130-G, which say they are invented', () => {
    for (const process of DEMO_PROCESSES) expect(processSchema.parse(process)).toEqual(process);
    expect(BF180G.description).toContain(DEMO_DATA_NOTICE);
    expect(BF130G.vdd).toBe(1.2);
    expect(cornerNames(BF180G)).toEqual(['TT', 'FF', 'SS', 'FS', 'SF']);
  });

  it('has a native depletion-mode NMOS flavour (vt0 < 0) in BF180-G', () => {
    const native = BF180G.flavours?.find((f) => f.name === 'native');
    expect(native?.polarity).toBe('nmos');
    expect(native?.params.vt0).toBeLessThan(0);
  });

  it('refuses a value beyond its hard limits and names the field', () => {
    expect(firstIssue({ ...BF180G, nmos: { ...BF180G.nmos, kp: 5 } })).toEqual({ field: 'nmos.kp', message: 'kp must be in 0 A/V² … 0.1 A/V²' });
    expect(firstIssue({ ...BF180G, pmos: { ...BF180G.pmos, tox: 0 } }).field).toBe('pmos.tox');
    expect(firstIssue({ ...BF180G, vdd: Number.NaN }).field).toBe('vdd');
    expect(firstIssue({ ...BF180G, nmos: { ...BF180G.nmos, vt0: '0.45' } })).toEqual({ field: 'nmos.vt0', message: 'vt0 must be a number in V' });
    expect(firstIssue({ ...BF180G, nmos: { ...BF180G.nmos, wgrid: 1e-6 } }).field).toBe('nmos.wgrid');
  });

  it('accepts a value outside the plausible range but within the hard limits (the editor warns about it)', () => {
    const kp = DEVICE_PARAMETERS.find((p) => p.name === 'kp');
    const unusual = 3e-3; // above the plausible 2 mA/V², a possible but unusual kp
    expect(unusual).toBeGreaterThan(kp?.plausible.max as number);
    expect(processSchema.safeParse({ ...BF180G, nmos: { ...BF180G.nmos, kp: unusual } }).success).toBe(true);
    // Every hard limit contains the plausible range it stands behind.
    for (const info of DEVICE_PARAMETERS) {
      expect(info.hardLimit.min, info.name).toBeLessThanOrEqual(info.plausible.min);
      expect(info.hardLimit.max, info.name).toBeGreaterThanOrEqual(info.plausible.max);
    }
  });

  it('requires TT, when listed, to be the nominal parameters, and corner names to be unique', () => {
    expect(firstIssue({ ...BF180G, corners: [{ name: 'TT', nmos: { dvt: 0.01, kpScale: 1 }, pmos: { dvt: 0, kpScale: 1 } }] }).field).toBe('corners.0.nmos.dvt');
    expect(firstIssue({ ...BF180G, corners: [...BF180G.corners, BF180G.corners[1]] }).field).toBe('corners.5.name');
  });

  it('refuses unknown fields and a temperature range upside down', () => {
    expect(firstIssue({ ...BF180G, nmos: { ...BF180G.nmos, vto: 0.4 } }).message).toContain('vto');
    expect(firstIssue({ ...BF180G, tempRange: { min: 125, max: -40 } }).field).toBe('tempRange.max');
  });
});

describe('parameter table', () => {
  it('describes every per-polarity parameter of the schema once, with unit, description and range', () => {
    const keys = Object.keys(deviceParamsSchema.shape).sort();
    expect(DEVICE_PARAMETERS.map((p) => p.name).sort()).toEqual(keys);
    for (const info of [...DEVICE_PARAMETERS, ...PROCESS_FIELDS]) {
      expect(info.description.length).toBeGreaterThan(10);
      expect(info.plausible.min).toBeLessThan(info.plausible.max);
    }
  });

  it('gives the plausible ranges of the issue: vt0 −1 … 1.5 V, kp 10 µA/V² … 2 mA/V², γ 0 … 1.5 √V', () => {
    const range = (name: string) => DEVICE_PARAMETERS.find((p) => p.name === name);
    expect(range('vt0')).toMatchObject({ unit: 'V', plausible: { min: -1, max: 1.5 } });
    expect(range('kp')).toMatchObject({ unit: 'A/V²', plausible: { min: 10e-6, max: 2e-3 } });
    expect(range('gamma')).toMatchObject({ unit: '√V', plausible: { min: 0, max: 1.5 } });
  });

  it('has units and display units that the units parser reads, so the editor can convert what is typed', () => {
    for (const info of [...DEVICE_PARAMETERS, ...PROCESS_FIELDS]) {
      const parsed = parseQuantity(`1 ${info.displayUnit}`.trim(), info.unit);
      expect(parsed.ok, `${info.name}: ${!parsed.ok && parsed.reason}`).toBe(true);
    }
    expect(parseQuantity('290 µA/V²', 'A/V²')).toMatchObject({ ok: true });
    expect(parseQuantity('4.5 mV·µm', DEVICE_PARAMETERS.find((p) => p.name === 'avt')?.unit)).toMatchObject({ ok: true, value: 4.5e-9 });
  });

  it('says in the schema descriptions that PMOS values are polarity-normalised (vt = −VTP)', () => {
    expect(deviceParamsSchema.description).toContain('vt = −VTP');
    expect(DEVICE_PARAMETERS.find((p) => p.name === 'vt0')?.description).toContain('−VTP');
  });
});
