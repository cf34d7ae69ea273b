/**
 * Parameter extraction: a profile's parameters fitted to measured or simulated drain-current curves.
 * Pure; docs/extraction.md gives the methods and their sources. A separate entry point, so the client's
 * bundle does not carry the fitting library unless it fits.
 */
export { type MeasuredPoint, type MeasuredCurve, conditionsOf, curvesOf } from './measured-curves.js';
export { type CurveEstimates, curveEstimates, LINEAR_REGION_VDS } from './threshold-estimates.js';
export { bodyEffectFit } from './initial-estimates.js';
export { type TableSelection, pointsOfTable } from './table-points.js';
export { FIT_PARAMETERS, FIT_PARAMETER_INFO, type FitParameter, type FitParameterInfo } from './fit-parameters.js';
export {
  type ExtractionInput,
  type ExtractionResult,
  type ExtractionProgress,
  type FittedParameter,
  type ExcludedPoint,
  type RegionError,
  FIT_STAGES,
  extractParameters,
  slopeFactorOfSwing,
} from './extract-parameters.js';
export { extractionReport } from './extraction-report.js';
