import type { CoupleRunResult } from '@/shared/api/coolers';
import { formatNumber } from '@/components/format/number';
import { heatFlow } from './cooler-format';

/** Current density in the trade's unit: A/m² → A/cm². */
export const aPerCm2 = (aPerM2: number) => aPerM2 * 1e-4;

export type LegMatch = {
  side: 'p' | 'n';
  /** Shared current / this leg's area, and the leg's own best current density [A/cm²]. */
  shared: number;
  own: number;
  /** shared / own − 1: how far above (+) or below (−) its own best the leg runs. */
  offBy: number;
};

/** Each leg's shared current density against its own best: what the area ratio balances. */
export function legMatches(r: CoupleRunResult): LegMatch[] {
  return (['p', 'n'] as const).map((side) => {
    const leg = r[side];
    const shared = aPerCm2(leg.currentDensity);
    const own = aPerCm2(leg.ownCurrentDensity);
    return { side, shared, own, offBy: own !== 0 ? shared / own - 1 : 0 };
  });
}

/** The axis both legs share, from 0 to a little over the largest density: the dots compare by position. */
export function matchAxisMax(matches: readonly LegMatch[]): number {
  const top = Math.max(0, ...matches.flatMap((m) => [m.shared, m.own]));
  return top > 0 ? top * 1.15 : 1;
}

/** "runs 12.4 % above its own best", "runs at its own best". */
export function offByWords(offBy: number): string {
  const percent = Math.abs(offBy) * 100;
  if (percent < 0.05) return 'runs at its own best';
  return `runs ${formatNumber(percent, 3)} % ${offBy > 0 ? 'above' : 'below'} its own best`;
}

/** What one shared current costs against each leg on its own supply, in the objective's unit. */
export function mismatchWords(r: CoupleRunResult): string {
  const m = r.mismatch;
  const value = (v: number) => (m.unit === 'K' ? `${formatNumber(v, 3)} K` : m.unit === 'W' ? heatFlow(v) : formatNumber(v, 3));
  const what = m.unit === 'K' ? 'ΔT' : m.unit === 'W' ? 'heat load' : 'COP';
  return `One shared current costs ${value(m.cost)} of ${what} against each leg at its own best current (${value(m.separateObjective)} with the legs powered separately).`;
}
