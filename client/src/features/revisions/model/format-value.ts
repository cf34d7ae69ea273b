import { formatQuantity } from '@channelwright/shared/units';

/** Units of the values a revision diff names, by the last part of their path (SI, as the API sends them). */
const UNITS: Record<string, string> = {
  w: 'm', l: 'm', fingerWidth: 'm', maxFingerWidth: 'm', id: 'A', vds: 'V', vsb: 'V', vgs: 'V', vov: 'V', vt: 'V', vdsat: 'V',
  gm: 'S', gds: 'S', ro: 'Ω', gmId: '1/V', cgs: 'F', cgd: 'F', cgb: 'F', cdb: 'F', csb: 'F', ft: 'Hz', ioff: 'A', temperature: '°C',
};

/** A changed value in words: numbers in engineering notation with their unit, absent as "—", the rest as text. */
export function formatValue(path: string, value: unknown): string {
  if (value === null || value === undefined) return '—';
  if (typeof value === 'number') {
    const key = path.split('.').at(-1) ?? '';
    return key === 'temperature' ? `${value} °C` : formatQuantity(value, UNITS[key] ?? '', { digits: 4 });
  }
  if (typeof value === 'string' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) return value.length === 0 ? 'none' : value.map((item) => (typeof item === 'object' && item && 'code' in item ? String(item.code) : JSON.stringify(item))).join(', ');
  return JSON.stringify(value);
}
