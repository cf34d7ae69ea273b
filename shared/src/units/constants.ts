/**
 * Physical constants in SI units, each with its source.
 * k and q are defining constants of the SI since 2019, hence exact.
 */

/** Boltzmann constant k in J/K, exact. The International System of Units (SI), BIPM SI Brochure, 9th ed., 2019, table 1. */
export const k = 1.380649e-23;

/** Elementary charge q in C, exact. BIPM SI Brochure, 9th ed., 2019, table 1. */
export const q = 1.602176634e-19;

/**
 * Vacuum permittivity ε0 in F/m (measured since 2019, relative uncertainty 1.5e-10).
 * E. Tiesinga, P. J. Mohr, D. B. Newell, B. N. Taylor, "CODATA recommended values of the
 * fundamental physical constants: 2018", Rev. Mod. Phys. 93, 025010 (2021).
 */
export const epsilon0 = 8.8541878128e-12;

/** Relative permittivity of thermal SiO2: 3.9. S. M. Sze, K. K. Ng, Physics of Semiconductor Devices, 3rd ed., Wiley, 2007, appendix (SiO2 properties); the value SPICE uses. */
export const epsilonRSiO2 = 3.9;

/**
 * Relative permittivity of silicon: 11.7, the value SPICE uses (ngspice MOS level 1, BSIM4 EPSRSUB default)
 * and Y. Tsividis, C. McAndrew, Operation and Modeling of the MOS Transistor, 3rd ed., Oxford UP, 2011.
 * Sze & Ng (2007) tabulate 11.9; the 1.7 % difference moves γ by 0.85 %.
 */
export const epsilonRSi = 11.7;
