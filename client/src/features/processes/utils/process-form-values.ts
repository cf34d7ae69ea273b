import {
  DEVICE_PARAMETERS,
  parameterInfo,
  processSchema,
  type Corner,
  type Flavour,
  type ParameterInfo,
  type Polarity,
  type Process,
  type SpiceModels,
} from '@channelwright/shared/schemas';
import { parseQuantity } from '@channelwright/shared/units';
import { editableQuantity } from './display-quantity';

type DeviceText = Record<string, string>;

export interface CornerFormValues {
  /** The list key of the row (not sent): rows keep their fields when another is removed. */
  id: string;
  name: string;
  nmos: { dvt: string; kpScale: string };
  pmos: { dvt: string; kpScale: string };
}

/**
 * The editor's values: every number as the text the designer typed ("310u", "0.45 V"), at the same
 * paths as the process (nmos.kp, tempRange.min, corners.0.pmos.dvt), so the shared schema's problems
 * land on the right fields. Flavours are kept as they are (they are edited through import).
 */
export interface ProcessFormValues {
  name: string;
  description: string;
  nodeClass: string;
  message: string;
  tnom: string;
  vdd: string;
  tempRange: { min: string; max: string };
  nmos: DeviceText;
  pmos: DeviceText;
  corners: CornerFormValues[];
  flavours: Flavour[];
  /** Carried through an edit unchanged (set in the process file). */
  spiceModels?: SpiceModels;
}

const info = (name: string): ParameterInfo => parameterInfo(name)!;
const POLARITIES: Polarity[] = ['nmos', 'pmos'];

function deviceText(params: Partial<Record<string, number>> | undefined): DeviceText {
  return Object.fromEntries(DEVICE_PARAMETERS.map((p) => [p.name, editableQuantity(params?.[p.name], p)]));
}

function cornerText(corner: Corner): CornerFormValues {
  const shift = (polarity: Polarity) => ({ dvt: editableQuantity(corner[polarity].dvt, info('dvt')), kpScale: editableQuantity(corner[polarity].kpScale, info('kpScale')) });
  return { id: rowId(), name: corner.name, nmos: shift('nmos'), pmos: shift('pmos') };
}

let rows = 0;
const rowId = () => `corner-${++rows}`;

/** A corner row to fill in, nominal until changed. */
export function newCorner(name = ''): CornerFormValues {
  return { id: rowId(), name, nmos: { dvt: '0 mV', kpScale: '1' }, pmos: { dvt: '0 mV', kpScale: '1' } };
}

export function toFormValues(process: Process, nodeClass: string): ProcessFormValues {
  return {
    name: process.name,
    description: process.description ?? '',
    nodeClass,
    message: '',
    tnom: editableQuantity(process.tnom, info('tnom')),
    vdd: editableQuantity(process.vdd, info('vdd')),
    tempRange: { min: editableQuantity(process.tempRange?.min, info('tempRange.min')), max: editableQuantity(process.tempRange?.max, info('tempRange.max')) },
    nmos: deviceText(process.nmos),
    pmos: deviceText(process.pmos),
    corners: process.corners.map(cornerText),
    flavours: process.flavours ?? [],
    ...(process.spiceModels ? { spiceModels: process.spiceModels } : {}),
  };
}

/** A new profile: nominal 27 °C and the TT corner; the parameters are for the designer to fill in. */
export function blankFormValues(): ProcessFormValues {
  return {
    name: '', description: '', nodeClass: '', message: '', tnom: '27 °C', vdd: '', tempRange: { min: '', max: '' },
    nmos: deviceText(undefined), pmos: deviceText(undefined), corners: [newCorner('TT')], flavours: [],
  };
}

export interface FormReading {
  /** The process as typed, numbers parsed; not yet checked against the schema. */
  candidate: Record<string, unknown>;
  /** Fields whose text is not a quantity of the right kind, by path. */
  textErrors: Record<string, string>;
}

/** Parses every number field; an empty optional field is left out. */
export function readFormValues(values: ProcessFormValues): FormReading {
  const textErrors: Record<string, string> = {};
  const number = (path: string, text: string, parameter: ParameterInfo): number | undefined => {
    if (text.trim() === '') return undefined;
    const parsed = parseQuantity(text, parameter.unit);
    if (parsed.ok) return parsed.value;
    textErrors[path] = parsed.reason;
    return undefined;
  };
  const device = (polarity: Polarity) =>
    Object.fromEntries(
      DEVICE_PARAMETERS.map((p) => [p.name, number(`${polarity}.${p.name}`, values[polarity][p.name] ?? '', p)]).filter(([, v]) => v !== undefined),
    );
  const min = number('tempRange.min', values.tempRange.min, info('tempRange.min'));
  const max = number('tempRange.max', values.tempRange.max, info('tempRange.max'));
  const candidate: Record<string, unknown> = {
    name: values.name,
    ...(values.description.trim() !== '' && { description: values.description }),
    tnom: number('tnom', values.tnom, info('tnom')),
    vdd: number('vdd', values.vdd, info('vdd')),
    ...((min !== undefined || max !== undefined) && { tempRange: { min, max } }),
    nmos: device('nmos'),
    pmos: device('pmos'),
    corners: values.corners.map((corner, index) => ({
      name: corner.name,
      ...Object.fromEntries(
        POLARITIES.map((polarity) => [
          polarity,
          {
            dvt: number(`corners.${index}.${polarity}.dvt`, corner[polarity].dvt, info('dvt')),
            kpScale: number(`corners.${index}.${polarity}.kpScale`, corner[polarity].kpScale, info('kpScale')),
          },
        ]),
      ),
    })),
    ...(values.flavours.length > 0 && { flavours: values.flavours }),
    ...(values.spiceModels && { spiceModels: values.spiceModels }),
  };
  return { candidate, textErrors };
}

export type ProcessFormResult = { ok: true; process: Process } | { ok: false; errors: Record<string, string> };

/** The editor's check: the text of each field, then the shared processSchema, every problem on its field. */
export function checkProcessForm(values: ProcessFormValues): ProcessFormResult {
  const { candidate, textErrors } = readFormValues(values);
  const parsed = processSchema.safeParse(candidate);
  if (parsed.success && Object.keys(textErrors).length === 0) return { ok: true, process: parsed.data };
  const errors: Record<string, string> = {};
  for (const issue of parsed.success ? [] : parsed.error.issues) {
    const path = issue.path.map(String).join('.');
    errors[path] ??= issue.message;
  }
  return { ok: false, errors: { ...errors, ...textErrors } };
}
