import { canonicalJson } from './canonical-json.js';
import { revisionHash } from './revision-content.js';
import type { RevisionDeviceEntity } from './revision-device.entity.js';
import type { RevisionEntity } from './revision.entity.js';

describe('canonicalJson (RFC 8785, 2020)', () => {
  it('sorts members by name and writes no whitespace, at every depth', () => {
    expect(canonicalJson({ b: 1, a: { d: [3, { z: true, y: null }], c: 'x' } })).toBe('{"a":{"c":"x","d":[3,{"y":null,"z":true}]},"b":1}');
  });

  it('orders names by UTF-16 code units, as in the sorting example of RFC 8785 §3.2.3 (from memory)', () => {
    const object = { '\u20ac': 'Euro Sign', '\r': 'Carriage Return', '\ufb33': 'Hebrew Letter Dalet With Dagesh', '1': 'One', '\ud83d\ude00': 'Emoji: Grinning Face', '\u0080': 'Control', '\u00f6': 'Latin Small Letter O With Diaeresis' };
    const names = Object.keys(JSON.parse(canonicalJson(object)));
    // JSON.parse puts the integer-like name "1" first whatever the text says, so compare the text order instead.
    const order = [...canonicalJson(object).matchAll(/"([^"]*)":"/g)].map((m) => JSON.parse(`"${m[1]}"`) as string);
    expect(order).toEqual(['\r', '1', '\u0080', '\u00f6', '\u20ac', '\ud83d\ude00', '\ufb33']);
    expect(names).toHaveLength(7);
  });

  it('writes numbers the way ECMAScript does, as in the number example of RFC 8785 §3.2.2 (from memory)', () => {
    const numbers = JSON.parse('[333333333.33333329, 1E30, 4.50, 2e-3, 0.000000000000000000000000001]');
    expect(canonicalJson(numbers)).toBe('[333333333.3333333,1e+30,4.5,0.002,1e-27]');
    expect(canonicalJson([20e-6, -0, 1e21])).toBe('[0.00002,0,1e+21]');
  });

  it('leaves out members that are undefined and refuses values JSON cannot carry', () => {
    expect(canonicalJson({ a: undefined, b: 2 })).toBe('{"b":2}');
    expect(() => canonicalJson({ x: Number.NaN })).toThrow(TypeError);
    expect(() => canonicalJson([undefined])).toThrow(TypeError);
    expect(() => canonicalJson({ when: new Date(0) })).toThrow(/ISO 8601/);
    expect(() => canonicalJson(10n)).toThrow(TypeError);
  });

  it('gives the same text for the same value whatever order its members were built in', () => {
    const one = { devices: [{ name: 'M1', targets: { l: 5e-7, id: 2e-5 } }], sheet: { name: 'Two-stage amplifier' } };
    const two = { sheet: { name: 'Two-stage amplifier' }, devices: [{ targets: { id: 2e-5, l: 5e-7 }, name: 'M1' }] };
    expect(canonicalJson(one)).toBe(canonicalJson(two));
  });

  it('escapes strings as JSON.stringify does', () => {
    expect(canonicalJson('tail "M5"\n\u0001µ')).toBe('"tail \\"M5\\"\\n\\u0001µ"');
  });
});

describe('revisionHash over the canonical JSON of a revision', () => {
  const revision = {
    id: 'rev-1',
    sheetId: 'sheet-1',
    projectId: 'project-1',
    number: 2,
    message: 'Bias generator for review',
    authorId: 'user-1',
    createdAt: new Date('2026-03-02T10:15:00.000Z'),
    sheetSnapshot: '{"name":"Bias generator","description":"","temperature":27,"corner":"TT","model":"all-region"}',
    processVersionId: 'pv-1',
    processProfileId: 'pp-1',
    processName: 'BF180-G',
    processVersionNumber: 1,
    engineVersion: '1.0.0',
    hash: '',
  } as RevisionEntity;
  const device = (position: number, targets: string, result: string | null = '{"w":1.2e-5,"corners":[[1,2],[3,4]]}') =>
    ({ id: `row-${position}`, revisionId: 'rev-1', deviceId: `dev-${position}`, position, name: `M${position}`, targets, result, error: null, engineVersion: '1.0.0', processVersionId: 'pv-1', computedAt: '2026-03-02T10:14:00.000Z' }) as RevisionDeviceEntity;
  const devices = [device(0, '{"name":"M0","id":2e-5,"l":5e-7,"note":"µ-power"}'), device(1, '{"name":"M1","id":1e-6,"l":1e-6}')];
  const hash = revisionHash(revision, devices);

  it('is 64 hex digits of SHA-256 and the same however the stored JSON orders, spells or escapes the same values', () => {
    expect(hash).toMatch(/^[0-9a-f]{64}$/);
    const respelled = [
      device(1, '{"l":0.000001,"id":1E-6,"name":"M1"}'),
      device(0, '{"note":"\\u00b5-power","l":0.0000005,"id":0.00002,"name":"M0"}', '{"corners":[[1.0,2],[3,4.00]],"w":0.000012}'),
    ];
    expect(revisionHash(revision, respelled)).toBe(hash);
  });

  it('changes when any value changes, including one deep in a nested array', () => {
    expect(revisionHash(revision, [device(0, '{"name":"M0","id":2.1e-5,"l":5e-7,"note":"µ-power"}'), devices[1]])).not.toBe(hash);
    expect(revisionHash(revision, [device(0, devices[0].targets, '{"w":1.2e-5,"corners":[[1,2],[4,3]]}'), devices[1]])).not.toBe(hash);
    expect(revisionHash({ ...revision, message: 'Bias generator for review.' } as RevisionEntity, devices)).not.toBe(hash);
    expect(revisionHash(revision, [devices[0], { ...devices[1], position: 2 } as RevisionDeviceEntity])).not.toBe(hash);
    expect(revisionHash(revision, [devices[0]])).not.toBe(hash);
  });
});
