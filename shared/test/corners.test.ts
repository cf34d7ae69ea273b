import { describe, expect, it } from 'vitest';
import { BF180G, computeCorners, computeSize, prepareDevice, solveSize } from '../src/device/index.js';

const sized = computeSize({ processId: 'bf180g', polarity: 'nmos', l: 0.5e-6, vds: 0.6, id: 20e-6, vov: 0.2 }, BF180G);
const request = { processId: 'bf180g', polarity: 'nmos', l: 0.5e-6, w: sized.w, vds: 0.6 } as const;

describe('computeCorners', () => {
  it('covers TT and every corner of the process at tempRange.min, tnom and tempRange.max by default', () => {
    const answer = computeCorners({ ...request, bias: 'current', id: 20e-6 }, BF180G);
    expect(answer.points.map((p) => `${p.corner}@${p.temperature}`)).toEqual(['TT', 'FF', 'SS', 'FS', 'SF'].flatMap((c) => [-40, 27, 125].map((t) => `${c}@${t}`)));
  });

  it('biased by current, keeps ID and solves VGS at each corner and temperature', () => {
    const answer = computeCorners({ ...request, bias: 'current', id: 20e-6 }, BF180G);
    for (const point of answer.points) {
      expect(point.op?.id as number).toBeCloseTo(20e-6, 15);
      const solved = solveSize(prepareDevice(BF180G, 'nmos', { corner: point.corner, temperature: point.temperature }), 'all-region', { id: 20e-6, l: request.l, vds: request.vds, vsb: 0, w: sized.w });
      expect(point.op?.vgs as number).toBeCloseTo(solved.vgs, 9);
    }
    expect(answer.worst.vgs).toMatchObject({ corner: 'SS', temperature: -40, direction: 'max' });
  });

  it('biased by voltage, keeps VGS and lets ID follow: FF carries more than TT, SS less', () => {
    const answer = computeCorners({ ...request, bias: 'voltage', vgs: sized.vgs, temperatures: [27] }, BF180G);
    const id = (corner: string) => answer.points.find((p) => p.corner === corner)?.op?.id as number;
    expect(id('TT')).toBeCloseTo(sized.id, 12);
    expect(id('FF')).toBeGreaterThan(id('TT'));
    expect(id('SS')).toBeLessThan(id('TT'));
    expect(answer.worst.id).toMatchObject({ corner: 'SS', direction: 'min' });
    expect(answer.extremes.id?.max.corner).toBe('FF');
  });

  it('reports the worst off current at the hottest, fastest corner', () => {
    const answer = computeCorners({ ...request, bias: 'voltage', vgs: sized.vgs }, BF180G);
    expect(answer.worst.ioff).toMatchObject({ corner: 'FF', temperature: 125, direction: 'max' });
  });

  it('gives a point without an operating point, and with the reason, where the current cannot be reached below vdd', () => {
    const answer = computeCorners({ ...request, w: 0.5e-6, bias: 'current', id: 400e-6, temperatures: [125] }, BF180G);
    const failed = answer.points.filter((p) => p.op === null);
    expect(failed.length).toBeGreaterThan(0);
    expect(failed[0].error?.code).toBe('ID_NOT_REACHABLE_BELOW_VDD');
  });
});
