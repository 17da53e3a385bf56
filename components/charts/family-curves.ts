/**
 * What the family plots show, computed in the browser with the engine:
 * S, σ, κ and zT against doping at a few temperatures, and the zT-optimal
 * doping against temperature. Tens of points per curve keep it instant.
 */
import {
  CaseError,
  familyFromMaterial,
  figureOfMerit,
  propertiesAt,
  ztOptimalDoping,
  type LocalProperties,
  type MaterialFamily,
  type MaterialInput,
} from '@/shared/engine';
import type { PlotPoint } from './line-plot-types';

export type CurveQuantity = 'seebeck' | 'sigma' | 'kappa' | 'zT';
export type TableRow = Extract<MaterialInput, { kind: 'table' }>['rows'][number];

type QuantityInfo = {
  title: string;
  /** Axis caption with the trade unit. */
  axis: string;
  scale: 'linear' | 'log';
  /** From engine units (V/K, S/m, W/(m·K)) to the unit on screen. */
  display: (p: LocalProperties) => number;
};

export const quantityInfo: Record<CurveQuantity, QuantityInfo> = {
  seebeck: {
    title: 'Seebeck coefficient',
    axis: 'S (µV/K)',
    scale: 'linear',
    display: (p) => p.seebeck * 1e6,
  },
  sigma: {
    title: 'Electrical conductivity',
    axis: 'σ (S/cm), log scale',
    scale: 'log',
    display: (p) => p.sigma / 100,
  },
  kappa: {
    title: 'Thermal conductivity',
    axis: 'κ (W/(m·K))',
    scale: 'linear',
    display: (p) => p.kappa,
  },
  zT: { title: 'Figure of merit', axis: 'zT (dimensionless)', scale: 'linear', display: (p) => p.zT },
};

export const dopingAxis = 'Carrier concentration n (cm⁻³), log scale';

/** Doping window of band-model plots [cm⁻³]: where practical thermoelectrics live. */
export const bandDopingRange = { min: 1e17, max: 1e21 } as const;
export const bandTemperatureChoices = [200, 250, 300, 350, 400] as const;
export const bandDefaultTemperatures = [250, 300, 350] as const;
const pointsPerCurve = 41;
const optimumSteps = 21;

export type PlotSetup =
  | {
      ok: true;
      /** Null when a measured table cannot be interpolated: points only. */
      family: MaterialFamily | null;
      /** Why there are no lines, when `family` is null. */
      linesMissing?: string;
      dopingRange: { min: number; max: number };
      temperatureChoices: number[];
      defaultTemperatures: number[];
      /** Measured rows (tables only): drawn as points. */
      measured: TableRow[] | null;
    }
  | { ok: false; reason: string };

function spread(values: number[], count: number): number[] {
  if (values.length <= count) return values;
  const picked = new Set<number>();
  for (let k = 0; k < count; k++) picked.add(values[Math.round((k * (values.length - 1)) / (count - 1))]);
  return [...picked];
}

function tableSetup(rows: TableRow[], family: MaterialFamily | null, linesMissing?: string): PlotSetup {
  const dopings = rows.map((r) => r.perCm3);
  const temperatures = [...new Set(rows.map((r) => r.temperature))].sort((a, b) => a - b);
  return {
    ok: true,
    family,
    linesMissing,
    dopingRange: { min: Math.min(...dopings), max: Math.max(...dopings) },
    temperatureChoices: temperatures,
    defaultTemperatures: spread(temperatures, 3),
    measured: rows,
  };
}

/** Builds the engine family for plotting, or says why there is nothing to plot. */
export function plotSetup(definition: MaterialInput): PlotSetup {
  if (definition.kind === 'constant') {
    return { ok: false, reason: 'Constant properties do not change with doping or temperature, so there is nothing to plot.' };
  }
  let family: MaterialFamily;
  try {
    family = familyFromMaterial(definition);
  } catch (error) {
    if (!(error instanceof CaseError)) throw error;
    // The message starts with the field path ("material.rows: …"), which means nothing on screen.
    const why = error.message.startsWith(`${error.field}: `) ? error.message.slice(error.field.length + 2) : error.message;
    if (definition.kind !== 'table' || definition.rows.length === 0) return { ok: false, reason: why };
    return tableSetup(definition.rows, null, `Measured points only, no interpolation: ${why}`);
  }
  if (definition.kind === 'table') return tableSetup(definition.rows, family);
  return {
    ok: true,
    family,
    dopingRange: { ...bandDopingRange },
    temperatureChoices: [...bandTemperatureChoices],
    defaultTemperatures: [...bandDefaultTemperatures],
    measured: null,
  };
}

/** `count` dopings spaced evenly in log10 between min and max [cm⁻³]. */
export function logSpaced(min: number, max: number, count = pointsPerCurve): number[] {
  const a = Math.log10(min);
  const b = Math.log10(max);
  if (count < 2 || b <= a) return [min];
  return Array.from({ length: count }, (_, k) => Math.pow(10, a + ((b - a) * k) / (count - 1)));
}

/** The model (or interpolation) of one quantity against doping at T [K]. */
export function curveVsDoping(
  family: MaterialFamily,
  quantity: CurveQuantity,
  temperature: number,
  range: { min: number; max: number },
): PlotPoint[] {
  const show = quantityInfo[quantity].display;
  return logSpaced(range.min, range.max).map((n) => ({ x: n, y: show(propertiesAt(family, n, temperature)) }));
}

/** Measured rows at T [K], as plotted points of one quantity. */
export function measuredVsDoping(rows: TableRow[], quantity: CurveQuantity, temperature: number): PlotPoint[] {
  const show = quantityInfo[quantity].display;
  return rows
    .filter((r) => Math.abs(r.temperature - temperature) < 1e-6)
    .map((r) => ({ x: r.perCm3, y: show({ ...r, zT: figureOfMerit(r, r.temperature) }) }))
    .sort((a, b) => a.x - b.x);
}

/** zT-optimal doping [cm⁻³] at evenly spaced temperatures of [lowT, highT] K. */
export function optimumVsTemperature(
  family: MaterialFamily,
  temperatures: { low: number; high: number },
  range: { min: number; max: number },
): PlotPoint[] {
  const { low, high } = temperatures;
  const steps = high > low ? optimumSteps : 1;
  return Array.from({ length: steps }, (_, k) => {
    const t = steps === 1 ? low : low + ((high - low) * k) / (steps - 1);
    return { x: t, y: ztOptimalDoping(family, t, range.min, range.max) };
  });
}

/** At each measured temperature, the measured doping with the largest zT (x = T [K], y = n [cm⁻³]). */
export function bestMeasuredVsTemperature(rows: TableRow[]): PlotPoint[] {
  const best = new Map<number, { n: number; zT: number }>();
  for (const r of rows) {
    const zT = figureOfMerit(r, r.temperature);
    const held = best.get(r.temperature);
    if (!held || zT > held.zT) best.set(r.temperature, { n: r.perCm3, zT });
  }
  return [...best.entries()].sort((a, b) => a[0] - b[0]).map(([t, b]) => ({ x: t, y: b.n }));
}
