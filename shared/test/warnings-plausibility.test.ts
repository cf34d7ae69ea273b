import { describe, expect, it } from 'vitest';
import { BF180G, computeSize, SIZE_PLAUSIBILITY } from '../src/device/index.js';

const codes = (warnings: { code: string }[]) => warnings.map((w) => w.code);

describe('implausible sizes', () => {
  it('warns when ID = 0.5 A asks for a device some 50 mm wide in thousands of fingers (thresholds in docs/model.md)', () => {
    // 1 A at this VOV now needs more than the 10 cm the engine sizes at all (W_TOO_LARGE): half of it still warns.
    const result = computeSize({ processId: 'bf180g', polarity: 'nmos', id: 0.5, l: 0.5e-6, vds: 0.9, vov: 0.2 }, BF180G);
    expect(result.w).toBeGreaterThan(0.04);
    expect(result.fingers).toBeGreaterThan(SIZE_PLAUSIBILITY.maxFingers);
    expect(codes(result.warnings)).toEqual(expect.arrayContaining(['AREA_IMPLAUSIBLE', 'FINGERS_IMPLAUSIBLE']));
  });

  it('warns when the current density is above 1 mA/µm, and not for the invented demo\'s sleep switch', () => {
    const dense = computeSize({ processId: 'bf180g', polarity: 'nmos', id: 1e-3, l: 0.18e-6, vds: 1.8, vov: 1.2 }, BF180G);
    expect(codes(dense.warnings)).toContain('CURRENT_DENSITY_IMPLAUSIBLE');
    const sleepSwitch = computeSize({ processId: 'bf180g', polarity: 'nmos', id: 20e-3, l: 0.18e-6, vds: 0.05, vgs: 1.8, temperature: 125 }, BF180G);
    expect(codes(sleepSwitch.warnings).filter((c) => c.endsWith('_IMPLAUSIBLE'))).toEqual([]);
  });

  it('names PMOS voltages as a PMOS designer reads them in its warnings', () => {
    const triode = computeSize({ processId: 'bf180g', polarity: 'pmos', id: 10e-6, l: 0.5e-6, vds: 0.05, vov: 0.3 }, BF180G);
    const message = triode.warnings.find((w) => w.code === 'VDS_BELOW_VDSSAT')?.message ?? '';
    expect(message).toMatch(/^VSD = 50 mV is below VSDsat = /);
  });
});
