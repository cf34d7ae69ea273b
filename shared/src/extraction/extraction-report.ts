import type { ExtractionCurves, ExtractionResultResponse } from '../schemas/extraction.js';
import type { ExtractionResult } from './extract-parameters.js';
import { type MeasuredPoint, conditionsOf, curvesOf } from './measured-curves.js';

/** A number of the fit as JSON carries it: null where the model refused the point or it was left out. */
const finite = (value: number) => (Number.isFinite(value) ? value : null);

/**
 * A fit as the API answers it: the summary (parameters, errors, excluded points with their rows in the file) and the
 * curves with the model and the residual at every point, for the charts of data against fit.
 */
export function extractionReport(points: readonly MeasuredPoint[], rows: readonly number[] | null, result: ExtractionResult, seconds: number): { result: ExtractionResultResponse; curves: ExtractionCurves } {
  const excludedAt = new Map(result.excluded.map((e) => [e.index, e.reason]));
  const summary: ExtractionResultResponse = {
    model: result.model,
    parameters: result.parameters.map((p) => ({ ...p })),
    held: result.held.map((h) => ({ name: h.name, value: h.value ?? null, reason: h.reason })),
    fitted: result.fitted,
    rms: result.rms.map((r) => ({ ...r })),
    densityRms: result.densityRms,
    excluded: result.excluded.map((e) => ({ index: e.index, row: rows ? rows[e.index] : null, reason: e.reason })),
    iterations: result.iterations,
    converged: result.converged,
    seconds,
  };
  const curves = curvesOf(points).map((curve) => ({
    ...conditionsOf(curve),
    points: curve.indices.map((i) => ({
      vgs: points[i].vgs,
      id: points[i].id,
      modelled: finite(result.modelled[i]),
      residual: finite(result.residuals[i]),
      row: rows ? rows[i] : null,
      excluded: excludedAt.get(i) ?? null,
    })),
  }));
  return { result: summary, curves: { curves } };
}
