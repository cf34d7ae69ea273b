import { describe, expect, it } from 'vitest';
import { BF130G, BF180G } from '../src/device/index.js';
import { netlistName, spiceModelName, uniqueNetlistNames, writeSpiceDeck } from '../src/formats/index.js';
import { demoSheet } from './support/demo-sheet.js';

const context = { projectName: 'Wrenmoss sensor front end', engineVersion: 'test', exportedAt: new Date('2030-01-02T03:04:05Z'), revision: { label: 'r2', hash: 'ab'.repeat(32), matchesSheet: true } };

/** A SPICE line split into fields, as a netlist reader splits it (blank-separated; ngspice manual, ch. 2, 2024). */
const fieldsOf = (line: string) => line.trim().split(/\s+/);

describe('netlist names', () => {
  it('turn anything into letters, digits and underscores, starting with a letter', () => {
    expect(netlistName('M1 copy')).toBe('M1_copy');
    expect(netlistName('=SUM(A1)', 'M')).toBe('M_SUM_A1_');
    expect(netlistName('2nd stage', 'M')).toBe('M2nd_stage');
    expect(netlistName('Mé')).toBe('Me');
  });

  it('stay unique without regard to case, as SPICE folds case', () => {
    expect(uniqueNetlistNames(['M1 copy', 'M1_copy', 'm1_COPY'])).toEqual(['M1_copy', 'M1_copy_2', 'm1_COPY_3']);
  });
});

describe('writeSpiceDeck', () => {
  const sheet = demoSheet();
  const deck = writeSpiceDeck(sheet, BF180G, context);
  const lines = deck.split('\n').filter((line) => line !== '');
  const instances = lines.filter((line) => !line.startsWith('*'));

  it('starts with a comment header naming the process and version, the sheet, the revision with its hash and the models', () => {
    const header = lines.filter((line) => line.startsWith('*')).join('\n');
    expect(header).toContain('process: BF180-G version 1');
    expect(header).toContain('Export, "quoted" & odd');
    expect(header).toContain(`revision: r2, sha-256 ${'ab'.repeat(32)}`);
    expect(header).toContain('NMOS -> bfn18, PMOS -> bfp18, native (NMOS) -> bfn18na');
  });

  it('writes one instance line per sized device: name, drain, gate, source, bulk, model, W, L, nf, m', () => {
    const sized = sheet.devices.filter((d) => d.result);
    expect(instances.length).toBe(sized.length);
    instances.forEach((line, i) => {
      const device = sized[i];
      const [name, d, g, s, b, model, ...parameters] = fieldsOf(line);
      expect(name).toMatch(/^M[A-Za-z0-9_]+$/);
      expect([d, g, s, b].every((node) => /^[A-Za-z0-9_]+$/.test(node))).toBe(true);
      expect(model).toBe(device.targets.flavour === 'native' ? 'bfn18na' : device.targets.polarity === 'nmos' ? 'bfn18' : 'bfp18');
      const values = Object.fromEntries(parameters.map((p) => p.split('=')));
      expect(Number(values.W)).toBe(device.result!.w);
      expect(Number(values.L)).toBe(device.result!.l);
      expect(Number(values.nf)).toBe(device.result!.fingers);
      expect(Number(values.m)).toBe(device.targets.multiplier);
    });
  });

  it('uses the designer\'s nodes where given and placeholders named after the instance elsewhere', () => {
    expect(fieldsOf(instances[0]).slice(0, 5)).toEqual(['M1', 'out', 'inp', 'tail', 'vss']);
    expect(fieldsOf(instances.find((l) => l.startsWith('M1_copy'))!).slice(0, 5)).toEqual(['M1_copy', 'd_M1_copy', 'g_M1_copy', 's_M1_copy', 'b_M1_copy']);
    expect(instances.some((l) => l.startsWith('M_SUM_A1_ '))).toBe(true);
  });

  it('says why a device has no line, and leaves nf off for models without fingers', () => {
    expect(lines).toContain(lines.find((l) => l.startsWith('* MW: not sized (GM_ID_ABOVE_WEAK_INVERSION_LIMIT')));
    const plain = writeSpiceDeck(sheet, BF180G, { ...context, fingers: 'omit' });
    expect(plain).not.toMatch(/ nf=/);
    expect(plain).toMatch(/ m=3\n/);
  });

  it('names a model the profile does not map after the process', () => {
    expect(spiceModelName({ name: 'BF130-G' }, 'pmos')).toBe('BF130_G_pmos');
    expect(spiceModelName(BF130G, 'pmos')).toBe('bfp13');
  });
});
