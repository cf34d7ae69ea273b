import { BF180G } from '@channelwright/shared/device';
import { diffProcesses } from './process-diff.js';

describe('diffProcesses', () => {
  it('finds no change between a process and a copy with its corners in another order', () => {
    const reordered = { ...BF180G, corners: [...BF180G.corners].reverse() };
    expect(diffProcesses(BF180G, reordered)).toEqual([]);
  });

  it('reports added, changed and removed values by path, with the unit of the parameter', () => {
    const { flavours: _flavours, ...withoutFlavours } = BF180G;
    const next = { ...withoutFlavours, tempRange: { min: -40, max: 150 }, pmos: { ...BF180G.pmos, n: 1.3, jg: undefined } };
    const changes = diffProcesses(BF180G, next);
    expect(changes.slice(0, 3)).toEqual([
      { path: 'tempRange.max', group: 'process', kind: 'changed', unit: '°C', from: 125, to: 150 },
      { path: 'pmos.n', group: 'pmos', kind: 'added', unit: '', from: null, to: 1.3 },
      { path: 'pmos.jg', group: 'pmos', kind: 'removed', unit: 'A/m²', from: 3e-7, to: null },
    ]);
    const flavourPaths = changes.slice(3).map((c) => c.path);
    expect(flavourPaths).toContain('flavours.native.params.vt0');
    expect(flavourPaths).toContain('flavours.native.polarity');
    expect(changes.slice(3).every((c) => c.kind === 'removed' && c.group === 'flavours')).toBe(true);
  });
});
