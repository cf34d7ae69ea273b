/**
 * Measured (or simulated) drain-current points, polarity-normalised as everywhere in the engine: for a PMOS
 * vgs means VSG, vds VSD, vsb VBS and id the source-to-drain current, all positive for a conducting device.
 */
export interface MeasuredPoint {
  /** V */
  readonly vgs: number;
  /** V, > 0 */
  readonly vds: number;
  /** V */
  readonly vsb: number;
  /** °C */
  readonly temperature: number;
  /** A, > 0 */
  readonly id: number;
  /** Drawn width (all fingers) and length, m. */
  readonly w: number;
  readonly l: number;
  readonly fingers?: number;
}

/** The points of one sweep of VGS at fixed VDS, VSB, temperature and geometry, by rising VGS. */
export interface MeasuredCurve {
  readonly w: number;
  readonly l: number;
  readonly fingers: number;
  readonly vds: number;
  readonly vsb: number;
  readonly temperature: number;
  /** Indices into the points of the extraction, by rising VGS. */
  readonly indices: number[];
}

/** Points of one curve share these to within a part in a million. */
const same = (a: number, b: number) => Math.abs(a - b) <= 1e-6 * Math.max(Math.abs(a), Math.abs(b), 1e-9);

/** Groups points into VGS sweeps: the same W, L, fingers, VDS, VSB and temperature. */
export function curvesOf(points: readonly MeasuredPoint[], include: (index: number) => boolean = () => true): MeasuredCurve[] {
  const curves: (MeasuredCurve & { indices: number[] })[] = [];
  points.forEach((point, index) => {
    if (!include(index)) return;
    const fingers = point.fingers ?? 1;
    const found = curves.find(
      (c) => same(c.w, point.w) && same(c.l, point.l) && c.fingers === fingers && same(c.vds, point.vds) && same(c.vsb, point.vsb) && Math.abs(c.temperature - point.temperature) < 1e-6,
    );
    if (found) found.indices.push(index);
    else curves.push({ w: point.w, l: point.l, fingers, vds: point.vds, vsb: point.vsb, temperature: point.temperature, indices: [index] });
  });
  for (const curve of curves) curve.indices.sort((a, b) => points[a].vgs - points[b].vgs);
  return curves;
}
