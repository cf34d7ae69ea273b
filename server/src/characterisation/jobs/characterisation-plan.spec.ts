import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { BF180G } from '@channelwright/shared/device';
import { parseModelCard } from '@channelwright/shared/model-card';
import { type CharacterisationRequest, characterisationRequestSchema, type ModelCardMapping } from '@channelwright/shared/schemas';
import { planCharacterisation, planHash } from './characterisation-plan.js';

const card = parseModelCard(readFileSync(join(__dirname, '../demo-cards/bf180g.lib'), 'utf8'));
const mapping: ModelCardMapping = {
  corners: { TT: 'tt', FF: 'ff', SS: 'ss', FS: 'fs', SF: 'sf' },
  devices: [
    { model: 'bfn18', polarity: 'nmos' },
    { model: 'bfp18', polarity: 'pmos' },
    { model: 'bfn18na', polarity: 'nmos', flavour: 'native' },
  ],
};
const request = (fields: object = {}): CharacterisationRequest => characterisationRequestSchema.parse({ processId: 'p', ...fields });
const plan = (fields: object = {}) => planCharacterisation(BF180G, card, mapping, request(fields), 5_000_000);
const refusal = (fields: object) => {
  try {
    plan(fields);
  } catch (error) {
    return error;
  }
  throw new Error('planned');
};

describe('planCharacterisation', () => {
  it('gives every mapped device the default grid of its own lmin and VT0: lengths from lmin, VGS from 0 to VDD (from 0.3 V below VT0 for a depletion device)', () => {
    const [nmos, pmos, native] = plan();
    expect(nmos.grid.lengths[0]).toBeCloseTo(0.18e-6, 15);
    expect(native.grid.lengths[0]).toBeCloseTo(0.5e-6, 15);
    expect(nmos.grid.lengths.at(-1)).toBeCloseTo(20 * 0.18e-6, 15);
    expect(nmos.grid.vgs).toEqual({ start: 0, step: 0.01, count: 181 });
    expect(native.grid.vgs).toEqual({ start: -0.42, step: 0.01, count: 223 });
    expect(pmos.model).toBe('bfp18');
    expect(nmos.grid.corners).toEqual(['TT', 'FF', 'SS', 'FS', 'SF']);
    expect(nmos.grid.temperatures).toEqual([-40, 27, 125]);
  });

  it('scales the tables with the effective width: the card\'s 2·wint (wint = 5 nm in the invented card)', () => {
    expect(plan()[0].grid.widthOffset).toBeCloseTo(10e-9, 20);
  });

  it('counts the points of the default BF180-G grid: 10 L × 181 VGS × 8 VDS × 5 VSB × 5 corners × 3 temperatures per device, 223 VGS for the native one', () => {
    expect(plan().map((d) => d.points)).toEqual([1_086_000, 1_086_000, 1_338_000]);
  });

  it('takes the devices, corners and grid values a request gives, sorted', () => {
    const [device] = plan({ devices: [{ polarity: 'pmos' }], grid: { corners: ['SS', 'TT'], vds: [1.2, 0.3], temperatures: [27] } });
    expect(device).toMatchObject({ polarity: 'pmos', flavour: null, model: 'bfp18' });
    expect(device.grid).toMatchObject({ corners: ['SS', 'TT'], vds: [0.3, 1.2], temperatures: [27] });
  });

  it('hashes the same plan the same way and another grid another way', () => {
    expect(planHash(plan())).toBe(planHash(plan()));
    expect(planHash(plan({ grid: { temperatures: [27] } }))).not.toBe(planHash(plan()));
  });

  it('refuses a grid over the point limit naming the field given, and values the version cannot have', () => {
    expect(refusal({ grid: { temperatures: [-40, 0, 27, 85, 125] } })).toMatchObject({ code: 'GRID_TOO_LARGE', field: 'grid.temperatures', status: 400 });
    expect(refusal({ grid: { vsb: [0, 2] } })).toMatchObject({ code: 'GRID_INVALID', field: 'grid.vsb.1' });
    expect(refusal({ devices: [{ polarity: 'pmos', flavour: 'native' }] })).toMatchObject({ code: 'DEVICE_NOT_IN_CARD', field: 'devices.0' });
    expect(refusal({ devices: [{ polarity: 'nmos', flavour: 'native' }], grid: { lengths: [0.18e-6, 1e-6] } })).toMatchObject({ code: 'GRID_INVALID', field: 'grid.lengths' });
  });
});
