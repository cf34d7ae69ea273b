import type { DeviceTargets } from '@channelwright/shared/schemas';
import type { RevisionDeviceContent } from './revision-content.js';
import { diffRevisions, valueChanges, type DiffSide } from './revision-diff.js';

const device = (deviceId: string, name: string, targets: Partial<DeviceTargets>, result: Record<string, unknown> | null = null): RevisionDeviceContent =>
  ({ deviceId, position: 0, name, targets: targets as DeviceTargets, result: result as never, error: null, engineVersion: '1', processVersionId: 'v1', computedAt: '2026-03-01T00:00:00.000Z' }) as RevisionDeviceContent;

const side = (id: string, devices: RevisionDeviceContent[], sheet: Record<string, unknown> = { sheet: { corner: 'TT' } }): DiffSide => ({ id, label: id, sheet, devices });

describe('valueChanges', () => {
  it('names every differing leaf by its dotted path, with absent values as null', () => {
    expect(valueChanges({ a: 1, b: { c: 2, d: 3 } }, { a: 1, b: { c: 5 }, e: 'x' })).toEqual([
      { path: 'b.c', from: 2, to: 5 },
      { path: 'b.d', from: 3, to: null },
      { path: 'e', from: null, to: 'x' },
    ]);
  });

  it('compares arrays whole, whatever the order of the members of their objects', () => {
    expect(valueChanges({ w: [{ code: 'A', message: 'm' }] }, { w: [{ message: 'm', code: 'A' }] })).toEqual([]);
    expect(valueChanges({ w: [] }, { w: [{ code: 'A' }] })).toEqual([{ path: 'w', from: [], to: [{ code: 'A' }] }]);
  });
});

describe('diffRevisions', () => {
  it('matches devices by their sheet id: a rename is a change of name, not a removal and an addition', () => {
    const diff = diffRevisions(side('r2', [device('d1', 'M1a', { l: 1e-6 })]), side('r1', [device('d1', 'M1', { l: 1e-6 })]));
    expect(diff).toMatchObject({ added: [], removed: [], changed: [{ id: 'd1', name: 'M1a', changes: [{ path: 'name', from: 'M1', to: 'M1a' }] }] });
  });

  it('lists added and removed devices and the sheet-level changes', () => {
    const diff = diffRevisions(side('r2', [device('d2', 'M2', {})], { sheet: { corner: 'SS' } }), side('r1', [device('d1', 'M1', {})]));
    expect(diff).toMatchObject({ againstId: 'r1', added: [{ id: 'd2', name: 'M2' }], removed: [{ id: 'd1', name: 'M1' }], changed: [], sheetChanges: [{ path: 'sheet.corner', from: 'TT', to: 'SS' }] });
  });

  it('counts every device as added when there is nothing to compare with', () => {
    expect(diffRevisions(side('r1', [device('d1', 'M1', {})]), null)).toMatchObject({ againstId: null, added: [{ id: 'd1' }], sheetChanges: [] });
  });
});
