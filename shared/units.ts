/**
 * Unit conversions between the trade's units (what people type and read) and
 * SI (what the engine computes in). Case files carry doping in cm⁻³ and
 * mobility in cm²/(V·s); everything else is SI already.
 */

/** cm⁻³ → m⁻³ (1 cm⁻³ = 10⁶ m⁻³). */
export const perCm3ToPerM3 = (perCm3: number): number => perCm3 * 1e6;

/** m⁻³ → cm⁻³. */
export const perM3ToPerCm3 = (perM3: number): number => perM3 * 1e-6;

/** cm²/(V·s) → m²/(V·s) (1 cm² = 10⁻⁴ m²). */
export const cm2PerVsToM2PerVs = (mobility: number): number => mobility * 1e-4;

/** S/m → S/cm, for display. */
export const siemensPerMToPerCm = (sigma: number): number => sigma * 1e-2;

/** V/K → µV/K, for display. */
export const voltPerKToMicro = (seebeck: number): number => seebeck * 1e6;
