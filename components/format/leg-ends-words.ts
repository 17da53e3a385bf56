import { legEndsOf, type LegEnds } from '@/shared/engine/leg-ends';
import type { Design } from '@/shared/api/designs';
import { designEnds, MICRO_OHM_CM2 } from '@/shared/runs/design-case';
import { formatNumber, withUnit } from './number';

/**
 * A leg's contacts and parasitic heat in the trade's words and units
 * (contacts in µΩ·cm², loads in mW or W), for the design and run pages and
 * the growth sheet: "contacts 5 µΩ·cm² (cold), 5 µΩ·cm² (hot); parasitic
 * load 2 mW onto the cold end". One sentence, so every page says it alike.
 */
export function legEndsWords(ends: LegEnds | null | undefined): string {
  if (!ends) return 'ideal contacts (0 µΩ·cm²), no parasitic heat';
  const micro = (v: number) => withUnit(formatNumber(v / MICRO_OHM_CM2), 'µΩ·cm²');
  const contacts = ends.contacts ? `contacts ${micro(ends.contacts.cold)} (cold), ${micro(ends.contacts.hot)} (hot)` : 'ideal contacts';
  const load = ends.parasitic?.heatLoad;
  const radiation = ends.parasitic?.radiation;
  const parasitic = [
    load ? `parasitic load ${load < 1 ? withUnit(formatNumber(load * 1e3), 'mW') : withUnit(formatNumber(load), 'W')} onto the cold end` : null,
    radiation ? `radiation onto the sides, ε = ${formatNumber(radiation.emissivity)}, surroundings at ${withUnit(formatNumber(radiation.surroundings), 'K')}` : null,
  ].filter((s): s is string => s !== null);
  return `${contacts}; ${parasitic.length ? parasitic.join(', ') : 'no parasitic heat'}`;
}

/** The same for a design (trade units → the engine's SI). */
export function designEndsWords(d: Design): string {
  const f = designEnds(d);
  return legEndsWords(legEndsOf(f.contactResistivity, f.parasitic));
}
