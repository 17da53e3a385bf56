import { StyleSheet, View } from 'react-native';
import type { GrowthOrderDto } from '@/shared/api/growth';
import { yieldBasis, type SheetStep, type SheetView } from '@/shared/api/growth-documents';
import { formatDay } from '@/components/format/date';
import { legEndsWords } from '@/components/format/leg-ends-words';
import { colors, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { ampere, kelvin, mm } from './growth-format';
import { paperOnlyMark } from './print-marks';
import { percent } from './yield-view';

export type SheetFactsProps = { order: GrowthOrderDto; sheet: SheetView; step: SheetStep };

/** The order and the chosen zoning in a few labelled numbers, each with its unit. */
export function SheetFacts({ order, sheet, step }: SheetFactsProps) {
  const facts: Array<[string, string, string]> = [
    ['design', 'Design', order.designName],
    ['due', 'Due', order.dueDate ? formatDay(order.dueDate) : 'no due date'],
    ['released', 'Released', `${formatDay(order.createdAt)} by ${order.releasedBy}`],
    ['length', 'Leg length', `${mm(sheet.lengthMm)} (zone ≥ ${mm(sheet.minZoneMm)})`],
    ['deltaT', `Predicted ΔT, ${step.zones} ${step.zones === 1 ? 'zone' : 'zones'}`, `${kelvin(step.deltaT)} at ${ampere(step.current)}`],
    ['continuous', 'Continuous profile', `ΔT ${kelvin(sheet.continuous.deltaT)}`],
    ['budget', 'Tolerance', step.joint ? `any combination inside the bands loses ≤ ${kelvin(sheet.lossBudget)} of ΔT` : `each band edge alone loses ≤ ${kelvin(sheet.lossBudget)} of ΔT`],
    ...(step.yield ? [['yield', 'Yield', `${percent(step.yield.meetsBudget)} ${yieldBasis(step.yield, sheet.unit)}`] as [string, string, string]] : []),
    ['check', 'Checks measured at', kelvin(sheet.measureTemperature)],
    ['ends', 'Computed with', legEndsWords(sheet.ends)],
  ];
  if (order.notes) facts.push(['notes', `Notes from ${order.releasedBy}`, order.notes]);
  return (
    <View style={styles.grid} testID="sheet-facts">
      {facts.map(([key, term, value]) => (
        // The notes are shown above the sheet on screen; on paper they travel with it.
        <View key={key} style={[styles.fact, key === 'notes' && styles.wide]} testID={`sheet-fact-${key}`} {...(key === 'notes' ? paperOnlyMark : {})}>
          <AppText variant="caption" tone="muted">
            {term}
          </AppText>
          <AppText variant="bodyStrong">{value}</AppText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.lg, rowGap: spacing.sm, borderTopWidth: 1, borderTopColor: colors.border, paddingTop: spacing.sm },
  fact: { flexGrow: 1, flexBasis: 200, gap: spacing.xxs },
  wide: { flexBasis: '100%' },
});
