import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { Matrix, pseudoInverse } from 'ml-matrix';

/** A least-squares problem in normalised parameters: residual k of a parameter vector (model − data). */
export interface LeastSquares {
  readonly count: number;
  /** Residuals of every point for a parameter vector (normalised), computed at once. */
  residuals(values: readonly number[]): Float64Array;
  readonly minValues: readonly number[];
  readonly maxValues: readonly number[];
}

export interface RoundsResult {
  readonly values: number[];
  /** Sum of squared residuals at the values. */
  readonly error: number;
  readonly iterations: number;
  readonly converged: boolean;
}

const ITERATIONS_PER_ROUND = 10;
/** A round that improves the error by less than this fraction ends the fit. */
const CONVERGED_IMPROVEMENT = 1e-7;

const sumOfSquares = (r: Float64Array) => r.reduce((sum, value) => sum + value * value, 0);

/**
 * Levenberg–Marquardt (ml-levenberg-marquardt; Levenberg, Q. Appl. Math. 2, 1944; Marquardt, J. SIAM 11(2), 1963)
 * in rounds of ten iterations, reporting after each: it ends when a round improves the error by less than 1e-7
 * of itself, or at maxIterations, when it says that it has not converged and keeps its best estimate.
 */
export function fitInRounds(problem: LeastSquares, initial: readonly number[], maxIterations: number, onRound?: (iterations: number, error: number) => void): RoundsResult {
  const data = { x: Array.from({ length: problem.count }, (_, k) => k), y: new Array<number>(problem.count).fill(0) };
  const model = (values: number[]) => {
    const r = problem.residuals(values);
    return (k: number) => r[k];
  };
  let values = [...initial];
  let error = sumOfSquares(problem.residuals(values));
  let iterations = 0;
  let converged = false;
  let damping = 1e-2;
  while (iterations < maxIterations && !converged) {
    const round = levenbergMarquardt(data, model, {
      initialValues: values,
      minValues: problem.minValues,
      maxValues: problem.maxValues,
      damping,
      gradientDifference: 1e-6,
      centralDifference: true,
      maxIterations: Math.min(ITERATIONS_PER_ROUND, maxIterations - iterations),
      errorTolerance: 1e-14,
    });
    iterations += Math.max(round.iterations, 1);
    const next = sumOfSquares(problem.residuals(round.parameterValues));
    if (next < error) {
      converged = error - next <= CONVERGED_IMPROVEMENT * error || next < 1e-14;
      values = round.parameterValues;
      error = next;
    } else {
      // No progress at this damping: a few more rounds with smaller, steeper steps, then stop.
      damping *= 100;
      converged = damping > 1e4;
    }
    onRound?.(iterations, error);
  }
  return { values, error, iterations, converged };
}

/** One standard error per parameter from the Jacobian at the solution: σ² = s²·diag((JᵀJ)⁻¹), s² = SSR/(N − P). */
export function standardErrors(problem: LeastSquares, values: readonly number[], error: number): (number | null)[] {
  const p = values.length;
  const n = problem.count;
  if (n <= p) return values.map(() => null);
  const jacobian = new Matrix(n, p);
  for (let j = 0; j < p; j++) {
    const h = 1e-6 * Math.max(1, Math.abs(values[j]));
    const up = problem.residuals(values.map((v, k) => (k === j ? v + h : v)));
    const down = problem.residuals(values.map((v, k) => (k === j ? v - h : v)));
    for (let i = 0; i < n; i++) jacobian.set(i, j, (up[i] - down[i]) / (2 * h));
  }
  const covariance = pseudoInverse(jacobian.transpose().mmul(jacobian));
  const variance = error / (n - p);
  return values.map((_, k) => {
    const c = covariance.get(k, k) * variance;
    return Number.isFinite(c) && c > 0 ? Math.sqrt(c) : null;
  });
}
