import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** SPICE level 1 parameters of a curve set (ngspice's names and units: V, A/V², √V, V, 1/V). */
export interface Level1Card {
  vto: number;
  kp: number;
  gamma: number;
  phi: number;
  lambda: number;
}

export interface Level1Sweep {
  polarity: 'nmos' | 'pmos';
  card: Level1Card;
  /** Drawn W and L, m. */
  w: number;
  l: number;
  /** Magnitudes of the drain and reverse body biases, V. */
  drains: number[];
  bodies: number[];
  /** Gate sweep from 0 to `vgsMax` (its magnitude) in `step`, V. */
  vgsMax: number;
  step: number;
  /** Multiplies each current by 1 + noise() (seeded noise in a test). */
  noise?: () => number;
}

/**
 * A curve file simulated by Debian's ngspice with MOS level 1 (Shichman & Hodges, IEEE JSSC 3(3), 1968): ID against
 * VGS at every drain and body bias, written as the simulator gives the terminals (a PMOS in negative VGS, VDS, ID).
 * Header "VGS [V],VDS [V],VSB [V],T [°C],ID [uA]"; W and L are not in the file (the upload gives them).
 */
export function level1CurveFile(sweep: Level1Sweep): string {
  const sign = sweep.polarity === 'nmos' ? 1 : -1;
  const { card } = sweep;
  const netlist = [
    '* Invented test curves: ngspice MOS level 1 with known parameters',
    '.options abstol=1e-20 reltol=1e-9 vntol=1e-12 gmin=1e-20',
    `.model known ${sweep.polarity} level=1 vto=${sign * card.vto} kp=${card.kp} gamma=${card.gamma} phi=${card.phi} lambda=${card.lambda} is=0 tnom=27`,
    'vg g 0 0',
  ];
  const curves: { vds: number; vsb: number; vector: string }[] = [];
  for (const vds of sweep.drains) {
    for (const vsb of sweep.bodies) {
      const k = curves.length;
      netlist.push(`m${k} d${k} g 0 b${k} known w=${sweep.w} l=${sweep.l}`, `vd${k} d${k} 0 ${sign * vds}`, `vb${k} b${k} 0 ${-sign * vsb}`);
      curves.push({ vds, vsb, vector: `i(vd${k})` });
    }
  }
  const columns = runDc(netlist, `dc vg 0 ${sign * sweep.vgsMax} ${sign * sweep.step}`, ['v(g)', ...curves.map((c) => c.vector)]);
  const gate = columns.get('v(g)') as number[];
  const rows = ['# Invented test curves simulated by ngspice (MOS level 1); terminal signs as the simulator gives them', 'VGS [V],VDS [V],VSB [V],T [°C],ID [uA]'];
  for (const curve of curves) {
    // i(vd) is the current into the source's + terminal, which is the current out of the drain: −ID. The body
    // source puts VSB = −V(b) = sign·vsb (a reverse bias for either polarity).
    const current = columns.get(curve.vector) as number[];
    gate.forEach((vgs, p) => {
      const id = -current[p] * (1 + (sweep.noise?.() ?? 0));
      rows.push(`${vgs},${sign * curve.vds},${sign * curve.vsb},27,${id * 1e6}`);
    });
  }
  return `${rows.join('\n')}\n`;
}

/** Runs a netlist with one `.dc` analysis in batch mode and reads the ASCII rawfile: one array per saved vector. */
export function runDc(netlist: string[], dc: string, saves: string[]): Map<string, number[]> {
  const folder = mkdtempSync(join(tmpdir(), 'channelwright-level1-'));
  try {
    const text = [...netlist, `.save ${saves.join(' ')}`, '.control', 'set filetype=ascii', dc, 'write out.raw', '.endc', '.end'].join('\n');
    writeFileSync(join(folder, 'run.cir'), `${text}\n`);
    const run = spawnSync('ngspice', ['-b', 'run.cir'], { cwd: folder, encoding: 'utf8', timeout: 120_000 });
    // ngspice -b may exit 1 after a successful .control run: the rawfile decides.
    if (!existsSync(join(folder, 'out.raw'))) throw new Error(`ngspice wrote no rawfile:\n${run.stdout}\n${run.stderr}`);
    const raw = readFileSync(join(folder, 'out.raw'), 'utf8');
    const header = raw.split('\nVariables:')[1].split('\nValues:')[0];
    const names = [...header.matchAll(/^\s*\d+\s+(\S+)\s+\S+\s*$/gm)].map((m) => m[1].toLowerCase());
    const points = Number(/No\. Points:\s*(\d+)/.exec(raw)?.[1]);
    const numbers = raw.split('\nValues:')[1].trim().split(/\s+/);
    const columns = new Map<string, number[]>(names.map((name) => [name, []]));
    let at = 0;
    for (let p = 0; p < points; p++) {
      at += 1; // the point's index
      for (const name of names) columns.get(name)!.push(Number(numbers[at++]));
    }
    return columns;
  } finally {
    rmSync(folder, { recursive: true, force: true });
  }
}

/** A deterministic standard normal generator (a linear congruential generator through Box–Muller), so a seeded test is the same every run. */
export function seededNormal(seed: number): () => number {
  let state = seed >>> 0;
  const next = () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
  return () => Math.sqrt(-2 * Math.log(1 - next())) * Math.cos(2 * Math.PI * next());
}
