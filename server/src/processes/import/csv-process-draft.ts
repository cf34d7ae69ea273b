import type { Polarity } from '@channelwright/shared/schemas';
import { csvLabel, PROCESS_POLARITY, type CsvTarget } from './csv-targets.js';

/** Where a value of the draft came from: its row and the label messages use. */
export interface CsvSource {
  row: number;
  label: string;
}

/** The CSV row a value of the process would be written on: parameter, polarity and unit cells. */
export interface CsvCell {
  parameter: string;
  polarity: string;
}

type Values = Record<string, number>;

interface FlavourDraft {
  polarity: Polarity;
  row: number;
  description?: string;
  params: Values;
}

/**
 * The values of the CSV rows gathered into the shape of a process, remembering for every value the
 * row it came from (by dotted path with corner and flavour names: "corners.FF.nmos.dvt",
 * "flavours.native.params.vt0"), so a schema problem can name its row. A flavour starts from its
 * polarity's parameters and its rows override them.
 */
export class CsvProcessDraft {
  private readonly process: Record<string, unknown> = {};
  private readonly tempRange: Values = {};
  private readonly devices: Record<Polarity, Values> = { nmos: {}, pmos: {} };
  private readonly corners = new Map<string, Record<Polarity, Values>>();
  private readonly flavours = new Map<string, FlavourDraft>();
  private readonly sources = new Map<string, CsvSource>();
  nodeClass?: string;

  /** Records a value; answers a sentence when the row contradicts an earlier one (a flavour of two polarities). */
  set(target: CsvTarget, value: number | string, row: number, parameter: string): string | undefined {
    const label = csvLabel(parameter, target.kind === 'process' ? PROCESS_POLARITY : target.polarity);
    const source = { row, label };
    switch (target.kind) {
      case 'process':
        if (target.field === 'nodeClass') this.nodeClass = String(value);
        else if (target.field.startsWith('tempRange.')) this.tempRange[target.field.slice('tempRange.'.length)] = Number(value);
        else if (target.field !== 'description' || value !== '') this.process[target.field] = value;
        this.sources.set(target.field, source);
        return undefined;
      case 'device':
        this.devices[target.polarity][target.info.name] = Number(value);
        this.sources.set(`${target.polarity}.${target.info.name}`, source);
        return undefined;
      case 'corner': {
        const corner = this.corners.get(target.corner) ?? { nmos: {}, pmos: {} };
        this.corners.set(target.corner, corner);
        corner[target.polarity][target.info.name] = Number(value);
        if (!this.sources.has(`corners.${target.corner}`)) this.sources.set(`corners.${target.corner}`, source);
        this.sources.set(`corners.${target.corner}.${target.polarity}.${target.info.name}`, source);
        return undefined;
      }
      case 'flavour': {
        const flavour = this.flavours.get(target.flavour) ?? { polarity: target.polarity, row, params: {} };
        if (flavour.polarity !== target.polarity) {
          return `${label}: flavour ${target.flavour} is ${flavour.polarity} (row ${flavour.row}); a flavour has one polarity`;
        }
        this.flavours.set(target.flavour, flavour);
        if (!this.sources.has(`flavours.${target.flavour}`)) this.sources.set(`flavours.${target.flavour}`, source);
        if (target.info) {
          flavour.params[target.info.name] = Number(value);
          this.sources.set(`flavours.${target.flavour}.params.${target.info.name}`, source);
        } else {
          if (value !== '') flavour.description = String(value);
          this.sources.set(`flavours.${target.flavour}.description`, source);
        }
        return undefined;
      }
    }
  }

  /** The process as gathered, not yet validated. */
  build(): Record<string, unknown> {
    const flavours = [...this.flavours].map(([name, flavour]) => ({
      name,
      polarity: flavour.polarity,
      ...(flavour.description !== undefined && { description: flavour.description }),
      params: { ...this.devices[flavour.polarity], ...flavour.params },
    }));
    return {
      ...this.process,
      ...(Object.keys(this.tempRange).length > 0 && { tempRange: { ...this.tempRange } }),
      nmos: { ...this.devices.nmos },
      pmos: { ...this.devices.pmos },
      corners: [...this.corners].map(([name, shifts]) => ({ name, nmos: { ...shifts.nmos }, pmos: { ...shifts.pmos } })),
      ...(flavours.length > 0 && { flavours }),
    };
  }

  /** The row a dotted path came from; an inherited flavour parameter answers with its polarity's row. */
  sourceOf(path: string): CsvSource | undefined {
    const inherited = /^flavours\.(.+)\.params\.([^.]+)$/.exec(path);
    if (!this.sources.has(path) && inherited) {
      const flavour = this.flavours.get(inherited[1]);
      if (flavour) return this.sources.get(`${flavour.polarity}.${inherited[2]}`);
    }
    return this.sources.get(path);
  }

  /** The row that would set a dotted path, for "add a row …" advice. */
  cellOf(path: string): CsvCell | undefined {
    const parts = path.split('.');
    if (parts.length === 1 || parts[0] === 'tempRange') return { parameter: path, polarity: PROCESS_POLARITY };
    if ((parts[0] === 'nmos' || parts[0] === 'pmos') && parts.length === 2) return { parameter: parts[1], polarity: parts[0] };
    if (parts[0] === 'corners' && parts.length === 4) return { parameter: `corner.${parts[1]}.${parts[3]}`, polarity: parts[2] };
    const flavour = this.flavours.get(parts[1]);
    if (parts[0] === 'flavours' && parts[2] === 'params' && flavour) return { parameter: `flavour.${parts[1]}.${parts[3]}`, polarity: flavour.polarity };
    return undefined;
  }
}
