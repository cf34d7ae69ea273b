import { BF130G, BF180G, computeSize, extremeCorner } from '@channelwright/shared/device';
import { deviceTargetsSchema, type DeviceResult, type Process } from '@channelwright/shared/schemas';
import { sheetTotals, type TotalsDevice } from './sheet-totals.js';

function sized(id: string, input: Parameters<typeof deviceTargetsSchema.parse>[0], process: Process = BF180G): TotalsDevice {
  const targets = deviceTargetsSchema.parse(input);
  const { name: _n, function: _f, matchGroup: _m, multiplier: _x, supplyBranch: _s, notes: _t, ...size } = targets;
  const result: DeviceResult = { ...computeSize({ ...size, process }), processVersionId: 'v', processVersion: 1 };
  return { id, targets, result };
}

describe('sheet totals', () => {
  it('picks SS as the slowest and FF as the fastest corner of the demo processes (invented demo data)', () => {
    expect(extremeCorner(BF180G, 'slowest')).toBe('SS');
    expect(extremeCorner(BF180G, 'fastest')).toBe('FF');
    expect(extremeCorner(BF130G, 'slowest')).toBe('SS');
  });

  it('takes TT for both when the process has no other corner', () => {
    const ttOnly = { ...BF180G, corners: [] };
    expect(extremeCorner(ttOnly, 'slowest')).toBe('TT');
    expect(extremeCorner(ttOnly, 'fastest')).toBe('TT');
  });

  it('counts only supply branches in the supply current, each multiplier times, and skips devices without a result', () => {
    const devices = [
      sized('a', { name: 'A', polarity: 'nmos', id: 10e-6, l: 1e-6, vds: 0.5, vov: 0.2, supplyBranch: true, multiplier: 3 }),
      sized('b', { name: 'B', polarity: 'pmos', id: 7e-6, l: 1e-6, vds: 0.5, vov: 0.2 }),
      { id: 'c', targets: deviceTargetsSchema.parse({ name: 'C', polarity: 'nmos', id: 1e-3, l: 1e-6, vds: 0.5, gmId: 40, supplyBranch: true }), result: null },
    ];
    const totals = sheetTotals(devices, BF180G);
    expect(totals.supplyCurrent).toBeCloseTo(30e-6, 15);
    expect(totals.supplyPower).toBeCloseTo(30e-6 * BF180G.vdd, 15);
    expect(totals.failedDeviceIds).toEqual(['c']);
    expect(totals.gateArea).toBeCloseTo(3 * devices[0].result!.w * 1e-6 + devices[1].result!.w * 1e-6, 20);
  });

  it('gives a match group of one device no offset estimate', () => {
    const totals = sheetTotals([sized('a', { name: 'A', polarity: 'nmos', id: 10e-6, l: 1e-6, vds: 0.5, vov: 0.2, matchGroup: 'alone' })], BF180G);
    expect(totals.matchGroups).toEqual([
      { name: 'alone', deviceIds: ['a'], sigmaVos: null, sigmaVt: null, sigmaId: null, worstPair: null, sigmaBeta: null, gmId: null, budget: null, meetsBudget: null, requiredArea: null },
    ]);
  });

  it('counts a device of multiplier m as one of m·W in its match group: σ(ΔVT) of two such falls as 1/√m', () => {
    // Pelgrom, Duinmaijer & Welbers, IEEE JSSC 24(5), 1989: σ(ΔVT) = AVT/√(W·L).
    const one = sheetTotals(['a', 'b'].map((id) => sized(id, { name: id, polarity: 'nmos', id: 10e-6, l: 1e-6, vds: 0.5, vov: 0.2, matchGroup: 'g' })), BF180G);
    const four = sheetTotals(['a', 'b'].map((id) => sized(id, { name: id, polarity: 'nmos', id: 10e-6, l: 1e-6, vds: 0.5, vov: 0.2, matchGroup: 'g', multiplier: 4 })), BF180G);
    expect(four.matchGroups[0].sigmaVt! / one.matchGroups[0].sigmaVt!).toBeCloseTo(0.5, 12);
  });

  it('holds a match group against its offset budget and gives the W·L per device that meets it at the pair\'s gm/ID (Kinget 2005)', () => {
    const pair = ['a', 'b'].map((id) => sized(id, { name: id, polarity: 'pmos', id: 10e-6, l: 0.5e-6, vds: 0.6, gmId: 16, matchGroup: 'input pair' }));
    const [group] = sheetTotals(pair, BF180G, [{ group: 'input pair', sigmaVos: 2e-3 }]).matchGroups;
    const result = pair[0].result!;
    expect(group.budget).toBe(2e-3);
    expect(group.meetsBudget).toBe((group.sigmaVos as number) <= 2e-3);
    // σ(VOS) falls as 1/√(W·L): the area that meets the budget is the present one × (σ/budget)².
    expect(group.requiredArea as number).toBeCloseTo(result.w * result.l * ((group.sigmaVos as number) / 2e-3) ** 2, 18);
  });
});
