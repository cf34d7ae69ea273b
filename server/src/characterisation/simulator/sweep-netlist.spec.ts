import type { TableGrid } from '@channelwright/shared/device';
import { parseModelCard } from '@channelwright/shared/model-card';
import { buildSweepNetlist, instanceScales, instanceVectors, modelFamily } from './sweep-netlist.js';

const card = parseModelCard(['* uploaded comment line', '.lib tt', '.model pch pmos (level=54 version=4.8.2 vth0=-0.45 toxe=4.1n) ; tail comment', '.endl tt'].join('\n'));
const model = card.sections[0].models[0];
const grid: TableGrid = {
  polarity: 'pmos',
  modelName: 'pch',
  referenceWidth: 10e-6,
  lengths: [0.18e-6, 0.5e-6, 2e-6],
  vgs: { start: 0, step: 0.025, count: 73 },
  vds: [0.1, 0.9, 1.8],
  vsb: [0, 0.45],
  corners: ['tt'],
  temperatures: [-40, 125],
};

describe('buildSweepNetlist', () => {
  const sweep = buildSweepNetlist(model, 'bsim4', grid, { corner: 0, temperature: 1, lengths: [0, 2] }, 'nonce-42');
  const lines = sweep.netlist.split('\n');

  it('holds only what Channelwright writes: no comment or layout of the uploaded card survives', () => {
    expect(sweep.netlist).not.toMatch(/uploaded|tail comment|;|\.control|\.include|\.lib/i);
    expect(lines[0]).toBe('* channelwright sweep nonce-42');
    expect(lines[1]).toBe('.model pch pmos level=54 version=4.8.2');
    expect(lines[2]).toBe('+ vth0=-0.45 toxe=4.1e-9');
    expect(lines.filter((line) => line.startsWith('.model') || line.startsWith('+'))).toHaveLength(2);
  });

  it('sets the tightened options and the temperature of the chunk', () => {
    expect(lines).toContain('.options abstol=1e-20 reltol=1e-6 vntol=1e-12 gmin=1e-20');
    expect(lines).toContain('.temp 125');
  });

  it('has one instance per length, VSB and VDS of the chunk, with PMOS voltages turned negative (body positive)', () => {
    expect(sweep.instances).toHaveLength(2 * 2 * 3);
    expect(sweep.instances[0]).toEqual({ length: 0, vsb: 0, vds: 0 });
    expect(sweep.instances[11]).toEqual({ length: 2, vsb: 1, vds: 2 });
    expect(lines).toContain('vb1 b1 0 0.45');
    expect(lines).toContain('vd11 d11 0 -1.8');
    expect(lines).toContain('m11 d11 g 0 b1 pch w=1e-5 l=2e-6');
    expect(lines).toContain('.dc vg 0 -1.8 -0.025');
  });

  it('reads back the sweep and, per instance, ID and the nine operating-point outputs', () => {
    expect(sweep.vectors).toHaveLength(1 + 12 * 10);
    expect(sweep.vectors[0]).toBe('v(v-sweep)');
    expect(sweep.vectors.slice(1, 11)).toEqual(['i(vd0)', '@m0[gm]', '@m0[gds]', '@m0[gmbs]', '@m0[vth]', '@m0[vdsat]', '@m0[cgg]', '@m0[cgs]', '@m0[cgd]', '@m0[cgb]']);
    expect(lines.filter((line) => line.startsWith('.save'))).toHaveLength(12);
  });

  it('has the worker make the answers polarity-normalised: VGS and ID positive for a conducting PMOS, Cgs, Cgd, Cgb as −∂Qg/∂V', () => {
    expect(sweep.scales).toHaveLength(sweep.vectors.length);
    expect(sweep.scales[0]).toBe(-1);
    expect(sweep.scales.slice(1, 11)).toEqual([1, 1, 1, 1, 1, 1, 1, -1, -1, -1]);
    expect(instanceScales('bsim4', 1)[0]).toBe(-1);
    expect(instanceScales('bsim3', 1)).toHaveLength(9);
  });

  it('reads no cgb from a BSIM3 model, which has no such output', () => {
    expect(instanceVectors('bsim3', 3)).not.toContain('@m3[cgb]');
    expect(modelFamily({ ...model, level: 49 })).toBe('bsim3');
    expect(modelFamily({ ...model, level: 14 })).toBe('bsim4');
    expect(modelFamily({ ...model, level: 1 })).toBeNull();
  });
});
