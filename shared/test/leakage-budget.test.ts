import { describe, expect, it } from 'vitest';
import { BF180G, computeSize, leakage, leakageTemperatures, prepareDevice, sheetLeakage, type LeakageDevice } from '../src/device/index.js';

function sizedDevice(key: string, change: { polarity?: 'nmos' | 'pmos'; flavour?: string; id: number; l: number; vds: number; vov?: number; vgs?: number }, multiplier = 1): LeakageDevice {
  const { polarity = 'nmos', flavour, ...target } = change;
  const result = computeSize({ processId: 'bf180g', polarity, ...(flavour ? { flavour } : {}), ...target }, BF180G);
  return { key, name: key, polarity, ...(flavour ? { flavour } : {}), model: 'all-region', w: result.w, l: result.l, vds: result.vds, vsb: 0, vgs: result.vgs, multiplier };
}

const devices = [
  sizedDevice('MSW', { id: 20e-3, l: 0.18e-6, vds: 0.05, vgs: 1.8 }),
  sizedDevice('MDP', { polarity: 'pmos', id: 50e-6, l: 0.18e-6, vds: 0.9, vov: 0.3 }, 3),
  sizedDevice('MNAT', { flavour: 'native', id: 1e-6, l: 2e-6, vds: 0.5, vgs: 0 }),
];

describe('leakageTemperatures', () => {
  it('steps through the process range in 10 °C for −40 … 125 °C, with the nominal and the budget temperature', () => {
    expect(leakageTemperatures(BF180G, 85)).toEqual([-40, -30, -20, -10, 0, 10, 20, 27, 30, 40, 50, 60, 70, 80, 85, 90, 100, 110, 120, 125]);
  });
});

describe('sheetLeakage', () => {
  const answer = sheetLeakage(BF180G, 'bf180g', devices, { current: 50e-9, temperature: 125 }, 'test');

  it('gives each device the off current the engine gives that device alone, × its multiplier, at the fast corner', () => {
    expect(answer.fastCorner).toBe('FF');
    for (const row of answer.devices) {
      const device = devices.find((d) => d.key === row.deviceId)!;
      answer.temperatures.forEach((temperature, i) => {
        const single = leakage(prepareDevice(BF180G, device.polarity, { corner: 'FF', temperature }), device.w, device.l);
        expect(row.atFastCorner[i]?.total).toBeCloseTo((single.ioff as number) * device.multiplier, 25);
        expect(row.atFastCorner[i]?.subthreshold).toBeCloseTo((single.subthreshold as number) * device.multiplier, 25);
      });
    }
  });

  it('sums the devices per temperature, and the hottest is the highest', () => {
    answer.temperatures.forEach((_, i) => expect(answer.totals[i]).toBeCloseTo(answer.devices.reduce((s, d) => s + (d.atFastCorner[i]?.total ?? 0), 0), 25));
    expect(Math.max(...answer.totals)).toBe(answer.totals.at(-1));
  });

  it('takes the worst corner at the budget temperature and says whether the total fits the budget', () => {
    expect(answer.byCorner.map((c) => c.corner)).toEqual(['TT', 'FF', 'SS', 'FS', 'SF']);
    expect(answer.worst.total).toBe(Math.max(...answer.byCorner.map((c) => c.total)));
    expect(answer.withinBudget).toBe(answer.worst.total <= 50e-9);
    expect(sheetLeakage(BF180G, 'bf180g', devices, { current: 1, temperature: 125 }, 'test').withinBudget).toBe(true);
  });

  it('lists a depletion-mode device apart with its channel current instead of counting it as leakage', () => {
    expect(answer.devices.map((d) => d.deviceId)).toEqual(['MSW', 'MDP']);
    expect(answer.conducting).toEqual([{ deviceId: 'MNAT', name: 'MNAT', current: expect.any(Number) }]);
    expect(answer.conducting[0].current).toBeGreaterThan(1e-7);
  });
});
