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
  unmeasured: { label: 'Not measured', glyph: 'ring', color: colors.textMuted, meaning: 'no measured position in this zone' },
};

export type ZoneVerdictsProps = { verdicts: ZoneVerdictView[]; rows: SheetZone[] };

/** One line per zone: verdict, measured doping (geometric mean of its positions) against the band. */
export function ZoneVerdicts({ verdicts, rows }: ZoneVerdictsProps) {
  return (
    <View role="list" aria-label="Zone checks" style={styles.list} testID="zone-verdicts">
      {verdicts.map((v) => {
        const look = verdictLook[v.verdict];
        const row = rows[v.zone];
        const flagged = v.verdict === 'low' || v.verdict === 'high';
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
