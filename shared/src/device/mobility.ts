/**
 * kp(T) = kp · kpScale · (T/Tnom)^muExp, temperatures in kelvin: lattice-scattering mobility law
 * (S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ed., 2007, ch. 1; SPICE level 1 fixes muExp = −1.5).
 */
export function kpAtTemperature(kp: number, tempK: number, tnomK: number, muExp: number, kpScale = 1): number {
  return kp * kpScale * (tempK / tnomK) ** muExp;
}
