import type { CaseInput, MaterialInput } from '../engine';

/** The design fields that decide the engine case (trade units: mm, mm², K, W, cm⁻³). */
export type DesignParameters = {
  lengthMm: number;
  areaMm2: number;
  hotSide: number;
  objective: 'maxDeltaT' | 'maxHeatLoad' | 'maxCop';
  heatLoad: number;
  coldSide: number | null;
  minPerCm3: number;
  maxPerCm3: number;
  controlPoints: number;
  monotone: boolean;
  /** Contacts of the cold and hot junction, µΩ·cm²; absent (designs saved before) = 0. */
  coldContactMicroOhmCm2?: number;
  hotContactMicroOhmCm2?: number;
  /** Parasitic heat onto the cold side, per leg; absent = none. */
  parasitic?: 'none' | 'fixed' | 'radiation';
  parasiticLoadW?: number;
  emissivity?: number;
  surroundingsK?: number | null;
};

/** 1 µΩ·cm² in Ω·m². */
export const MICRO_OHM_CM2 = 1e-10;

/** The engine's contact and parasitic fields of a design (SI); {} for ideal contacts and none. */
export function designEnds(d: DesignParameters): Pick<CaseInput, 'contactResistivity' | 'parasitic'> {
  const cold = d.coldContactMicroOhmCm2 ?? 0;
  const hot = d.hotContactMicroOhmCm2 ?? 0;
  const contacts = cold > 0 || hot > 0 ? { contactResistivity: { cold: cold * MICRO_OHM_CM2, hot: hot * MICRO_OHM_CM2 } } : {};
  if (d.parasitic === 'fixed' && (d.parasiticLoadW ?? 0) > 0) return { ...contacts, parasitic: { heatLoad: d.parasiticLoadW } };
  if (d.parasitic === 'radiation' && (d.emissivity ?? 0) > 0 && d.surroundingsK) {
    return { ...contacts, parasitic: { radiation: { emissivity: d.emissivity as number, surroundings: d.surroundingsK } } };
  }
  return contacts;
}

export type SweepParameter = 'hotSide' | 'lengthMm' | 'heatLoad' | 'maxPerCm3' | 'minPerCm3';

/** The design with one parameter replaced, as a sweep runs it. */
export function withSweepValue(d: DesignParameters, parameter: SweepParameter, value: number): DesignParameters {
  return { ...d, [parameter]: value };
}

/** The engine's optimize case for a design: SI inside (m, m²), doping in cm⁻³. */
export function designToCase(d: DesignParameters, material: MaterialInput): CaseInput {
  return {
    hotSide: d.hotSide,
    length: d.lengthMm * 1e-3,
    area: d.areaMm2 * 1e-6,
    objective: d.objective,
    ...(d.objective === 'maxDeltaT' ? {} : { coldSide: d.coldSide ?? undefined }),
    ...(d.objective === 'maxHeatLoad' ? {} : { heatLoad: d.heatLoad }),
    material,
    bounds: { minPerCm3: d.minPerCm3, maxPerCm3: d.maxPerCm3 },
    controlPoints: d.controlPoints,
    monotone: d.monotone,
    ...designEnds(d),
  };
}
