import {
  deviceTargetsSchema,
  fieldOfIssue,
  MATRIX_FIGURE_INFO,
  type DeviceLimit,
  type MatrixFigure,
  type Device,
  type DeviceTargetsInput,
  type Sheet,
  type SizeRequestInput,
  type UpdateDeviceRequestInput,
} from '@channelwright/shared/schemas';
import { formatQuantity, parseQuantity } from '@channelwright/shared/units';
import { QUANTITY_FIELDS } from './quantity-fields';
import type { FieldErrors } from './size-request';
import { DEFAULT_TARGETS, type QuantityField, type TargetsValues } from './targets';

/** One limit of the corner matrix as typed: a figure and a minimum and/or maximum in its unit ("50m", "-20 %"). */
export interface LimitRow {
  figure: MatrixFigure;
  min: string;
  max: string;
}

/** What a stored device has besides its sizing targets. */
export interface DeviceDetails {
  name: string;
  function: string;
  matchGroup: string;
  multiplier: string;
  supplyBranch: boolean;
  notes: string;
  limits: LimitRow[];
}

export type DetailErrors = Partial<Record<keyof DeviceDetails | `limits.${number}`, string>>;

/** The unit a limit of a figure is typed in: % for a change of ID, plain for gm/gds. */
const limitUnit = (figure: MatrixFigure) => ({ '%': '', 'V/V': '' } as Record<string, string>)[MATRIX_FIGURE_INFO[figure].unit] ?? MATRIX_FIGURE_INFO[figure].unit;

function limitValueText(figure: MatrixFigure, value: number | undefined): string {
  if (value === undefined) return '';
  if (MATRIX_FIGURE_INFO[figure].unit === '%') return `${Number((value * 100).toPrecision(6))} %`;
  return formatQuantity(value, limitUnit(figure), { digits: 6 });
}

export const limitRowsOf = (limits: readonly DeviceLimit[] | undefined): LimitRow[] =>
  (limits ?? []).map((l) => ({ figure: l.figure, min: limitValueText(l.figure, l.min), max: limitValueText(l.figure, l.max) }));

/** The limits typed, read in SI (a change of ID as a fraction), or the reason a row does not read. */
export function readLimits(rows: readonly LimitRow[]): { limits: DeviceLimit[]; errors: DetailErrors } {
  const errors: DetailErrors = {};
  const limits: DeviceLimit[] = [];
  rows.forEach((row, index) => {
    const read = (text: string) => {
      if (text.trim() === '') return undefined;
      const parsed = parseQuantity(text, limitUnit(row.figure));
      if (!parsed.ok) errors[`limits.${index}`] = parsed.reason;
      return parsed.ok ? parsed.value : undefined;
    };
    const [min, max] = [read(row.min), read(row.max)];
    if (min === undefined && max === undefined && !errors[`limits.${index}`]) errors[`limits.${index}`] = 'Give a minimum, a maximum or both';
    limits.push({ figure: row.figure, ...(min === undefined ? {} : { min }), ...(max === undefined ? {} : { max }) });
  });
  return { limits, errors };
}

/** A stored number as the designer would type it: "20 µA", "500 nm"; gm/ID and °C as plain numbers. */
export function fieldText(value: number | undefined, field: QuantityField): string {
  if (value === undefined) return '';
  const unit = QUANTITY_FIELDS[field].unit;
  if (unit === '1/V' || unit === '°C') return String(Number(value.toPrecision(6)));
  return formatQuantity(value, unit, { digits: 6 });
}

/** The form of a stored device. Corner and temperature left to the sheet are empty ('' = the sheet's). */
export function valuesOfDevice(device: Device, sheet: Sheet): { targets: TargetsValues; details: DeviceDetails } {
  const t = device.targets;
  return {
    targets: {
      polarity: t.polarity,
      flavour: t.flavour ?? '',
      model: t.model ?? sheet.model,
      corner: t.corner ?? '',
      temperature: fieldText(t.temperature, 'temperature'),
      id: fieldText(t.id, 'id'),
      l: fieldText(t.l, 'l'),
      vds: fieldText(t.vds, 'vds'),
      vsb: fieldText(t.vsb, 'vsb'),
      constraint: device.constraint,
      vov: fieldText(t.vov, 'vov'),
      gmId: fieldText(t.gmId, 'gmId'),
      w: fieldText(t.w, 'w'),
      vgs: fieldText(t.vgs, 'vgs'),
    },
    details: {
      name: t.name,
      function: t.function,
      matchGroup: t.matchGroup ?? '',
      multiplier: String(t.multiplier),
      supplyBranch: t.supplyBranch,
      notes: t.notes,
      limits: limitRowsOf(t.limits),
    },
  };
}

/** A new device of the sheet: its next free name, the sheet's defaults, VDS at half the supply. */
export function valuesOfNewDevice(sheet: Sheet, name: string): { targets: TargetsValues; details: DeviceDetails } {
  return {
    targets: { ...DEFAULT_TARGETS, model: sheet.model, corner: '', temperature: '', vds: fieldText(sheet.process.vdd / 2, 'vds') },
    details: { name, function: '', matchGroup: '', multiplier: '1', supplyBranch: false, notes: '', limits: [] },
  };
}

export type BuiltTargets = { ok: true; targets: DeviceTargetsInput } | { ok: false; errors: FieldErrors & DetailErrors };

/**
 * The targets to store, from the request the form already built (its numbers read and checked)
 * and the details; checked with the shared device schema so a refusal lands beside its field.
 */
export function buildDeviceTargets(request: SizeRequestInput, values: TargetsValues, details: DeviceDetails): BuiltTargets {
  const multiplier = Number(details.multiplier);
  const limits = readLimits(details.limits);
  if (Object.keys(limits.errors).length > 0) return { ok: false, errors: limits.errors };
  const targets: DeviceTargetsInput = {
    name: details.name,
    function: details.function,
    polarity: values.polarity,
    ...(values.flavour ? { flavour: values.flavour } : {}),
    id: request.id,
    l: request.l,
    vds: request.vds,
    vsb: request.vsb,
    ...(values.temperature.trim() ? { temperature: request.temperature } : {}),
    ...(values.corner ? { corner: values.corner } : {}),
    model: values.model,
    [values.constraint]: request[values.constraint],
    ...(details.matchGroup.trim() ? { matchGroup: details.matchGroup } : {}),
    multiplier: details.multiplier.trim() === '' ? Number.NaN : multiplier,
    supplyBranch: details.supplyBranch,
    notes: details.notes,
    ...(limits.limits.length > 0 ? { limits: limits.limits } : {}),
  };
  const checked = deviceTargetsSchema.safeParse(targets);
  if (checked.success) return { ok: true, targets };
  const errors: Record<string, string> = {};
  for (const issue of checked.error.issues) {
    const field = fieldOfIssue(issue);
    if (field && !(field in errors)) errors[field] = issue.message;
  }
  return { ok: false, errors };
}

/**
 * The edit to send: only what the designer changed (untouched numbers are not re-read from their
 * rounded text), cleared corner, temperature and flavour as null (back to the sheet's), and the
 * constraint whenever it or its value changed.
 */
export function deviceChanges(
  targets: DeviceTargetsInput,
  dirty: (field: keyof TargetsValues | `details.${keyof DeviceDetails}`) => boolean,
  version: number,
): UpdateDeviceRequestInput {
  const changes: Record<string, unknown> = { version };
  const constraint = (['vov', 'gmId', 'w', 'vgs'] as const).find((c) => targets[c] !== undefined);
  for (const field of ['polarity', 'id', 'l', 'vds', 'vsb', 'model'] as const) if (dirty(field)) changes[field] = targets[field];
  if (dirty('flavour')) changes.flavour = targets.flavour ?? null;
  if (dirty('corner')) changes.corner = targets.corner ?? null;
  if (dirty('temperature')) changes.temperature = targets.temperature ?? null;
  if (constraint && (dirty('constraint') || dirty(constraint))) changes[constraint] = targets[constraint];
  for (const field of ['name', 'function', 'multiplier', 'supplyBranch', 'notes'] as const) if (dirty(`details.${field}`)) changes[field] = targets[field];
  if (dirty('details.matchGroup')) changes.matchGroup = targets.matchGroup ?? null;
  if (dirty('details.limits')) changes.limits = targets.limits ?? null;
  return changes as UpdateDeviceRequestInput;
}
