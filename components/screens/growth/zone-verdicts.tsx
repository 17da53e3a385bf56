import { StyleSheet, View } from 'react-native';
import type { SheetZone, ZoneVerdictView } from '@/shared/api/growth-documents';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { bandText, mm, perCm3, zoneName } from './growth-format';
import type { Look } from './growth-state';

/** Each verdict has a sign and a word; colour only repeats them. */
export const verdictLook: Record<ZoneVerdictView['verdict'], Look> = {
  within: { label: 'Within band', glyph: 'check', color: colors.ok, meaning: 'the grown doping is inside the tolerance band' },
  low: { label: 'Below band', glyph: 'minus', color: colors.danger, meaning: 'under-doped: below the band' },
  high: { label: 'Above band', glyph: 'plus', color: colors.danger, meaning: 'over-doped: above the band' },
  stray: { label: 'Readings outside band', glyph: 'bang', color: colors.danger, meaning: 'the zone’s mean is inside the band, but some of its measurements are not' },
  unmeasured: { label: 'Not measured', glyph: 'ring', color: colors.textMuted, meaning: 'no measured position in this zone' },
};

/** Every verdict but "within" and "not measured" asks the grower to look. */
export const isFlagged = (v: ZoneVerdictView) => v.verdict === 'low' || v.verdict === 'high' || v.verdict === 'stray';

/** "1 of 4 readings outside its band"; null on reports stored before readings were judged. */
export function readingsLine(v: ZoneVerdictView): string | null {
  if (v.readings === undefined || v.readingsOutside === undefined || v.readings === 0) return null;
  if (v.readingsOutside === 0) return `all ${v.readings} ${v.readings === 1 ? 'reading' : 'readings'} inside its band`;
  return `${v.readingsOutside} of ${v.readings} ${v.readings === 1 ? 'reading' : 'readings'} outside its band`;
}

export type ZoneVerdictsProps = { verdicts: ZoneVerdictView[]; rows: SheetZone[] };

/** One line per zone: verdict, measured doping (geometric mean of its positions) against the band. */
export function ZoneVerdicts({ verdicts, rows }: ZoneVerdictsProps) {
  return (
    <View role="list" aria-label="Zone checks" style={styles.list} testID="zone-verdicts">
      {verdicts.map((v) => {
        const look = verdictLook[v.verdict];
        const row = rows[v.zone];
        const flagged = isFlagged(v);
        const readings = readingsLine(v);
        return (
          <View key={v.zone} role="listitem" style={[styles.item, flagged && { borderColor: look.color }]} testID={`verdict-${v.zone + 1}`}>
            <View style={styles.head}>
              <AppText variant="bodyStrong">{zoneName(v.zone)}</AppText>
              {row ? <AppText variant="caption" tone="muted">{`${mm(row.startMm)} – ${mm(row.endMm)}`}</AppText> : null}
              <View style={styles.grow} />
              <Glyph name={look.glyph} color={look.color} />
              <AppText variant="label" style={{ color: look.color }}>
                {look.label}
              </AppText>
            </View>
            <AppText>
              {v.measured !== null ? `measured ${perCm3(v.measured)} (${v.points} ${v.points === 1 ? 'position' : 'positions'})` : 'no measured position'}
            </AppText>
            {readings ? <AppText variant={v.readingsOutside ? 'bodyStrong' : 'body'} testID={`verdict-readings-${v.zone + 1}`}>{readings}</AppText> : null}
            {row ? <AppText variant="caption" tone="muted">{`target ${perCm3(row.perCm3)} · band ${bandText(row)}`}</AppText> : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: spacing.sm },
  item: { gap: spacing.xxs, padding: spacing.md, borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.background },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.xs },
  grow: { flexGrow: 1 },
});
