/**
 * The gate area W·L of each device of an equal pair whose input-referred offset is σ(VOS), at gm/ID:
 * σ²(VOS) = σ²(ΔVT) + σ²(Δβ/β)/(gm/ID)² with σ(ΔVT) = AVT/√(WL) and σ(Δβ/β) = Aβ/√(WL) (Pelgrom, Duinmaijer &
 * Welbers, IEEE JSSC 24(5), 1989; the input-referred combination of Kinget, IEEE JSSC 40(6), 2005), so
 * W·L = (AVT² + (Aβ/(gm/ID))²)/σ²(VOS). avt in V·m, abeta in m, gmId in 1/V, sigmaVos in V; the answer in m².
 */
export function offsetArea(avt: number, abeta: number, gmId: number, sigmaVos: number): number {
  const beta = gmId > 0 ? abeta / gmId : 0;
  return (avt * avt + beta * beta) / (sigmaVos * sigmaVos);
}
