import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

/** Whether Debian's ngspice answers here; suites that need it skip locally without it and fail under CI=true. */
export const ngspiceAvailable = (() => {
  const probe = spawnSync('ngspice', ['-v'], { encoding: 'utf8' });
  return !probe.error && /ngspice/i.test(`${probe.stdout}${probe.stderr}`);
})();
export const onCi = process.env.CI === 'true';

/** A fresh run folder with `set num_threads=1` (BSIM evaluation on one thread: OpenMP stalls on a busy machine). */
export function runFolder(): string {
  const folder = mkdtempSync(join(tmpdir(), 'channelwright-ngspice-'));
  writeFileSync(join(folder, '.spiceinit'), 'set num_threads=1\n');
  return folder;
}

/**
 * Runs a netlist (without .control) in batch mode with a `.dc` analysis, saves `saves` and reads the ASCII
 * rawfile: one array per saved vector, by the sweep's points. ngspice -b exits 1 after some successful
 * .control runs, so the rawfile decides.
 */
export function runDc(folder: string, netlist: string[], dc: string, saves: string[]): Map<string, number[]> {
  const text = [
    '* Channelwright test netlist',
    '.options abstol=1e-20 reltol=1e-9 vntol=1e-12 gmin=1e-20',
    ...netlist,
    `.save ${saves.join(' ')}`,
    '.control',
    'set filetype=ascii',
    dc,
    'write out.raw',
    '.endc',
    '.end',
  ].join('\n');
  writeFileSync(join(folder, 'run.cir'), `${text}\n`);
  rmSync(join(folder, 'out.raw'), { force: true });
  const run = spawnSync('ngspice', ['-b', 'run.cir'], { cwd: folder, encoding: 'utf8', timeout: 120_000 });
  if (!existsSync(join(folder, 'out.raw'))) throw new Error(`ngspice wrote no rawfile:\n${run.stdout}\n${run.stderr}`);
  const raw = readFileSync(join(folder, 'out.raw'), 'utf8');
  const header = raw.split('\nVariables:')[1].split('\nValues:')[0];
  const names = [...header.matchAll(/^\s*(\d+)\s+(\S+)\s+\S+\s*$/gm)].map((m) => m[2].toLowerCase());
  const points = Number(/No\. Points:\s*(\d+)/.exec(raw)?.[1]);
  const numbers = raw.split('\nValues:')[1].trim().split(/\s+/);
  const columns = new Map<string, number[]>(names.map((name) => [name, []]));
  // Each point: its index, then one value per variable.
  let at = 0;
  for (let p = 0; p < points; p++) {
    at += 1;
    for (const name of names) columns.get(name)!.push(Number(numbers[at++]));
  }
  return columns;
}

/** A deterministic generator (a linear congruential one), so a seeded test is the same every run. */
export function seeded(seed: number) {
  let state = seed >>> 0;
  const next = () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
  /** A standard normal number (Box–Muller). */
  const normal = () => Math.sqrt(-2 * Math.log(1 - next())) * Math.cos(2 * Math.PI * next());
  return { next, normal };
}
