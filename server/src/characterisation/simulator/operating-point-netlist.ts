import { emitModel, type ModelStatement, spiceNumber } from '@channelwright/shared/model-card';
import { SWEEP_OPTIONS } from './sweep-netlist.js';

/** A sized device to simulate at one bias: polarity-normalised voltages (PMOS: VSG, VSD, VBS), SI units. */
export interface DeviceToCheck {
  model: ModelStatement;
  /** Drawn width, all fingers, m. */
  w: number;
  /** Fingers of equal width in parallel (m=), each w/fingers wide; 1 when absent. */
  fingers?: number;
  l: number;
  vgs: number;
  vds: number;
  vsb: number;
}

export interface OperatingPointNetlist {
  netlist: string;
  nonce: string;
  /** Per device: i(vd<k>) and @m<k>[gm], in device order. */
  vectors: string[];
}

/**
 * One `.op` netlist for devices at one temperature, each with its own sources, written entirely by us:
 * the models re-emitted from their parsed statements (each once), the same tightened options as the sweeps.
 * Read back ID = −type·i(vd<k>) and gm = @m<k>[gm].
 */
export function buildOperatingPointNetlist(devices: DeviceToCheck[], temperature: number, nonce: string): OperatingPointNetlist {
  const models = [...new Map(devices.map((device) => [device.model.name, device.model])).values()];
  const lines = [`* channelwright check ${nonce}`, ...models.map((model) => emitModel(model)), SWEEP_OPTIONS, `.temp ${spiceNumber(temperature)}`];
  const vectors: string[] = [];
  devices.forEach((device, k) => {
    const sign = device.model.polarity === 'nmos' ? 1 : -1;
    lines.push(
      `vg${k} g${k} 0 ${spiceNumber(sign * device.vgs)}`,
      `vd${k} d${k} 0 ${spiceNumber(sign * device.vds)}`,
      `vb${k} b${k} 0 ${spiceNumber(-sign * device.vsb)}`,
      `m${k} d${k} g${k} 0 b${k} ${device.model.name} w=${spiceNumber(device.w / (device.fingers ?? 1))} l=${spiceNumber(device.l)}${(device.fingers ?? 1) > 1 ? ` m=${device.fingers}` : ''}`,
    );
    vectors.push(`i(vd${k})`, `@m${k}[gm]`);
  });
  lines.push('.op', `.save ${vectors.join(' ')}`, '.end', '');
  return { netlist: lines.join('\n'), nonce, vectors };
}
