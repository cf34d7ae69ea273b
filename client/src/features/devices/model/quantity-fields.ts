import type { Polarity } from '@channelwright/shared/schemas';
import type { Constraint, QuantityField } from './targets';

interface QuantityFieldInfo {
  /** The SI unit the field is read in. */
  unit: string;
  /** The symbol shown, NMOS-like; PMOS voltages are polarity-normalised (VSG, VSD, VBS). */
  symbol: { nmos: string; pmos: string };
  placeholder: string;
  /** Empty means "use the default" rather than "missing". */
  optional?: boolean;
}

const same = (symbol: string) => ({ nmos: symbol, pmos: symbol });

export const QUANTITY_FIELDS: Record<QuantityField, QuantityFieldInfo> = {
  id: { unit: 'A', symbol: same('ID'), placeholder: '20u' },
  l: { unit: 'm', symbol: same('L'), placeholder: '0.5u' },
  vds: { unit: 'V', symbol: { nmos: 'VDS', pmos: 'VSD' }, placeholder: '0.9' },
  vsb: { unit: 'V', symbol: { nmos: 'VSB', pmos: 'VBS' }, placeholder: '0' },
  temperature: { unit: '°C', symbol: same('T'), placeholder: 'tnom', optional: true },
  vov: { unit: 'V', symbol: same('VOV'), placeholder: '200m' },
  gmId: { unit: '1/V', symbol: same('gm/ID'), placeholder: '12' },
  w: { unit: 'm', symbol: same('W'), placeholder: '5u' },
  vgs: { unit: 'V', symbol: { nmos: 'VGS', pmos: 'VSG' }, placeholder: '0.7' },
};

export const symbolOf = (field: QuantityField, polarity: Polarity): string => QUANTITY_FIELDS[field].symbol[polarity];

/** The choices of the second constraint, in the order of the segmented control. */
export const CONSTRAINT_ORDER: readonly Constraint[] = ['vov', 'gmId', 'w', 'vgs'];
