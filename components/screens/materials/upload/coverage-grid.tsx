import { StyleSheet, View } from 'react-native';
import type { UploadCoverage } from '@/shared/api/family-upload';
import { formatNumber, formatScientific } from '@/components/format/number';
import { colors, radii, spacing } from '@/components/theme';
import { DataTable, type DataColumn } from '@/components/ui/data-table';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';

const rowHeaderWidth = 112;
const cellWidth = 52;

/** The first missing points, and how many more there are, in words. */
function holesText(coverage: UploadCoverage): string {
  const listed = coverage.firstHoles.map((h) => `${formatScientific(h.perCm3, 3)} cm⁻³ at ${formatNumber(h.temperature, 4)} K`).join('; ');
  return `First missing: ${listed}${coverage.holes > coverage.firstHoles.length ? `; and ${coverage.holes - coverage.firstHoles.length} more` : ''}.`;
}

/** A tick where measured, a cross where missing; the words are for screen readers. */
function Mark({ ok, label }: { ok: boolean; label: string }) {
  return (
    <View style={[styles.cell, ok ? styles.present : styles.missing]} aria-label={`${label}: ${ok ? 'measured' : 'missing'}`}>
      <Glyph name={ok ? 'check' : 'cross'} color={ok ? colors.ok : colors.danger} />
    </View>
  );
}

/**
 * Doping (rows) × temperature (columns): a tick where measured, a cross where
 * missing, in words for screen readers. A grid too large to draw (the server
 * sends no cell map) is described by its counts and its first holes.
 */
export function CoverageGrid({ coverage }: { coverage: UploadCoverage }) {
  const { dopings, temperatures, present, measured, holes } = coverage;
  if (dopings.length === 0 || temperatures.length === 0) {
    return <AppText tone="muted">No complete row to place on the grid.</AppText>;
  }
  const summary = (
    <AppText tone={holes > 0 ? 'heat' : 'muted'}>
      {`${dopings.length} dopings × ${temperatures.length} temperatures: ${measured} measured, ${holes} missing.`}
    </AppText>
  );
  if (!present) {
    return (
      <View style={styles.wrap} testID="coverage-grid">
        {summary}
        <AppText tone="muted">{`${dopings.length * temperatures.length} grid points are too many to draw here.`}</AppText>
        {holes > 0 ? <AppText testID="coverage-holes">{holesText(coverage)}</AppText> : null}
      </View>
    );
  }
  const columns: DataColumn<number>[] = [
    { key: 'n', head: 'n (cm⁻³) \\ T (K)', width: rowHeaderWidth, mono: true, cell: (i) => formatScientific(dopings[i], 3) },
    ...temperatures.map((t, j): DataColumn<number> => ({
      key: String(t),
      head: formatNumber(t, 4),
      width: cellWidth,
      align: 'center',
      cell: (i) => <Mark ok={present[i]?.[j] === true} label={`${formatScientific(dopings[i], 3)} cm⁻³ at ${t} K`} />,
    })),
  ];
  return (
    <View style={styles.wrap} testID="coverage-grid">
      {summary}
      <DataTable label="Grid coverage" columns={columns} rows={dopings.map((_, i) => i)} rowKey={(i) => String(dopings[i])} rowHeaders />
      <View style={styles.key}>
        <Glyph name="check" color={colors.ok} />
        <AppText variant="caption" tone="muted">
          measured
        </AppText>
        <Glyph name="cross" color={colors.danger} />
        <AppText variant="caption" tone="muted">
          missing
        </AppText>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  cell: { height: 28, borderRadius: radii.sm, alignItems: 'center', justifyContent: 'center' },
  present: { backgroundColor: colors.okSoft },
  missing: { backgroundColor: colors.dangerSoft, borderWidth: 1, borderColor: colors.danger, borderStyle: 'dashed' },
  key: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});
