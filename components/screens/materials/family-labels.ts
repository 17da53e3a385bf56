import type { Carrier, FamilyKind } from '@/shared/api/families';
import type { GlyphName } from '@/components/ui/glyph';

export const kindLabels: Record<FamilyKind, string> = {
  band: 'Band model',
  table: 'Measured table',
  constant: 'Constant properties',
};

export type CarrierLabel = { glyph: GlyphName; short: string; text: string };

/** Carrier type as a word and a sign, so it never depends on colour. */
export function carrierLabel(carrier: Carrier): CarrierLabel {
  switch (carrier) {
    case 'p':
      return { glyph: 'plus', short: 'p', text: 'p-type · holes' };
    case 'n':
      return { glyph: 'minus', short: 'n', text: 'n-type · electrons' };
    default:
      return { glyph: 'ring', short: '–', text: 'Carrier not fixed' };
  }
}
