import { StyleSheet, View } from 'react-native';
import type { SheetZone } from '@/components/api/growth-schemas';
import { formatNumber, formatScientific } from '@/components/format/number';
import { colors, radii, spacing } from '@/components/theme';
import { gradeColor } from '@/components/ui/graded-strip';
import { AppText } from '@/components/ui/text';
import { mm, zoneName } from './growth-format';

export type ZoneDiagramProps = { rows: SheetZone[]; lengthMm: number };

/** Zones narrower than this share of the leg show only their number inside the bar. */
const labelledShare = 0.16;

/** Shade of a zone: its doping's place between the sheet's lowest and highest target (0 … 1). */
export function dopingShade(rows: SheetZone[], perCm3: number): number {
  const logs = rows.map((r) => Math.log10(r.perCm3));
  const lo = Math.min(...logs);
  const hi = Math.max(...logs);
  return hi > lo ? (Math.log10(perCm3) - lo) / (hi - lo) : 0.5;
}

/**
 * The leg as the grower will cut it: a bar from the cold end (0 mm) to the
 * hot end, one box per zone with its number and target doping, boundaries
 * marked in mm underneath. Drawn with views, so it prints as it shows.
 */
export function ZoneDiagram({ rows, lengthMm }: ZoneDiagramProps) {
  const boundaries = [0, ...rows.map((r) => r.endMm)];
  const description = rows.map((r) => `${zoneName(r.index)} ${formatNumber(r.startMm, 3)} to ${formatNumber(r.endMm, 3)} mm at ${formatScientific(r.perCm3)} per cm³`).join('; ');
  return (
    <View style={styles.wrap} role="img" aria-label={`Zones along the leg: ${description}`} testID="zone-diagram">
      <View style={styles.ends}>
        <AppText variant="caption" tone="muted">Cold end (load)</AppText>
        <AppText variant="caption" tone="muted">Hot end (heat sink)</AppText>
      </View>
      <View style={styles.bar}>
        {rows.map((r) => {
          const share = (r.endMm - r.startMm) / lengthMm;
          const shade = dopingShade(rows, r.perCm3);
          return (
            <View key={r.index} style={[styles.zone, { flex: share, backgroundColor: gradeColor(shade) }]} testID={`zone-box-${r.index + 1}`}>
              <AppText variant="label" style={styles.zoneText} numberOfLines={1}>
                {share >= labelledShare ? zoneName(r.index) : `${r.index + 1}`}
              </AppText>
              {share >= labelledShare ? (
                <AppText variant="caption" style={styles.zoneText} numberOfLines={1}>
                  {`${formatScientific(r.perCm3)} cm⁻³`}
                </AppText>
              ) : null}
            </View>
          );
        })}
      </View>
      <View style={styles.axis}>
        {boundaries.map((b, i) => (
          <View key={i} style={[styles.tick, { left: `${(100 * b) / lengthMm}%` }, i === 0 && styles.tickFirst, i === boundaries.length - 1 && styles.tickLast]}>
            <View style={styles.tickMark} />
            <AppText variant="caption" style={styles.tickText}>
              {i === boundaries.length - 1 ? mm(b) : formatNumber(b, 3)}
            </AppText>
          </View>
        ))}
      </View>
      <AppText variant="caption" tone="muted">
        Position from the cold end x (mm). Shading follows the target doping: lighter is lower.
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  ends: { flexDirection: 'row', justifyContent: 'space-between' },
  bar: { flexDirection: 'row', height: 56, borderWidth: 1.5, borderColor: colors.text, borderRadius: radii.sm, overflow: 'hidden' },
  zone: { justifyContent: 'center', alignItems: 'center', paddingHorizontal: spacing.xxs, borderRightWidth: 1.5, borderRightColor: colors.text },
  zoneText: { color: colors.text },
  axis: { height: 30, marginHorizontal: 0 },
  tick: { position: 'absolute', top: 0, alignItems: 'center', width: 60, marginLeft: -30 },
  tickFirst: { alignItems: 'flex-start', marginLeft: 0 },
  tickLast: { alignItems: 'flex-end', marginLeft: -60 },
  tickMark: { width: 0, height: 6, borderLeftWidth: 1.5, borderColor: colors.text },
  tickText: { color: colors.text },
});
