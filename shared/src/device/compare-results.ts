import { COMPARED_FIGURES, type Comparison } from '../schemas/size.js';
import type { Model } from '../schemas/request-fields.js';
import { isEngineError } from './errors.js';

type Figures = Partial<Record<(typeof COMPARED_FIGURES)[number], number | null>>;

/** Each compared figure both results have: this one's value, the other's, and (value − other)/|other|. */
export function differencesOf(result: Figures, other: Figures): Comparison['differences'] {
  const differences: Comparison['differences'] = {};
  for (const figure of COMPARED_FIGURES) {
    const value = result[figure];
    const against = other[figure];
    if (typeof value !== 'number' || typeof against !== 'number' || !Number.isFinite(value) || !Number.isFinite(against)) continue;
    differences[figure] = { value, other: against, relative: against === 0 ? null : (value - against) / Math.abs(against) };
  }
  return differences;
}

/** The same targets sized with another model beside a result: its answer (or why it has none) and the differences. */
export function compareResults<T extends Figures>(result: T, model: Model, sizeOther: () => T): Comparison {
  try {
    const other = sizeOther();
    return { model, result: other as unknown as Comparison['result'], error: null, differences: differencesOf(result, other) };
  } catch (error) {
    if (!isEngineError(error)) throw error;
    return { model, result: null, error: { code: error.code, message: error.message, ...(error.field === undefined ? {} : { field: error.field }) }, differences: {} };
  }
}
