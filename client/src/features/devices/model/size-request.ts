import { FIELD_LABELS, fieldOfIssue, sizeRequestSchema, type Polarity, type SizeRequestInput } from '@channelwright/shared/schemas';
import { parseQuantity } from '@channelwright/shared/units';
import { QUANTITY_FIELDS, symbolOf } from './quantity-fields';
import type { QuantityField, TargetsValues } from './targets';

/** Which stored process profile (and version) the device is sized in. */
export interface ProcessRef {
  processId: string;
  processVersion: number;
}

/** What an empty corner or temperature stands for: a sheet's defaults (none on the scratch page). */
export interface TargetDefaults {
  corner: string;
  /** °C; null: the process tnom. */
  temperature: number | null;
}

export type FieldErrors = Partial<Record<QuantityField | 'corner' | 'flavour', string>>;

export interface BuiltRequest {
  /** The request to send, when every field reads and the shared schema accepts it. */
  request: SizeRequestInput | null;
  /** Why not, per field; empty required fields are listed under `missing`, not as errors. */
  errors: FieldErrors;
  missing: QuantityField[];
}

/** The request fields the targets form has a place for, so an error naming one is shown beside it. */
export const FORM_FIELDS: ReadonlySet<string> = new Set(['temperature', 'id', 'l', 'vds', 'vsb', 'vov', 'gmId', 'w', 'vgs', 'corner', 'flavour']);

/**
 * Turns the typed targets into a size request: each quantity read with its unit (SI prefixes
 * allowed), then the whole checked with the same schema the server uses, so the designer sees a
 * refusal beside the field before anything is sent.
 */
export function buildSizeRequest(values: TargetsValues, process: ProcessRef, defaults?: TargetDefaults): BuiltRequest {
  const errors: FieldErrors = {};
  const missing: QuantityField[] = [];
  const numbers: Partial<Record<QuantityField, number>> = {};
  const fields: QuantityField[] = ['id', 'l', 'vds', 'vsb', 'temperature', values.constraint];
  for (const field of fields) {
    const text = values[field].trim();
    if (text === '') {
      if (!QUANTITY_FIELDS[field].optional) missing.push(field);
      continue;
    }
    const parsed = parseQuantity(text, QUANTITY_FIELDS[field].unit);
    if (parsed.ok) numbers[field] = parsed.value;
    else errors[field] = parsed.reason;
  }
  if (missing.length > 0 || Object.keys(errors).length > 0) return { request: null, errors, missing };

  const request: SizeRequestInput = {
    processId: process.processId,
    processVersion: process.processVersion,
    polarity: values.polarity,
    ...(values.flavour ? { flavour: values.flavour } : {}),
    model: values.model,
    corner: values.corner || defaults?.corner || 'TT',
    ...temperatureOf(numbers.temperature, defaults),
    id: numbers.id as number,
    l: numbers.l as number,
    vds: numbers.vds as number,
    vsb: numbers.vsb as number,
    [values.constraint]: numbers[values.constraint],
  };
  const checked = sizeRequestSchema.safeParse(request);
  if (checked.success) return { request, errors, missing };
  for (const issue of checked.error.issues) {
    const field = fieldOfIssue(issue);
    if (field && FORM_FIELDS.has(field) && !(field in errors)) errors[field as keyof FieldErrors] = inPolarity(issue.message, field, values.polarity);
  }
  return { request: null, errors, missing };
}

function temperatureOf(typed: number | undefined, defaults: TargetDefaults | undefined): { temperature?: number } {
  if (typed !== undefined) return { temperature: typed };
  if (defaults?.temperature !== undefined && defaults.temperature !== null) return { temperature: defaults.temperature };
  return {};
}

/** The shared schema names a field by its NMOS symbol ("VDS must be above 0 V"); a PMOS form labels it VSD, and so does its message. */
function inPolarity(message: string, field: string, polarity: Polarity): string {
  const label = FIELD_LABELS[field];
  if (!label || !(field in QUANTITY_FIELDS)) return message;
  const symbol = symbolOf(field as QuantityField, polarity);
  return message.startsWith(`${label} `) ? `${symbol}${message.slice(label.length)}` : message;
}
