import type { DeviceTargets } from '../schemas/device-targets.js';
import { cornerNames, type Process } from '../schemas/process.js';
import { deviceParamsOf } from './resolve-device.js';
import { say } from './say.js';

export interface MigrationOptions {
  /** Keep L as drawn (raised to the new lmin if below it). */
  fixedLength: boolean;
  /** Scale VDS, VSB and a VGS constraint by the ratio of the supplies. */
  scaleVoltages: boolean;
  /** Factor on ID (1: the same currents). */
  currentScale: number;
}

export interface MigratedTargets {
  targets: DeviceTargets;
  lengthScale: number;
  voltageScale: number;
  notes: string[];
}

/** Lengths drawn on the new process snap to its width grid (a process profile has no separate length grid). */
function onGrid(value: number, grid: number): number {
  return Number((Math.round(value / grid) * grid).toPrecision(12));
}

/**
 * A device's targets moved to another process: the same ID (× currentScale) and the same second constraint,
 * with L scaled by the ratio of the two processes' lmin for the device's type (unless fixed), a W constraint
 * scaled with it (the same W/L), and VDS, VSB and a VGS constraint scaled by the ratio of the supplies (unless
 * scaleVoltages is off). A flavour or corner the new process lacks is dropped with a note. With an ideal
 * process scaled by κ at constant field and currentScale 1/κ this is Dennard et al.'s scaling (IEEE JSSC
 * SC-9(5), 1974, table I).
 */
export function migrateTargets(targets: DeviceTargets, from: Process, to: Process, options: MigrationOptions): MigratedTargets {
  const notes: string[] = [];
  const old = deviceParamsOf(from, targets.polarity, targets.flavour);
  let flavour = targets.flavour;
  if (flavour !== undefined && !to.flavours?.some((f) => f.name === flavour && f.polarity === targets.polarity)) {
    notes.push(`${to.name} has no ${targets.polarity.toUpperCase()} flavour "${flavour}": sized as its standard ${targets.polarity.toUpperCase()}`);
    flavour = undefined;
  }
  const next = deviceParamsOf(to, targets.polarity, flavour);
  const lengthScale = options.fixedLength ? 1 : next.lmin / old.lmin;
  const voltageScale = options.scaleVoltages ? to.vdd / from.vdd : 1;
  let l = options.fixedLength ? targets.l : onGrid(targets.l * lengthScale, next.wgrid);
  if (l < next.lmin) {
    notes.push(`L = ${say(l, 'm')} is below ${to.name}'s minimum ${say(next.lmin, 'm')}: raised to it`);
    l = next.lmin;
  }
  const { flavour: _flavour, corner, vov, gmId, w, vgs, ...rest } = targets;
  const migrated: DeviceTargets = {
    ...rest,
    ...(flavour === undefined ? {} : { flavour }),
    id: targets.id * options.currentScale,
    l,
    vds: targets.vds * voltageScale,
    vsb: targets.vsb * voltageScale,
    ...(vov === undefined ? {} : { vov }),
    ...(gmId === undefined ? {} : { gmId }),
    ...(w === undefined ? {} : { w: Math.max(next.wmin, onGrid(w * lengthScale, next.wgrid)) }),
    ...(vgs === undefined ? {} : { vgs: vgs * voltageScale }),
  };
  if (corner !== undefined) {
    if (cornerNames(to).includes(corner)) migrated.corner = corner;
    else notes.push(`${to.name} has no corner ${corner}: the new sheet's corner applies`);
  }
  const range = to.tempRange;
  if (targets.temperature !== undefined && range && (targets.temperature < range.min || targets.temperature > range.max)) {
    notes.push(`${targets.temperature} °C is outside ${to.name}'s range ${range.min} … ${range.max} °C`);
  }
  return { targets: migrated, lengthScale: options.fixedLength ? 1 : lengthScale, voltageScale, notes };
}
