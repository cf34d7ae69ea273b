import { DEVICE_PARAMETERS, parameterInfo, type ParameterInfo, type Polarity } from '@channelwright/shared/schemas';

/**
 * What one CSV row sets, read from its `parameter` and `polarity` cells:
 * - process-level fields, polarity `process`: name, description, nodeClass (text), tnom, vdd, tempRange.min, tempRange.max;
 * - device parameters, polarity `nmos` or `pmos`: vt0, kp, gamma … (DEVICE_PARAMETERS);
 * - corner shifts `corner.<NAME>.dvt` and `corner.<NAME>.kpScale`, polarity `nmos` or `pmos`;
 * - flavours `flavour.<NAME>.<device parameter>` and `flavour.<NAME>.description`, polarity the flavour's.
 * `info` is the number's description (unit, range); a target without one takes text.
 */
export type CsvTarget =
  | { kind: 'process'; field: string; info?: ParameterInfo }
  | { kind: 'device'; polarity: Polarity; info: ParameterInfo }
  | { kind: 'corner'; polarity: Polarity; corner: string; info: ParameterInfo }
  | { kind: 'flavour'; polarity: Polarity; flavour: string; info?: ParameterInfo };

export type TargetReading =
  | { ok: true; target: CsvTarget; parameter: string }
  | { ok: false; field: 'parameter' | 'polarity'; message: string };

export const PROCESS_POLARITY = 'process';
const TEXT_FIELDS = ['name', 'description', 'nodeClass'];
const NUMBER_FIELDS = ['tnom', 'vdd', 'tempRange.min', 'tempRange.max'];
const CORNER_SHIFTS = ['dvt', 'kpScale'];

/** The key two rows setting the same thing share: "kp|nmos", "corner.FF.dvt|pmos". */
export const csvKey = (parameter: string, polarity: string) => `${parameter}|${polarity}`;

/** A row's label in messages: "kp (nmos)", "vdd". */
export const csvLabel = (parameter: string, polarity: string) => (polarity === PROCESS_POLARITY ? parameter : `${parameter} (${polarity})`);

/** Reads what a row sets; `parameter` in the answer is the canonical spelling (names match regardless of case, corner and flavour names exactly). */
export function readTarget(parameter: string, polarity: string): TargetReading {
  if (parameter === '') return { ok: false, field: 'parameter', message: 'parameter is empty' };
  const processField = findName([...TEXT_FIELDS, ...NUMBER_FIELDS], parameter);
  const device = deviceParameter(parameter);
  const [head, name, field, ...extra] = parameter.split('.');
  const group = findName(['corner', 'flavour'], head);
  if (!processField && !device && !group) {
    return { ok: false, field: 'parameter', message: `"${parameter}" is not a parameter Channelwright knows (docs/processes.md lists them)` };
  }
  if (polarity === '') {
    return { ok: false, field: 'polarity', message: `${parameter}: polarity is missing (${processField ? PROCESS_POLARITY : 'nmos or pmos'})` };
  }
  if (processField) {
    if (polarity !== PROCESS_POLARITY) return { ok: false, field: 'polarity', message: `${processField} is a process-level field: its polarity is "process", not "${polarity}"` };
    return { ok: true, parameter: processField, target: { kind: 'process', field: processField, info: NUMBER_FIELDS.includes(processField) ? parameterInfo(processField) : undefined } };
  }
  if (polarity !== 'nmos' && polarity !== 'pmos') return { ok: false, field: 'polarity', message: `${parameter}: polarity must be nmos or pmos, not "${polarity}"` };
  if (device) return { ok: true, parameter: device.name, target: { kind: 'device', polarity, info: device } };
  if (!name || !field || extra.length > 0) {
    const shape = group === 'corner' ? 'corner.<NAME>.dvt or corner.<NAME>.kpScale' : 'flavour.<NAME>.<parameter>';
    return { ok: false, field: 'parameter', message: `"${parameter}" must be written ${shape}` };
  }
  if (group === 'corner') {
    const shift = findName(CORNER_SHIFTS, field);
    if (!shift) return { ok: false, field: 'parameter', message: `"${parameter}": a corner sets dvt or kpScale, not "${field}"` };
    return { ok: true, parameter: `corner.${name}.${shift}`, target: { kind: 'corner', polarity, corner: name, info: parameterInfo(shift)! } };
  }
  if (field.toLowerCase() === 'description') return { ok: true, parameter: `flavour.${name}.description`, target: { kind: 'flavour', polarity, flavour: name } };
  const flavourParameter = deviceParameter(field);
  if (!flavourParameter) return { ok: false, field: 'parameter', message: `"${parameter}": "${field}" is not a device parameter` };
  return { ok: true, parameter: `flavour.${name}.${flavourParameter.name}`, target: { kind: 'flavour', polarity, flavour: name, info: flavourParameter } };
}

function findName(names: readonly string[], text: string): string | undefined {
  return names.find((name) => name.toLowerCase() === text.toLowerCase());
}

function deviceParameter(name: string): ParameterInfo | undefined {
  return DEVICE_PARAMETERS.find((info) => info.name.toLowerCase() === name.toLowerCase());
}
