import { createHash } from 'node:crypto';
import { checkTableGrid, defaultTableGrid, deviceParamsOf, isEngineError, type TableGrid, tablePointCount } from '@channelwright/shared/device';
import type { ModelCard } from '@channelwright/shared/model-card';
import { type CharacterisationRequest, cornerNames, type ModelCardMapping, type Polarity, type Process } from '@channelwright/shared/schemas';
import { DomainError } from '../../common/errors/domain-error.js';

/** One device of a characterisation: its card model and the grid it is simulated over. */
export interface PlannedDevice {
  polarity: Polarity;
  /** null for the plain NMOS or PMOS. */
  flavour: string | null;
  model: string;
  grid: TableGrid;
  points: number;
}

/** BSIM3 and BSIM4 levels: the ones whose operating-point output holds VT, VDSsat and the intrinsic capacitances. */
const CHARACTERISED_LEVELS = new Set([8, 49, 14, 54]);
/** How far below VT0 a depletion-mode device's VGS axis starts by default, V (weak inversion down to about four decades below VT). */
const DEPLETION_MARGIN = 0.3;

const gridInvalid = (field: string, message: string) => new DomainError('GRID_INVALID', message, 400, field);

/**
 * The devices and grids of a characterisation request against a version and its card (docs/characterisation.md,
 * "The grid"): the devices asked for (every mapped one by default), the corners the card maps (all by default), the
 * process's temperatures, and per device the default grid of its lmin and VT0 with every field the request gives.
 * 400 DEVICE_NOT_IN_CARD, LEVEL_NOT_CHARACTERISED, GRID_INVALID or GRID_TOO_LARGE naming the field.
 */
export function planCharacterisation(definition: Process, card: ModelCard, mapping: ModelCardMapping, request: CharacterisationRequest, maxPoints: number): PlannedDevice[] {
  const { grid } = request;
  const wanted = request.devices ?? mapping.devices.map((d) => ({ polarity: d.polarity, flavour: d.flavour }));
  if (wanted.length === 0) throw new DomainError('DEVICE_NOT_IN_CARD', 'The model card maps no model to a device: map its models to NMOS, PMOS or a flavour first', 400, 'devices');
  const mapped = cornerNames(definition).filter((corner) => corner in mapping.corners);
  const corners = grid.corners ?? mapped;
  corners.forEach((corner, index) => {
    if (!mapped.includes(corner)) throw gridInvalid(`grid.corners.${index}`, `Corner ${corner} is not mapped to a section of the card (mapped: ${mapped.join(', ') || 'none'})`);
  });
  if (corners.length === 0) throw gridInvalid('grid.corners', 'The card maps no corner of this process to a section');
  const temperatures = grid.temperatures ?? (definition.tempRange ? [definition.tempRange.min, definition.tnom, definition.tempRange.max] : [definition.tnom]);
  const { vdd } = definition;
  const checkVoltages = (values: number[] | undefined, field: 'vds' | 'vsb') =>
    values?.forEach((value, index) => {
      if (value > vdd) throw gridInvalid(`grid.${field}.${index}`, `${field.toUpperCase()} = ${value} V is above VDD = ${vdd} V; the grid stops at VDD`);
    });
  checkVoltages(grid.vds, 'vds');
  checkVoltages(grid.vsb, 'vsb');

  const devices = wanted.map((device, index): PlannedDevice => {
    const entry = mapping.devices.find((d) => d.polarity === device.polarity && d.flavour === device.flavour);
    const label = device.flavour === undefined ? device.polarity.toUpperCase() : `${device.polarity.toUpperCase()} ${device.flavour}`;
    if (!entry) throw new DomainError('DEVICE_NOT_IN_CARD', `The model card maps no model to ${label}`, 400, `devices.${index}`);
    const statements = card.sections.flatMap((section) => section.models.filter((m) => m.name === entry.model));
    const levels = statements.map((m) => m.level);
    if (levels.some((level) => !CHARACTERISED_LEVELS.has(level))) {
      throw new DomainError('LEVEL_NOT_CHARACTERISED', `Model ${entry.model} (${label}) is level ${levels.find((l) => !CHARACTERISED_LEVELS.has(l))}: tables are characterised from BSIM3 (level 8, 49) and BSIM4 (level 14, 54) models; levels 1–3 are the long-channel models the analytic engine covers`, 400, `devices.${index}`);
    }
    const params = deviceParamsOf(definition, device.polarity, device.flavour);
    const step = grid.vgsStep ?? 0.01;
    const vgsFrom = grid.vgsFrom ?? (params.vt0 < 0 ? Math.floor((params.vt0 - DEPLETION_MARGIN) / step) * step : 0);
    const base = defaultTableGrid({ polarity: device.polarity, modelName: entry.model, vdd, lmin: params.lmin, corners, temperatures, referenceWidth: grid.referenceWidth, vgsStep: step, vgsFrom: Number(vgsFrom.toPrecision(12)) });
    const sorted = (values: number[] | undefined, fallback: number[]) => (values ? [...values].sort((a, b) => a - b) : fallback);
    // BSIM3 and BSIM4 narrow the drawn width by 2·wint (per finger) and shorten L by 2·lint: the table scales with the effective width.
    const mean = (parameter: string) => statements.reduce((sum, m) => sum + (m.parameters[parameter] ?? 0), 0) / statements.length;
    const offsets = { widthOffset: Number((2 * mean('wint')).toPrecision(12)), lengthOffset: Number((2 * mean('lint')).toPrecision(12)) };
    const planned: TableGrid = { ...base, lengths: sorted(grid.lengths, base.lengths), vds: sorted(grid.vds, base.vds), vsb: sorted(grid.vsb, base.vsb), ...offsets };
    const short = planned.lengths.findIndex((l) => l < params.lmin * (1 - 1e-9));
    if (short >= 0) throw gridInvalid('grid.lengths', `L = ${planned.lengths[short]} m is below the lmin of ${label} (${params.lmin} m)`);
    try {
      checkTableGrid(planned);
    } catch (error) {
      if (isEngineError(error)) throw gridInvalid(`grid.${error.field ?? ''}`.replace(/\.$/, ''), error.message);
      throw error;
    }
    return { polarity: device.polarity, flavour: device.flavour ?? null, model: entry.model, grid: planned, points: tablePointCount(planned) };
  });

  const total = devices.reduce((sum, device) => sum + device.points, 0);
  if (total > maxPoints) {
    const given = (['lengths', 'vds', 'vsb', 'temperatures', 'corners', 'vgsStep'] as const).filter((field) => grid[field] !== undefined);
    const breakdown = devices.map((d) => `${d.model}: ${d.grid.lengths.length} L × ${d.grid.vgs.count} VGS × ${d.grid.vds.length} VDS × ${d.grid.vsb.length} VSB × ${d.grid.corners.length} corners × ${d.grid.temperatures.length} temperatures`).join('; ');
    throw new DomainError(
      'GRID_TOO_LARGE',
      `The grid holds ${total.toLocaleString('en')} points (${breakdown}), more than the ${maxPoints.toLocaleString('en')} one characterisation may have: give fewer lengths, VDS or VSB values, corners, temperatures or devices, or a coarser VGS step`,
      400,
      given.length > 0 ? `grid.${given[0]}` : 'grid',
    );
  }
  return devices;
}

/** SHA-256 of a plan: the same version and grid are characterised once (the plan is written in one fixed order). */
export function planHash(devices: readonly PlannedDevice[]): string {
  return createHash('sha256').update(JSON.stringify(devices)).digest('hex');
}
