/**
 * Physical constants, SI, exact values of the 2019 SI redefinition
 * (CODATA 2018) except the electron mass, which is a measured value.
 */
export const BOLTZMANN = 1.380649e-23; // J/K
export const ELEMENTARY_CHARGE = 1.602176634e-19; // C
export const PLANCK = 6.62607015e-34; // J·s
export const ELECTRON_MASS = 9.1093837015e-31; // kg (CODATA 2018)

/** k/e in V/K: the natural unit of the Seebeck coefficient (≈ 86.17 µV/K). */
export const K_OVER_E = BOLTZMANN / ELEMENTARY_CHARGE;
