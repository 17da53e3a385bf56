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
};

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
  };
}
