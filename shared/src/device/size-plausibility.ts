import type { Warning } from '../schemas/warning.js';
import { say } from './say.js';

/**
 * Sizes no analog circuit asks of one device, documented in docs/model.md (common practice, no source): a gate
 * area above 10,000 µm² (0.01 mm²), more than 1,000 fingers, or a drain current above 1 mA per µm of width
 * (a 180 nm-class NMOS carries about 0.6 mA/µm fully on). Each is more likely a unit slip (1 A for 1 mA)
 * than a design.
 */
export const SIZE_PLAUSIBILITY = {
  /** m² */
  maxArea: 1e-8,
  maxFingers: 1000,
  /** A/m (1 mA/µm) */
  maxCurrentDensity: 1000,
} as const;

/** Cautions for a sized device whose area, finger count or current density is beyond SIZE_PLAUSIBILITY. */
export function sizePlausibilityWarnings(size: { w: number; l: number; fingers: number; id: number }): Warning[] {
  const warnings: Warning[] = [];
  const area = size.w * size.l;
  if (area > SIZE_PLAUSIBILITY.maxArea) {
    warnings.push({ code: 'AREA_IMPLAUSIBLE', message: `The gate area W·L = ${say(area * 1e12, 'µm²')} is above 10,000 µm² (W = ${say(size.w, 'm')}): check ID and its unit; a device this large is rarely meant.` });
  }
  if (size.fingers > SIZE_PLAUSIBILITY.maxFingers) {
    warnings.push({ code: 'FINGERS_IMPLAUSIBLE', message: `${size.fingers.toLocaleString('en')} fingers is more than 1,000: check ID and its unit, or allow wider fingers.` });
  }
  const density = size.id / size.w;
  if (density > SIZE_PLAUSIBILITY.maxCurrentDensity) {
    warnings.push({ code: 'CURRENT_DENSITY_IMPLAUSIBLE', message: `ID/W = ${say(density * 1e-6, 'A')}/µm is above 1 mA/µm, more than silicon of this class carries: the model is far outside its range here.` });
  }
  return warnings;
}
