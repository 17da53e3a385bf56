import { StyleSheet, View } from 'react-native';
import type { ReportView } from '@/shared/api/growth-documents';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { ampere, kelvin, signedKelvin } from './growth-format';

type Figure = { key: string; term: string; value: string; note: string };

/** Target ΔT of the sheet against the as-grown leg's, at the design current and at its own best current. */
export function reportFigures(report: ReportView): Figure[] {
  const { target, asGrown } = report;
  const atDesign = asGrown.atDesignCurrent;
  const atBest = asGrown.atBestCurrent;
  return [
    { key: 'target', term: `Target ΔT (${report.zones} zones)`, value: kelvin(target.deltaT), note: `at ${ampere(target.current)}` },
    {
      key: 'design-current',
      term: 'As grown, design current',
      value: atDesign.feasible ? kelvin(atDesign.deltaT) : 'no steady state',
      note: atDesign.feasible ? `${signedKelvin(atDesign.deltaT - target.deltaT)} vs target, at ${ampere(target.current)}` : `at ${ampere(target.current)}`,
    },
    {
      key: 'best-current',
      term: 'As grown, its best current',
      value: atBest.feasible ? kelvin(atBest.deltaT) : 'no steady state',
      note: atBest.feasible ? `${signedKelvin(atBest.deltaT - target.deltaT)} vs target, at ${ampere(atBest.current)}` : '',
    },
  ];
}

/** The three numbers the physicist decides on, each with its unit and its difference to the target. */
export function ReportNumbers({ report }: { report: ReportView }) {
  return (
    <View style={styles.wrap}>
      <View style={styles.row} testID="report-numbers">
        {reportFigures(report).map((f) => (
          <View key={f.key} style={[styles.box, f.key === 'design-current' && styles.main]} testID={`report-${f.key}`}>
            <AppText variant="caption" tone="muted">
              {f.term}
            </AppText>
            <AppText variant="title">{f.value}</AppText>
            <AppText variant="caption" tone="muted">
              {f.note}
            </AppText>
          </View>
        ))}
      </View>
      <AppText variant="caption" tone="muted" testID="report-caution">
        Predicted by the leg model from the doping inferred at each measured position, not measured: confirm with a device measurement before building.
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  box: { flexGrow: 1, flexBasis: 180, gap: spacing.xxs, padding: spacing.md, borderWidth: 1, borderColor: colors.border, borderRadius: radii.md, backgroundColor: colors.background },
  main: { borderColor: colors.primary, borderWidth: 2 },
});
