import { MATRIX_FIGURE_INFO, type DeviceLimit, type MatrixColumn, type MatrixFigure, type Polarity } from '@channelwright/shared/schemas';
import { formatQuantity } from '@channelwright/shared/units';

/** A figure's symbol as the device's polarity names it (VSG for a PMOS). */
export const figureLabel = (figure: MatrixFigure, polarity: Polarity = 'nmos') => (polarity === 'pmos' ? MATRIX_FIGURE_INFO[figure].pmosLabel : MATRIX_FIGURE_INFO[figure].label);

/** A cell's value as text: engineering notation with the figure's unit, a change of ID in per cent with its sign. */
export function figureText(figure: MatrixFigure, value: number | null, digits = 3): string {
  if (value === null) return '—';
  const { unit } = MATRIX_FIGURE_INFO[figure];
  if (unit === '%') return `${value >= 0 ? '+' : ''}${(value * 100).toFixed(1)} %`;
  if (unit === '1/V') return `${formatQuantity(value, '', { digits })} /V`;
  if (unit === 'V/V') return formatQuantity(value, '', { digits });
  return formatQuantity(value, unit, { digits });
}

/** A limit in words: "VDS − VDSsat ≥ 50 mV", "−20 % ≤ ID change ≤ +20 %". */
export function limitText(limit: DeviceLimit, polarity: Polarity = 'nmos'): string {
  const label = figureLabel(limit.figure, polarity);
  const value = (v: number) => figureText(limit.figure, v);
  if (limit.min !== undefined && limit.max !== undefined) return `${value(limit.min)} ≤ ${label} ≤ ${value(limit.max)}`;
  return limit.min !== undefined ? `${label} ≥ ${value(limit.min)}` : `${label} ≤ ${value(limit.max as number)}`;
}

/** A temperature with a true minus sign: "−40 °C". */
export const temperatureText = (celsius: number): string => `${celsius < 0 ? '−' : ''}${Math.abs(celsius)} °C`;

/** Where a column sits: "SS, −40 °C" and, with a supply step, "VDD 1.62 V". */
export function columnText(column: MatrixColumn, withSupply: boolean): string {
  return `${column.corner}, ${temperatureText(column.temperature)}${withSupply ? `, VDD ${formatQuantity(column.vdd, 'V', { digits: 3 })}` : ''}`;
}
