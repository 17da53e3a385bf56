import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { SheetZone } from '@/shared/api/growth-documents';
import { formatNumber, formatScientific } from '@/components/format/number';
import { colors, radii, spacing } from '@/components/theme';
import { gradeColor } from '@/components/ui/graded-strip';
import { AppText } from '@/components/ui/text';
import { mm, zoneName } from './growth-format';
import { keepFillMark } from './print-marks';

export type ZoneDiagramProps = { rows: SheetZone[]; lengthMm: number };

/** Zones narrower than this (px) show only their number inside the bar. */
const labelledWidth = 118;
/** Boundary labels closer than this (px) to the previous one on their row move to the second row. */
const labelGap = 52;

/** Shade of a zone: its doping's place between the sheet's lowest and highest target (0 … 1). */
export function dopingShade(rows: SheetZone[], perCm3: number): number {
  const logs = rows.map((r) => Math.log10(r.perCm3));
  const lo = Math.min(...logs);
  const hi = Math.max(...logs);
  return hi > lo ? (Math.log10(perCm3) - lo) / (hi - lo) : 0.5;
}

/** Which of two rows each boundary label sits on, so that close boundaries do not overprint. */
export function labelRows(positions: number[], widthPx: number): number[] {
  const lastOnRow = [-Infinity, -Infinity];
  return positions.map((p) => {
    const x = p * widthPx;
    const row = x - lastOnRow[0] >= labelGap ? 0 : x - lastOnRow[1] >= labelGap ? 1 : 0;
    lastOnRow[row] = x;
    return row;
  });
}

/**
 * The leg as the grower will cut it: a bar from the cold end (0 mm) to the
 * hot end, one box per zone with its number and target doping, boundaries
 * marked in mm underneath. Drawn with views, so it prints as it shows —
 * shading included (`keepFillMark`), as the caption promises.
 */
export function ZoneDiagram({ rows, lengthMm }: ZoneDiagramProps) {
  const [width, setWidth] = useState(0);
  const boundaries = [0, ...rows.map((r) => r.endMm)];
  const rowOf = labelRows(boundaries.map((b) => b / lengthMm), width);
  const description = rows.map((r) => `${zoneName(r.index)} ${formatNumber(r.startMm, 3)} to ${formatNumber(r.endMm, 3)} mm at ${formatScientific(r.perCm3)} per cm³`).join('; ');
  return (
    <View style={styles.wrap} role="img" aria-label={`Zones along the leg: ${description}`} testID="zone-diagram">
      <View style={styles.ends}>
        <AppText variant="caption" tone="muted">Cold end (load)</AppText>
        <AppText variant="caption" tone="muted">Hot end (heat sink)</AppText>
      </View>
      <View style={styles.bar} onLayout={(e) => setWidth(e.nativeEvent.layout.width)}>
        {rows.map((r, i) => {
          const share = (r.endMm - r.startMm) / lengthMm;
          const roomy = share * width >= labelledWidth;
          return (
            <View key={r.index} {...keepFillMark} style={[styles.zone, i < rows.length - 1 && styles.divider, { flex: share, backgroundColor: gradeColor(dopingShade(rows, r.perCm3)) }]} testID={`zone-box-${r.index + 1}`}>
              <AppText variant="label" style={styles.zoneText} numberOfLines={1}>
                {roomy ? zoneName(r.index) : `${r.index + 1}`}
              </AppText>
              {roomy ? <AppText variant="caption" style={styles.zoneText} numberOfLines={1}>{`${formatScientific(r.perCm3)} cm⁻³`}</AppText> : null}
            </View>
          );
        })}
      </View>
      <View style={[styles.axis, rowOf.includes(1) && styles.axisTwoRows]}>
        {boundaries.map((b, i) => (
          <View key={i} style={[styles.tick, { left: `${(100 * b) / lengthMm}%` }, i === 0 && styles.tickFirst, i === boundaries.length - 1 && styles.tickLast]}>
            <View style={[styles.tickMark, rowOf[i] === 1 && styles.tickMarkLong]} />
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
  zone: { justifyContent: 'center', alignItems: 'center', paddingHorizontal: spacing.xxs },
  divider: { borderRightWidth: 1.5, borderRightColor: colors.text },
  zoneText: { color: colors.text },
  axis: { height: 26 },
  axisTwoRows: { height: 42 },
  tick: { position: 'absolute', top: 0, alignItems: 'center', width: 60, marginLeft: -30 },
  tickFirst: { alignItems: 'flex-start', marginLeft: 0 },
  tickLast: { alignItems: 'flex-end', marginLeft: -60 },
  // Marks are borders, not fills: browsers leave backgrounds off paper.
  tickMark: { width: 0, height: 6, borderLeftWidth: 1.5, borderColor: colors.text },
  tickMarkLong: { height: 22 },
  tickText: { color: colors.text },
});
