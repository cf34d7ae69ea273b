/**
 * The device engine: pure functions of plain SI numbers (A, V, m, F, S, K inside, °C at the edges),
 * polarity-normalised voltages (PMOS: VSG, VSD, VBS, vt = −VTP). Equations and sources: docs/model.md.
 */
export { ENGINE_VERSION } from './engine-version.js';
export { modelAccuracyOf } from './model-accuracy.js';
export { EngineError, isEngineError } from './errors.js';

// The three calls of the compute API (parse, check against the process, compute).
export { computeSize, computeSweep, computeCorners } from './compute.js';
export { checkRequestAgainstProcess } from './check-request.js';
export { parseOrThrow } from './parse-request.js';

// Devices of a process at a corner and temperature.
export { type PreparedDevice, prepareDevice, deviceParamsOf, cornerShiftOf, thresholdAt } from './resolve-device.js';
export { type Bias, type OperatingPoint, operatingPoint } from './operating-point.js';
export { channelCurrentAt } from './channel-current.js';
export { normalisedCharge } from './inversion-charge.js';

// Sizing, sweeps, corners.
export { type SizeTarget, type Sizing, type Constraint, solveSize, MAX_WIDTH } from './solve.js';
export { type SnappedWidth, snapWidth, DEFAULT_MAX_FINGER_WIDTH } from './snap-width.js';
export { overdriveForCurrent, overdriveForGmId, gmIdLimit, MAX_OVERDRIVE } from './overdrive.js';
export { type SweepColumns, type SweepSeriesColumns, sweep } from './sweep.js';
export { sweepValues } from './sweep-values.js';
export { type CornerPoint, type CornerAnalysis, cornerAnalysis, cornersOf, temperaturesOf } from './corners.js';

// The equations, one concept each.
export { thermalVoltage } from './thermal-voltage.js';
export { type ThresholdParams, thresholdVoltage, bodyEffect, bodyEffectSlope } from './threshold.js';
export { slopeFactor } from './slope-factor.js';
export { kpAtTemperature } from './mobility.js';
export { lambdaAtLength } from './channel-length-modulation.js';
export {
  type CurrentModel,
  type KernelColumns,
  allRegionColumns,
  squareLawColumns,
  drainCurrent,
  drainCurrentInto,
  allRegionCurrentInto,
  squareLawCurrentInto,
  ID,
  GM,
  GDS,
  GM_ID,
  VDSAT,
  KERNEL_OUTPUTS,
} from './drain-current.js';
export {
  type Region,
  type SmallSignal,
  smallSignal,
  saturationVoltage,
  gmbRatioOf,
  inversionCoefficient,
  regionOf,
  WEAK_INVERSION_IC,
  STRONG_INVERSION_IC,
} from './small-signal.js';
export {
  type GateCapacitances,
  type ChargeBias,
  type JunctionBias,
  oxideCapacitance,
  gateCapacitances,
  junctionCapacitance,
  transitFrequency,
  DEFAULT_JUNCTION,
} from './capacitance.js';
export { type Channel, channelOf, kpAtLength } from './channel.js';
export {
  type ChannelTerms,
  LONG_CHANNEL,
  DEFAULT_DIBL_EXPONENT,
  channelTermsAt,
  effectiveLength,
  effectiveWidth,
  mobilityExponentAt,
} from './short-channel.js';
export {
  type MismatchDevice,
  type PairMismatch,
  type MatchGroupMismatch,
  pairMismatch,
  mismatchBetween,
  matchGroupMismatch,
  pelgromPairSigma,
} from './mismatch.js';
export { type Leakage, type LeakageEstimate, leakage, junctionLeakageFactor, gateInducedDrainLeakage, DEFAULT_GIDL } from './leakage.js';
export { type ZtcDevice, type ZeroTemperatureCoefficient, zeroTemperatureCoefficientVgs } from './zero-temperature-coefficient.js';
export { type ScalableDevice, scaleConstantField, dennardRatios } from './scaling.js';
export {
  type DeriveInputs,
  type DerivedParameters,
  deriveProcessParameters,
  intrinsicCarrierDensity,
  siliconBandgap,
  INTRINSIC_CARRIER_DENSITY_300K,
} from './derive-process.js';
export { operatingPointWarnings, WARNING_THRESHOLDS } from './warnings.js';
export { sizePlausibilityWarnings, SIZE_PLAUSIBILITY } from './size-plausibility.js';
export { voltageNames } from './say.js';

// Analyses of a whole sheet, through the public calls above (so they follow whatever model a device uses).
export { type SizedDevice, type CornersCall, cornersRequestOf } from './sized-device.js';
export { type MatrixDevice, type MatrixRowCells, matrixColumns, cornerMatrixRow, cornerMatrixRows, worstCells } from './corner-matrix.js';
export { limitMargin, limitStatus, TIGHT_FRACTION } from './limit-status.js';
export { extremeCorner } from './extreme-corner.js';
export { type LeakageDevice, sheetLeakage, leakageTemperatures } from './leakage-budget.js';
export { offsetArea } from './offset-area.js';
export { type ResizeMember, type MemberSize, type MemberSizer, type OffsetFigures, type GroupResizePlan, resizeMatchGroup } from './match-group-resize.js';
export { type MigrationOptions, type MigratedTargets, migrateTargets } from './migrate-targets.js';

// Invented demo data for the seed and the docs.
export { BF180G, BF130G, DEMO_PROCESSES, DEMO_DATA_NOTICE } from './demo-processes.js';

// The table model: sizing from tables characterised with a simulator on the designer's model card.
export {
  TABLE_FIELDS,
  TABLE_ERROR_CODES,
  TABLE_WARNING_CODES,
  type TableWarning,
  type TableField,
  type VgsAxis,
  type TableGrid,
  type LookupTable,
  tablePointCount,
  lineOffset,
  vgsOfNode,
  widthScale,
  widthForScale,
  checkTableGrid,
  checkLookupTable,
} from './lookup-table.js';
export { encodeTable, encodeTableInSteps, decodeTable } from './table-codec.js';
export { type DefaultGridInputs, defaultTableGrid } from './default-table-grid.js';
export { MonotoneCubic, monotoneCubicAt } from './monotone-cubic.js';
export { type PreparedTable, type TableConditions, TableLine, prepareTable, prepareTableInSteps, tableLine } from './table-lookup.js';
export { type TableOperatingPoint, operatingPointOnLine, tableOperatingPoint } from './table-operating-point.js';
export { type TableSizeTarget, type TableSizing, sizeFromTable, vgsForGmId, vgsForOverdrive, vgsForCurrentDensity } from './table-sizing.js';

// The table model in the compute API: dispatch by model, the full operating point of a table result, design charts.
export { type TableChoice, type TableSource, tableOf } from './table-source.js';
export { type TableFigures, TABLE_ANALYTIC_FIGURES, tableFigures, tableZtcVgs, gmIdPeakOf } from './table-figures.js';
export { type TableSizeResponse, sizeWithTable } from './table-size.js';
export { sweepWithTable } from './table-sweep.js';
export { cornersWithTable } from './table-corners.js';
export { type DesignChartConditions, type DesignChartData, designChart } from './design-chart.js';
export { compareResults, differencesOf } from './compare-results.js';
