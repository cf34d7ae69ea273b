/**
 * Random mismatch after Pelgrom, Duinmaijer & Welbers, "Matching properties of MOS transistors",
 * IEEE JSSC 24(5), 1433–1440, 1989: for a PAIR of identical devices, σ(ΔVT) = AVT/√(W·L) and
 * σ(Δβ/β) = Aβ/√(W·L), Δ the difference between the two. Every σ here is of a pair difference unless
 * its name says "single": one device's σ(VT) is AVT/√(2·W·L), the pair's divided by √2.
 */

export interface MismatchDevice {
  /** Pelgrom AVT, V·m. */
  readonly avt: number;
  /** Pelgrom Aβ, m. */
  readonly abeta: number;
  readonly w: number;
  readonly l: number;
  /** gm/ID at the operating point, 1/V. */
  readonly gmId: number;
}

export interface PairMismatch {
  /** σ(ΔVT) of the pair, V. */
  sigmaVt: number;
  /** σ(VT) of one device, V (= sigmaVt/√2 for equal devices). */
  sigmaVtSingle: number;
  /** σ(Δβ/β) of the pair, relative. */
  sigmaBeta: number;
  /** σ(ΔID/ID) of the pair at equal VGS: √((gm/ID)²·σ(ΔVT)² + σ(Δβ/β)²), relative. */
  sigmaId: number;
  /** Gate-referred offset σ(VOS) of the pair at equal ID: σ(ΔID/ID)/(gm/ID) = √(σ(ΔVT)² + (σ(Δβ/β)/(gm/ID))²), V. */
  sigmaVos: number;
}

/** Pelgrom's pair σ = A/√(W·L): σ(ΔVT) with A = avt, σ(Δβ/β) with A = abeta. */
export function pelgromPairSigma(coefficient: number, w: number, l: number): number {
  return coefficient / Math.sqrt(w * l);
}

/** Mismatch between two devices that may differ in size: the single-device variances AVT²/(2WL) add. */
export function mismatchBetween(a: MismatchDevice, b: MismatchDevice): PairMismatch {
  const vtA = (a.avt * a.avt) / (2 * a.w * a.l);
  const vtB = (b.avt * b.avt) / (2 * b.w * b.l);
  const betaA = (a.abeta * a.abeta) / (2 * a.w * a.l);
  const betaB = (b.abeta * b.abeta) / (2 * b.w * b.l);
  const idVariance = a.gmId * a.gmId * vtA + betaA + b.gmId * b.gmId * vtB + betaB;
  const meanGmId = (a.gmId + b.gmId) / 2;
  const sigmaId = Math.sqrt(idVariance);
  return {
    sigmaVt: Math.sqrt(vtA + vtB),
    sigmaVtSingle: Math.sqrt(vtA),
    sigmaBeta: Math.sqrt(betaA + betaB),
    sigmaId,
    sigmaVos: meanGmId > 0 ? sigmaId / meanGmId : Math.sqrt(vtA + vtB),
  };
}

/** Mismatch of a matched pair of two identical devices (the Pelgrom pair convention). */
export function pairMismatch(device: MismatchDevice): PairMismatch {
  return mismatchBetween(device, device);
}

export interface MatchGroupMismatch extends PairMismatch {
  /** Indices (into the list given) of the pair with the largest σ(VOS). */
  a: number;
  b: number;
}

/**
 * The worst pair of a match group (devices meant to match, e.g. a differential pair or a mirror):
 * the pair with the largest gate-referred σ(VOS). null for fewer than two devices.
 */
export function matchGroupMismatch(devices: readonly MismatchDevice[]): MatchGroupMismatch | null {
  let worst: MatchGroupMismatch | null = null;
  for (let i = 0; i < devices.length; i++) {
    for (let j = i + 1; j < devices.length; j++) {
      const pair = mismatchBetween(devices[i], devices[j]);
      if (!worst || pair.sigmaVos > worst.sigmaVos) worst = { ...pair, a: i, b: j };
    }
  }
  return worst;
}
