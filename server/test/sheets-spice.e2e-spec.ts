import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { BF180G } from '@channelwright/shared/device';
import { processProfileSchema, revisionSchema, sheetSchema, type Device, type Process, type Sheet } from '@channelwright/shared/schemas';
import { demoSheet, signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';
import { describeWithNgspice, requireNativeNgspice } from './helpers/ngspice.js';

/** An instance line split as a netlist reader splits it: blank-separated fields, name=value parameters (ngspice manual, ch. 2, 2024). */
function parseInstance(line: string) {
  const [name, drain, gate, source, bulk, model, ...rest] = line.trim().split(/\s+/);
  const parameters = Object.fromEntries(rest.map((field) => field.split('=')).map(([key, value]) => [key.toLowerCase(), Number(value)]));
  return { name, nodes: [drain, gate, source, bulk], model, parameters };
}

const instancesOf = (deck: string) => deck.split('\n').filter((line) => /^M/i.test(line)).map(parseInstance);

/** Runs a netlist in ngspice's batch mode and reads @<instance>[id] of every instance from the ASCII rawfile. */
function simulate(netlist: string, instances: string[]): Map<string, number> {
  const folder = mkdtempSync(join(tmpdir(), 'channelwright-spice-'));
  try {
    writeFileSync(join(folder, '.spiceinit'), 'set num_threads=1\n');
    const saves = instances.map((name) => `@${name.toLowerCase()}[id]`).join(' ');
    writeFileSync(join(folder, 'deck.cir'), `${netlist}\n.save ${saves}\n.control\nset filetype=ascii\nop\nwrite out.raw\n.endc\n.end\n`);
    const run = spawnSync('ngspice', ['-b', 'deck.cir'], { cwd: folder, encoding: 'utf8', timeout: 60_000 });
    // ngspice -b exits 1 after a successful .control run: judge by the rawfile (ngspice manual, 2024).
    if (!existsSync(join(folder, 'out.raw'))) throw new Error(`ngspice wrote no rawfile:\n${run.stdout}\n${run.stderr}`);
    const raw = readFileSync(join(folder, 'out.raw'), 'utf8');
    const names = [...raw.split('\nVariables:')[1].split('\nValues:')[0].matchAll(/^\s*\d+\s+(\S+)\s+\S+\s*$/gm)].map((m) => m[1].replace(/^[iv]\((.*)\)$/, '$1'));
    const values = raw.split('\nValues:')[1].trim().split(/\s+/).slice(1).map(Number);
    return new Map(names.map((name, i) => [name.toLowerCase(), values[i]]));
  } finally {
    rmSync(folder, { recursive: true, force: true });
  }
}

/** Sources that put each device of the deck at its stored bias: NMOS-like nodes for NMOS, mirrored below a 3 V source for PMOS. */
function biasSources(devices: readonly Device[], instances: ReturnType<typeof instancesOf>): string[] {
  return instances.flatMap((instance, i) => {
    const device = devices.filter((d) => d.result)[i];
    const r = device.result!;
    const [d, g, s, b] = instance.nodes;
    const top = device.targets.polarity === 'pmos' ? 3 : 0;
    const sign = device.targets.polarity === 'pmos' ? -1 : 1;
    return [`v${s} ${s} 0 ${top}`, `v${g} ${g} 0 ${top + sign * r.vgs}`, `v${d} ${d} 0 ${top + sign * r.vds}`, `v${b} ${b} 0 ${top - sign * r.vsb}`];
  });
}

describe('GET /api/sheets/:id/export?format=spice', () => {
  let t: TestApp;
  let tokens: Tokens;
  let bias: Sheet;

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    bias = await demoSheet(t, tokens.designer, 'Bias generator');
  });
  afterAll(() => t.close());

  const exportDeck = async (sheetId: string, query = '') => (await t.http().get(`/api/sheets/${sheetId}/export?format=spice${query}`).set(bearer(tokens.viewer)).expect(200)).text;

  it('writes one instance line per device that parses back to its W, L, fingers, multiplier and the profile\'s model names', async () => {
    const deck = await exportDeck(bias.id);
    const instances = instancesOf(deck);
    expect(instances.map((i) => i.name)).toEqual(bias.devices.map((d) => d.targets.name));
    instances.forEach((instance, index) => {
      const device = bias.devices[index];
      expect(instance.model).toBe(device.targets.flavour === 'native' ? 'bfn18na' : device.targets.polarity === 'nmos' ? 'bfn18' : 'bfp18');
      expect(instance.parameters).toEqual({ w: device.result!.w, l: device.result!.l, nf: device.result!.fingers, m: device.targets.multiplier });
      expect(instance.nodes).toEqual(['d', 'g', 's', 'b'].map((prefix) => `${prefix}_${instance.name}`));
    });
  });

  it('names the process, its version, the newest revision and its hash in the header, and says when the sheet has moved on', async () => {
    const frozen = await t.http().post(`/api/sheets/${bias.id}/revisions`).set(bearer(tokens.designer)).send({ message: 'for the netlist' }).expect(201);
    const revision = revisionSchema.parse(frozen.body);
    const header = (await exportDeck(bias.id)).split('\n').filter((line) => line.startsWith('*'));
    expect(header).toEqual(expect.arrayContaining([`* process: BF180-G version ${bias.process.version}`, `* revision: ${revision.label}, sha-256 ${revision.hash}`]));
    await t.http().patch(`/api/sheets/${bias.id}/devices/${bias.devices[0].id}`).set(bearer(tokens.designer)).send({ version: bias.devices[0].version, id: 6e-6 }).expect(200);
    expect(await exportDeck(bias.id)).toContain('(the sheet has changed since: these lines are the sheet as it is now)');
  });

  it('makes every name safe for a netlist: a device called "M1 copy" becomes M1_copy, and designers\' nodes are kept', async () => {
    const amplifier = await demoSheet(t, tokens.designer, 'Two-stage amplifier');
    const m1 = amplifier.devices[0];
    await t.http().post(`/api/sheets/${amplifier.id}/devices`).set(bearer(tokens.designer)).send({ ...m1.targets, name: 'M1 copy', nodes: { drain: 'out1', gate: 'inp', source: 'tail', bulk: 'vdd' } }).expect(201);
    const line = instancesOf(await exportDeck(amplifier.id)).find((i) => i.name === 'M1_copy');
    expect(line?.nodes).toEqual(['out1', 'inp', 'tail', 'vdd']);
    const refused = await t.http().post(`/api/sheets/${amplifier.id}/devices`).set(bearer(tokens.designer)).send({ ...m1.targets, name: 'M1 bad', nodes: { drain: 'out 1' } }).expect(400);
    expect(refused.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'nodes.drain' });
  });

  describeWithNgspice('simulated in ngspice (Debian ngspice 39)', () => {
    beforeAll(() => requireNativeNgspice());

    it('accepts every line of the demo deck with the invented BSIM4 demo card, fingers included', async () => {
      const deck = await exportDeck(bias.id);
      const instances = instancesOf(deck);
      const card = resolve(__dirname, '../src/characterisation/demo-cards/bf180g.lib');
      const currents = simulate(`* the exported deck on the invented BSIM4 card\n.lib '${card}' tt\n${deck}\n${biasSources((await demoSheet(t, tokens.viewer, 'Bias generator')).devices, instances).join('\n')}`, instances.map((i) => i.name));
      for (const instance of instances) expect(Math.abs(currents.get(`@${instance.name.toLowerCase()}[id]`) ?? Number.NaN)).toBeGreaterThan(0);
    });

    it('reproduces each device\'s ID within 0.1 % with the demo\'s level-1 parameters (Shichman & Hodges, IEEE JSSC 3(3), 1968)', async () => {
      // BF180-G's parameters with λ independent of L (level 1 has no length scaling) as a profile of its own, invented demo data.
      const params = (p: Process['nmos']) => {
        const { lRef: _lRef, ...rest } = p;
        return rest;
      };
      const level1: Process = { ...BF180G, name: 'BF180-G level-1 (invented)', nmos: params(BF180G.nmos), pmos: params(BF180G.pmos), flavours: [], spiceModels: { nmos: 'n_l1', pmos: 'p_l1' } };
      const profile = processProfileSchema.parse((await t.http().post('/api/processes').set(bearer(tokens.admin)).send({ definition: level1, message: 'level-1 check' }).expect(201)).body);
      const project = await wrenmoss(t, tokens.designer);
      const created = sheetSchema.parse((await t.http().post(`/api/projects/${project.id}/sheets`).set(bearer(tokens.designer)).send({ name: 'Level 1 deck', processId: profile.id, model: 'square-law' }).expect(201)).body);
      const targets = [
        { name: 'MN1', polarity: 'nmos', id: 20e-6, l: 0.5e-6, vds: 0.6, vov: 0.25 },
        { name: 'MN2 body', polarity: 'nmos', id: 50e-6, l: 1e-6, vds: 0.8, vsb: 0.4, gmId: 8, multiplier: 3 },
        { name: 'MN3', polarity: 'nmos', id: 2e-3, l: 0.36e-6, vds: 0.9, vov: 0.3 },
        { name: 'MP1', polarity: 'pmos', id: 10e-6, l: 1e-6, vds: 0.5, vov: 0.2 },
        { name: 'MP2', polarity: 'pmos', id: 100e-6, l: 0.5e-6, vds: 0.7, vsb: 0.3, vgs: 0.95 },
        { name: 'MT', polarity: 'nmos', id: 100e-6, l: 0.5e-6, vds: 0.1, vov: 0.4 },
      ];
      for (const body of targets) await t.http().post(`/api/sheets/${created.id}/devices`).set(bearer(tokens.designer)).send(body).expect(201);
      const sheet = sheetSchema.parse((await t.http().get(`/api/sheets/${created.id}`).set(bearer(tokens.designer)).expect(200)).body);
      expect(sheet.devices.every((d) => d.result !== null)).toBe(true);
      const deck = (await t.http().get(`/api/sheets/${created.id}/export?format=spice&fingers=omit`).set(bearer(tokens.viewer)).expect(200)).text;
      const instances = instancesOf(deck);
      const card = (name: string, polarity: 'nmos' | 'pmos') => {
        const p = level1[polarity];
        return `.model ${name} ${polarity} level=1 vto=${polarity === 'nmos' ? p.vt0 : -p.vt0} kp=${p.kp} gamma=${p.gamma} phi=${p.twoPhiF} lambda=${p.lambda} tnom=${level1.tnom} is=0 ld=0`;
      };
      const netlist = ['* the exported deck with invented level-1 cards', '.options abstol=1e-20 reltol=1e-9 vntol=1e-12 gmin=1e-20', card('n_l1', 'nmos'), card('p_l1', 'pmos'), deck, ...biasSources(sheet.devices, instances)].join('\n');
      const currents = simulate(netlist, instances.map((i) => i.name));
      instances.forEach((instance, index) => {
        const device = sheet.devices[index];
        const simulated = Math.abs(currents.get(`@${instance.name.toLowerCase()}[id]`) as number);
        expect(Math.abs(simulated / (device.result!.id * device.targets.multiplier) - 1)).toBeLessThan(1e-3);
      });
    });
  });
});
