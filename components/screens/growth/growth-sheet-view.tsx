import { StyleSheet, View } from 'react-native';
import type { GrowthOrderDto } from '@/shared/api/growth';
import { growthSheetExportUrl } from '@/components/api/growth';
import type { SheetStep, SheetView } from '@/shared/api/growth-documents';
import { formatDateTime, formatDay } from '@/components/format/date';
import { colors, radii, spacing } from '@/components/theme';
import { DownloadLink } from '@/components/ui/download-link';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { TitledBlock } from '@/components/ui/titled-block';
import { printSheetMark, screenOnlyMark } from './print-marks';
import { PrintButton } from './print-button';
import { PrintStyles } from './print-styles';
import { SheetCaution } from './sheet-caution';
import { SheetFacts } from './sheet-facts';
import { ZoneCountChart } from './zone-count-chart';
import { ZoneDiagram } from './zone-diagram';
import { ZoneTable } from './zone-table';

/** The sheet's step for the order's K; the largest K that fits when the order asks for more. */
export function chosenStep(sheet: SheetView, zones: number): SheetStep {
  return sheet.steps.find((s) => s.zones === zones) ?? sheet.steps[sheet.steps.length - 1];
}

export type GrowthSheetViewProps = { order: GrowthOrderDto; sheet: SheetView };

/**
 * What the grower grows from, on screen and on one printed page: the
 * order's facts, the zones along the leg, the zone table with tolerance
 * bands and room-temperature checks, ΔT against the number of zones, and
 * the caution. Buttons and links stay off paper.
 */
export function GrowthSheetView({ order, sheet }: GrowthSheetViewProps) {
  const step = chosenStep(sheet, order.zones);
  return (
    <View style={styles.sheet} {...printSheetMark} testID="growth-sheet">
      <PrintStyles />
      <View style={styles.head}>
        <View style={styles.title}>
          <AppText variant="monoStrong" tone="muted">
            FROSTGRADE GROWTH SHEET
          </AppText>
          <AppText variant="heading" role="heading" aria-level={2}>{`Batch ${order.batch}`}</AppText>
        </View>
        <View style={styles.actions} {...screenOnlyMark}>
          <PrintButton />
          <DownloadLink label="CSV" url={growthSheetExportUrl(order.id, 'csv')} testID="sheet-csv" />
          <DownloadLink label="JSON" url={growthSheetExportUrl(order.id, 'json')} testID="sheet-json" />
        </View>
      </View>
      <SheetFacts order={order} sheet={sheet} step={step} />
      {step.zones !== order.zones ? (
        <Notice tone="info" title={`${step.zones} zones, not ${order.zones}`}>
          <AppText>{`No more than ${step.zones} zones of at least the shortest zone length fit this leg.`}</AppText>
        </Notice>
      ) : null}
      <TitledBlock title="Zones along the leg" hint="Zone 1 sits at the cold end, against the load.">
        <ZoneDiagram rows={step.rows} lengthMm={sheet.lengthMm} />
      </TitledBlock>
      <TitledBlock title="Targets, tolerance bands and room-temperature checks" hint="Band: the doping range within which the predicted ΔT loss stays under the budget, confirmed by re-solving the leg at each edge.">
        <ZoneTable rows={step.rows} measureTemperature={sheet.measureTemperature} lossBudget={sheet.lossBudget} />
      </TitledBlock>
      <TitledBlock title="Predicted ΔT by number of zones" hint="More zones follow the continuous optimum more closely; K = 1 is the best uniform leg.">
        <ZoneCountChart sheet={sheet} chosen={step.zones} />
      </TitledBlock>
      <SheetCaution />
      <AppText variant="caption" tone="muted">{`Order ${order.id} · released ${formatDay(order.createdAt)} · sheet as of ${formatDateTime(order.updatedAt)}`}</AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  sheet: {
    gap: spacing.lg,
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: spacing.lg,
  },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: spacing.md },
  title: { gap: spacing.xxs, flexShrink: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
