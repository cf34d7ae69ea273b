/**
 * The normalised inversion charge q of the charge-based EKV model at a normalised channel voltage v:
 * v = 2q + ln q, with v = (VP − VS)/UT = VOV/(n·UT) at the source (and (VOV − n·VDS)/(n·UT) at the drain), and
 * the normalised current i = q² + q (C. C. Enz, E. A. Vittoz, Charge-Based MOS Transistor Modeling, Wiley, 2006,
 * ch. 3). So 2q = W(2eᵛ), Lambert's W. Weak inversion q → eᵛ, strong inversion q → v/2; dq/dv = q/(2q + 1).
 *
 * Solved in the form w + ln w = L, w = 2q, L = v + ln 2, from Winitzki's approximation (within 2 % everywhere;
 * S. Winitzki, "Uniform approximations for transcendental functions", ICCSA 2003, LNCS 2667) and three Newton
 * steps (to 1e-15). Finite for every finite v: 0 once eᵛ underflows.
 */
export function normalisedCharge(v: number): number {
  const l = v + Math.LN2;
  let w: number;
  if (l < 700) {
    const z = Math.exp(l);
    if (z < 1e-8) return 0.5 * z * (1 - z);
    const a = Math.log1p(z);
    w = a * (1 - Math.log1p(a) / (2 + a));
  } else {
    w = l - Math.log(l);
  }
  for (let step = 0; step < 3; step++) w = (w * (1 + l - Math.log(w))) / (1 + w);
  return 0.5 * w;
}
