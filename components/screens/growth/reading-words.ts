import type { InferredPointView, ReadingView } from '@/shared/api/growth-documents';
import { formatNumber, formatScientific, withUnit } from '@/components/format/number';
import { microVoltPerK, perCm3, siemensPerCm } from './growth-format';

/** What each reading is called in the grower's words. */
export const readingName: Record<ReadingView['kind'], string> = { seebeck: 'S', sigma: 'σ', hall: 'Hall n' };

/** The reading in its unit: "312 µV/K", "292 S/cm", "2.47 × 10¹⁹ cm⁻³" (Hall: the carrier concentration, r_H applied). */
export function readingValue(r: ReadingView): string {
  return r.kind === 'seebeck' ? microVoltPerK(r.value) : r.kind === 'sigma' ? siemensPerCm(r.value) : perCm3(r.value);
}

/** The band the reading was judged against: "246–304 µV/K". */
export function readingBand(r: ReadingView): string {
  if (r.kind === 'hall') return withUnit(`${formatScientific(r.low, 3)} – ${formatScientific(r.high, 3)}`, 'cm⁻³');
  const [a, b] = [r.low, r.high].sort((x, y) => x - y);
  return withUnit(`${formatNumber(a!, 3)}–${formatNumber(b!, 3)}`, r.kind === 'seebeck' ? 'µV/K' : 'S/cm');
}

/** "above band" / "below band" / "within band"; a Seebeck reading is judged by its size |S|. */
export function readingVerdict(r: ReadingView): string {
  const size = r.kind === 'seebeck' && r.value < 0 ? '|S| ' : '';
  return r.verdict === 'within' ? 'within band' : `${size}${r.verdict === 'high' ? 'above' : 'below'} band`;
}

export const isOutside = (p: InferredPointView) => (p.readings ?? []).some((r) => r.verdict !== 'within');

/** A position's verdict in words: "Outside band: S above, σ below", "Within band", or null when the report predates reading checks. */
export function pointVerdict(p: InferredPointView): string | null {
  if (!p.readings || p.readings.length === 0) return null;
  const off = p.readings.filter((r) => r.verdict !== 'within');
  if (off.length === 0) return 'Within band';
  return `Outside band: ${off.map((r) => `${readingName[r.kind]} ${r.verdict === 'high' ? 'above' : 'below'}`).join(', ')}`;
}
