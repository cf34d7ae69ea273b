/**
 * Curve files: the CSV of measured (or simulated) drain-current curves an extraction reads, with units in its
 * header. Pure and free of the fitting library, so the client can read a file before it uploads it.
 */
export { type CurveFile, type CurveFileOptions, type CurveFileReading, MIN_POINTS, MIN_CURVE_POINTS, readCurveFile } from './read-curve-file.js';
export { EXAMPLE_HEADER } from './curve-columns.js';
export { writeCurveFile } from './write-curve-file.js';
