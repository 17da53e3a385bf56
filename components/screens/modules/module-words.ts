import type { LegSource, ModuleSummary } from '@/shared/api/modules';
import { formatNumber } from '@/components/format/number';
import { doping, quantity } from '@/components/screens/runs/run-format';

const legNames = { optimum: 'optimum', uniform: 'best uniform', localBestZt: 'local-best-zT' } as const;

/** "Run 12 · Stage-2 leg, optimum leg of a run" or "NL-N3 … at 2 × 10¹⁹ cm⁻³, 1.5 mm × 1 mm²". */
export function legSourceWords(s: LegSource, name: string | null): string {
  if (s.kind === 'run') return `${name ?? 'a deleted run'}, ${legNames[s.leg]} leg of a run`;
  return `${name ?? 'a deleted family'} at ${doping(s.perCm3)}, ${quantity(s.lengthMm, 'mm')} × ${quantity(s.areaMm2, 'mm²')}`;
}

/** "31 couples · Th 300 K · ΔT 30 K · limit 5 A": the module's settings in one line, with units. */
export function moduleSettingsWords(m: Pick<ModuleSummary, 'input'>): string {
  const i = m.input;
  const couples = i.couples ?? 1;
  const parts = [`${couples} ${couples === 1 ? 'couple' : 'couples'}`, `Th ${quantity(i.hotSide, 'K')}`, `ΔT ${quantity(i.deltaT, 'K')}`];
  if (i.currentLimit !== undefined) parts.push(`limit ${formatNumber(i.currentLimit, 4)} A`);
  return parts.join(' · ');
}
