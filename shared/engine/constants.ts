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
/** Stefan–Boltzmann constant [W/(m²·K⁴)], exact from the constants above (CODATA 2018: 5.670374419e-8). */
export const STEFAN_BOLTZMANN = (2 * Math.PI ** 5 * BOLTZMANN ** 4) / (15 * PLANCK ** 3 * 299792458 ** 2);

/** ln of 4π(2·m_e·k/h²)^{3/2} [m⁻³ K^{-3/2}]: a band's N(T) = e^this·(m*·T)^{3/2}. */
export const LN_DOS_PREFACTOR = Math.log(4 * Math.PI * Math.pow((2 * ELECTRON_MASS * BOLTZMANN) / (PLANCK * PLANCK), 1.5));

/** Band-model temperatures the engine accepts [K]; beyond, one band at fixed doping is no model. */
export const BAND_MIN_TEMPERATURE = 1;
export const BAND_MAX_TEMPERATURE = 2000;
