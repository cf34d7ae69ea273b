import { createHash } from 'node:crypto';
import { canonicalJson } from './canonical-json.js';

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

describe('SHA-256 as the revisions use it (node:crypto)', () => {
  it('gives the FIPS 180-4 (2015) example digest of "abc"', () => {
    // NIST's SHA-256 example computation for the message "abc" (the examples that accompany FIPS 180-4).
    expect(createHash('sha256').update('abc', 'utf8').digest('hex')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
  });
});
