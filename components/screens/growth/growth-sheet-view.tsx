import { StyleSheet, View } from 'react-native';
import type { GrowthOrderDto } from '@/shared/api/growth';
import { growthSheetExportUrl } from '@/components/api/growth';
import { jointBandNote, type SheetStep, type SheetView } from '@/shared/api/growth-documents';
import { useRole } from '@/components/auth/session';
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
import { isClosed } from './growth-state';
import { ScatterSettings } from './scatter-settings';
import { YieldBlock } from './yield-view';

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
  const { can } = useRole();
  const progress = order.yieldStatus === 'computing' && order.sheetProgress !== null ? ` (${Math.round(100 * order.sheetProgress)} %)` : '';
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
      <TitledBlock title="Targets, tolerance bands and room-temperature checks" hint={`Bands ${jointBandNote(step.joint, sheet.lossBudget, sheet.unit)}.`} testID="band-note">
        <ZoneTable rows={step.rows} measureTemperature={sheet.measureTemperature} lossBudget={sheet.lossBudget} />
      </TitledBlock>
      {/* On paper the yield is one line among the facts above: the sheet stays one page. */}
      <View {...screenOnlyMark}>
        <TitledBlock title={`Yield at ${order.dopingScatter} decades of doping scatter${order.yieldStatus === 'computing' ? ` — recomputing${progress}` : ''}`} hint="A Monte Carlo of as-grown legs: how often a piece grown with this scatter keeps ΔT within the budget." testID="yield">
          <YieldBlock order={order} sheet={sheet} yieldEstimate={step.yield} />
          {order.yieldStatus === 'failed' && order.sheetError ? <Notice tone="danger" title="The yield could not be computed"><AppText>{order.sheetError}</AppText></Notice> : null}
          {can('growth.scatter') && !isClosed(order.state) ? <ScatterSettings key={order.dopingScatter} order={order} /> : null}
        </TitledBlock>
      </View>
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
