import { MODELS, type Model, type Polarity } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';
import type { TargetsValues } from './targets';

/** What another page may hand the scratch device page (/workbench) to start from: SI numbers, as the API gives them. */
export interface WorkbenchPrefill {
  processId: string;
  version?: number;
  polarity?: Polarity;
  /** null or '' for the standard device of the polarity. */
  flavour?: string | null;
  model?: Model;
  corner?: string;
  /** °C */
  temperature?: number;
  /** m */
  l?: number;
  /** 1/V; chooses the gm/ID constraint. */
  gmId?: number;
  /** V, polarity-normalised */
  vds?: number;
  vsb?: number;
}

/** The link that opens /workbench with these values filled in (read back by `prefillFromSearch`). */
export function workbenchHref(prefill: WorkbenchPrefill): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(prefill)) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  return `/workbench?${params.toString()}`;
}

export interface WorkbenchStart {
  processId?: string;
  version?: number;
  values: Partial<TargetsValues>;
}

const finite = (text: string | null): number | undefined => {
  if (text === null || text.trim() === '') return undefined;
  const value = Number(text);
  return Number.isFinite(value) ? value : undefined;
};

/**
 * The form's starting values from the page's search parameters. A parameter that does not read (a hand-edited
 * link) is left out, so the form starts from its default there and the designer sees an ordinary empty field.
 */
export function prefillFromSearch(params: URLSearchParams): WorkbenchStart {
  const values: Partial<TargetsValues> = {};
  const polarity = params.get('polarity');
  if (polarity === 'nmos' || polarity === 'pmos') values.polarity = polarity;
  const flavour = params.get('flavour');
  if (flavour) values.flavour = flavour;
  const model = params.get('model');
  if ((MODELS as readonly string[]).includes(model ?? '')) values.model = model as Model;
  const corner = params.get('corner');
  if (corner) values.corner = corner;
  // Full precision for L, so a characterised length stays on the table's grid.
  const quantities: [keyof TargetsValues & ('temperature' | 'l' | 'vds' | 'vsb' | 'gmId'), string, number][] = [
    ['temperature', '', 4],
    ['l', 'm', 15],
    ['vds', 'V', 6],
    ['vsb', 'V', 6],
    ['gmId', '', 4],
  ];
  for (const [field, unit, digits] of quantities) {
    const value = finite(params.get(field));
    if (value !== undefined) values[field] = formatQuantity(value, unit, { digits });
  }
  if (values.gmId !== undefined) values.constraint = 'gmId';
  const version = finite(params.get('version'));
  return {
    processId: params.get('processId') ?? undefined,
    version: version !== undefined && Number.isInteger(version) && version > 0 ? version : undefined,
    values,
  };
}
