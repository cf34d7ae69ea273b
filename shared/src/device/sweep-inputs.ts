/** Full-length scratch arrays for the quantities that vary along a series, reused from call to call (none is returned). */
export class Scratch {
  private static cached: Scratch | undefined;
  readonly ut: Float64Array;
  readonly kp: Float64Array;
  readonly vtZeroBias: Float64Array;
  readonly vt: Float64Array;
  readonly n: Float64Array;
  readonly gmbRatio: Float64Array;
  readonly lambda: Float64Array;
  readonly leff: Float64Array;
  readonly theta: Float64Array;
  readonly theta2: Float64Array;
  readonly esat: Float64Array;
  readonly clm: Float64Array;
  readonly eta: Float64Array;
  readonly vtShift: Float64Array;
  readonly w: Float64Array;
  readonly beta: Float64Array;
  readonly vov: Float64Array;
  readonly vdsat: Float64Array;

  static forPoints(count: number): Scratch {
    if (Scratch.cached?.ut.length !== count) Scratch.cached = new Scratch(count);
    return Scratch.cached;
  }

  private constructor(count: number) {
    const make = () => new Float64Array(count);
    this.ut = make();
    this.kp = make();
    this.vtZeroBias = make();
    this.vt = make();
    this.n = make();
    this.gmbRatio = make();
    this.lambda = make();
    this.leff = make();
    this.theta = make();
    this.theta2 = make();
    this.esat = make();
    this.clm = make();
    this.eta = make();
    this.vtShift = make();
    this.w = make();
    this.beta = make();
    this.vov = make();
    this.vdsat = make();
  }
}

/**
 * The inputs of a series point by point. Each is a column in the sense of drain-current.ts: one value for
 * every point (length 1) when it does not change along the series, else one value per point.
 */
export interface SeriesInputs {
  tempC: Float64Array;
  ut: Float64Array;
  kp: Float64Array;
  vtZeroBias: Float64Array;
  vsb: Float64Array;
  vt: Float64Array;
  n: Float64Array;
  gmbRatio: Float64Array;
  l: Float64Array;
  /** Effective length (= l for the square law), m. */
  leff: Float64Array;
  lambda: Float64Array;
  /** Short-channel terms at leff (see short-channel.ts); constants 0/Infinity for the square law. */
  theta: Float64Array;
  theta2: Float64Array;
  esat: Float64Array;
  clm: Float64Array;
  eta: Float64Array;
  /** VT shift of the length from the long-channel VT, V (all-region only). */
  vtShift: Float64Array;
  vds: Float64Array;
  /** Drawn width (all fingers), m. */
  w: Float64Array;
  /** Fingers of the drawn width (each loses ΔW); one value for the whole series. */
  fingers: number;
  /** ΔW per finger of the model (0 for the square law), m. */
  dw: number;
  beta: Float64Array;
  vov: Float64Array;
}

export interface KernelOutputs {
  id: Float64Array;
  gm: Float64Array;
  gds: Float64Array;
  gmId: Float64Array;
  vdsat: Float64Array;
}

/** A column holding one value for every point (see drain-current.ts). */
export const one = (value: number) => Float64Array.of(value);
