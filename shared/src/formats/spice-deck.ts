import type { Device } from '../schemas/device.js';
import type { Polarity, Process } from '../schemas/process.js';
import type { Sheet } from '../schemas/sheets.js';
import { netlistName, uniqueNetlistNames } from './netlist-name.js';
import { plainNumber } from './plain-number.js';
import { EXPORT_CAUTION } from './sheet-metadata.js';

export interface SpiceDeckContext {
  projectName: string;
  engineVersion: string;
  exportedAt: Date;
  /** The revision the header names (the sheet's latest), and whether the sheet still holds what it froze. */
  revision: { label: string; hash: string; matchesSheet: boolean } | null;
  /** nf: the finger count on each line (BSIM3/BSIM4 models); omit: leave it off (levels 1–3 have no nf). */
  fingers?: 'nf' | 'omit';
}

/** The model name of a device type: the profile's map (spiceModels), else "<process>_<polarity|flavour>". */
export function spiceModelName(process: Pick<Process, 'name' | 'spiceModels'>, polarity: Polarity, flavour?: string): string {
  const mapped = flavour === undefined ? process.spiceModels?.[polarity] : process.spiceModels?.flavours?.[flavour];
  return mapped ?? netlistName(`${process.name}_${flavour ?? polarity}`, 'm');
}

/** The instance name of each device: "M" and its netlist-safe name (M1 stays M1), unique without regard to case. */
export function spiceInstanceNames(devices: readonly Pick<Device, 'targets'>[]): string[] {
  return uniqueNetlistNames(devices.map((d) => (/^m/i.test(d.targets.name) ? d.targets.name : `M${d.targets.name}`)), 'M');
}

/**
 * The sheet's devices as SPICE instance lines, `M<name> <d> <g> <s> <b> <model> W=… L=… nf=… m=…`, under a
 * comment header naming the project, sheet, process and version, the revision and its hash, the engine and
 * the model-name map. Nodes are the designer's per device or placeholders d_<instance>, g_<instance>,
 * s_<instance>, b_<instance> to connect. W is the drawn width of all fingers together (nf splits it), in metres; m is the
 * device's multiplier. A device without a result is a comment saying why. No .model cards: the deck is
 * meant to be included in a netlist that loads the foundry's.
 */
export function writeSpiceDeck(sheet: Sheet, process: Pick<Process, 'name' | 'spiceModels' | 'flavours'>, context: SpiceDeckContext): string {
  const fingers = context.fingers ?? 'nf';
  const names = spiceInstanceNames(sheet.devices);
  const models = modelMap(process);
  const revision = context.revision
    ? `${context.revision.label}, sha-256 ${context.revision.hash}${context.revision.matchesSheet ? '' : ' (the sheet has changed since: these lines are the sheet as it is now)'}`
    : 'none (the sheet as it is now; no revision frozen)';
  const header = [
    `* Channelwright sheet "${oneLine(sheet.name)}" of project "${oneLine(context.projectName)}": one instance line per sized device`,
    `* process: ${oneLine(sheet.process.name)} version ${sheet.process.version}`,
    `* revision: ${revision}`,
    `* engine: ${context.engineVersion}; exported ${context.exportedAt.toISOString()}`,
    `* models: ${models.join(', ')}`,
    `* W is the drawn width of all fingers in metres${fingers === 'nf' ? ', nf the number of fingers' : ' (nf left off: the models have no finger parameter)'}, m the multiplier`,
    '* nodes: drain gate source bulk; d_/g_/s_/b_<name> are placeholders to connect',
    `* ${EXPORT_CAUTION}`,
  ];
  const lines = sheet.devices.map((device, index) => instanceLine(device, names[index], process, fingers));
  return `${[...header, ...lines, ''].join('\n')}`;
}

function instanceLine(device: Device, name: string, process: Pick<Process, 'name' | 'spiceModels'>, fingers: 'nf' | 'omit'): string {
  const { targets, result } = device;
  if (!result) return `* ${name}: not sized (${device.error ? `${device.error.code}: ${oneLine(device.error.message)}` : 'no result'})`;
  // Placeholders follow the unique instance name, so two devices never share one by accident.
  const node = (given: string | undefined, prefix: string) => given ?? `${prefix}_${name}`;
  const n = targets.nodes ?? {};
  const fields = [
    name,
    node(n.drain, 'd'),
    node(n.gate, 'g'),
    node(n.source, 's'),
    node(n.bulk, 'b'),
    spiceModelName(process, targets.polarity, targets.flavour),
    `W=${plainNumber(result.w)}`,
    `L=${plainNumber(result.l)}`,
    ...(fingers === 'nf' ? [`nf=${result.fingers}`] : []),
    `m=${targets.multiplier}`,
  ];
  return fields.join(' ');
}

function modelMap(process: Pick<Process, 'name' | 'spiceModels' | 'flavours'>): string[] {
  const types = new Map<string, string>();
  for (const polarity of ['nmos', 'pmos'] as const) types.set(polarity.toUpperCase(), spiceModelName(process, polarity));
  for (const flavour of process.flavours ?? []) types.set(`${flavour.name} (${flavour.polarity.toUpperCase()})`, spiceModelName(process, flavour.polarity, flavour.name));
  return [...types].map(([type, model]) => `${type} -> ${model}`);
}

function oneLine(text: string): string {
  return text.replace(/[\r\n]+/g, ' ');
}
