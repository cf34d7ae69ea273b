import { describe, expect, it } from 'vitest';
import { BF180G, operatingPoint, prepareDevice } from '../src/device/index.js';
import { type ExtractionProgress, type MeasuredPoint, extractParameters } from '../src/extraction/index.js';

// How a fit reports its progress and its end; the curves come from the engine's own model (the numbers are not the
// point here: the reports are), at three lengths, two drain voltages and two body voltages.
function curves(): MeasuredPoint[] {
  const device = prepareDevice(BF180G, 'nmos', { temperature: 27 });
  const points: MeasuredPoint[] = [];
  for (const l of [0.18e-6, 0.5e-6, 2e-6]) {
    for (const vds of [0.1, 1.2]) {
      for (const vsb of [0, 0.6]) {
        for (let vgs = 0.1; vgs <= 1.8 + 1e-9; vgs += 0.025) {
          points.push({ vgs, vds, vsb, temperature: 27, id: operatingPoint(device, 'all-region', 5e-6, l, { vgs, vds, vsb }).id, w: 5e-6, l });
        }
      }
    }
  }
  return points;
}

const base = { tnom: BF180G.tnom, vdd: BF180G.vdd, params: { ...BF180G.nmos, vt0: 0.3, kp: 150e-6 } };

describe('the progress of a fit', () => {
  const points = curves();

  it('counts the iterations of every stage of an all-region fit (two stages, twice) against one budget, rising and never past it', () => {
    const reports: ExtractionProgress[] = [];
    const result = extractParameters({ polarity: 'nmos', points, base, model: 'all-region', maxIterations: 40 }, (p) => reports.push(p));
    expect(reports.length).toBeGreaterThan(1);
    expect(new Set(reports.map((r) => r.maxIterations))).toEqual(new Set([160]));
    for (let k = 1; k < reports.length; k++) expect(reports[k].iterations).toBeGreaterThanOrEqual(reports[k - 1].iterations);
    expect(reports.at(-1)?.iterations).toBe(result.iterations);
    expect(result.iterations).toBeLessThanOrEqual(160);
  });

  it('says that a fit stopped at its iteration limit has not converged, and keeps its last estimate', () => {
    const result = extractParameters({ polarity: 'nmos', points, base, model: 'square-law', maxIterations: 10 });
    expect(result.converged).toBe(false);
    expect(result.iterations).toBe(10);
    const vt0 = result.parameters.find((p) => p.name === 'vt0');
    expect(vt0?.value).not.toBe(vt0?.initial);
    expect(Number.isFinite(result.fitted.kp)).toBe(true);
  });
});
