/**
 * The subthreshold slope of an ID–VGS curve in mV/decade: the smallest ΔVGS per decade of ID between
 * neighbouring points, which a MOS curve reaches in weak inversion (where log ID is straight in VGS).
 * Points with ID ≤ 0 are skipped; null when fewer than two points are usable.
 */
export function subthresholdSlope(points: { vgs: number; id: number | null }[]): number | null {
  let best: number | null = null;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1];
    const b = points[i];
    if (a.id === null || b.id === null || !(a.id > 0) || !(b.id > 0)) continue;
    const decades = Math.log10(b.id) - Math.log10(a.id);
    if (!(decades > 0)) continue;
    const slope = ((b.vgs - a.vgs) / decades) * 1000;
    if (best === null || slope < best) best = slope;
  }
  return best;
}
