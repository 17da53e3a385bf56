import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ReportView, SheetZone } from '@/shared/api/growth-documents';
import { SeriesPlot } from '@/components/charts/series-plot';
import { spacing } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { TitledBlock } from '@/components/ui/titled-block';
import { IssueList } from '../materials/upload/issue-list';
import { reportSeries } from './report-series';
import { ReportNumbers } from './report-numbers';
import { isOutside } from './reading-words';
import { ReadingTable } from './reading-table';
import { isFlagged, verdictLook, ZoneVerdicts } from './zone-verdicts';

export type MeasurementReportViewProps = { report: ReportView; rows: SheetZone[]; lengthMm: number };

/** "2 of 3 zones within band; zone 2 above band. 1 of 18 positions has a reading outside its band." */
export function verdictSummary(report: ReportView): string {
  const within = report.verdicts.filter((v) => v.verdict === 'within').length;
  const off = report.verdicts.filter((v) => v.verdict !== 'within').map((v) => `zone ${v.zone + 1} ${verdictLook[v.verdict].label.toLowerCase()}`);
  const zones = `${within} of ${report.verdicts.length} zones within band${off.length ? `; ${off.join(', ')}` : ''}.`;
  const outside = report.points.filter(isOutside).length;
  const judged = report.points.some((p) => p.readings !== undefined);
  if (!judged) return `${zones} Judged zone by zone only: this upload predates the check of each reading; upload it again to check every measurement.`;
  return `${zones} ${outside} of ${report.points.length} ${report.points.length === 1 ? 'position has' : 'positions have'} a reading outside its zone's band.`;
}

function summaryTitle(report: ReportView): string {
  if (report.verdicts.some((v) => v.verdict === 'low' || v.verdict === 'high')) return 'Zones out of tolerance';
  if (report.verdicts.some(isFlagged) || report.points.some(isOutside)) return 'Measurements outside their band';
  return 'Every measured zone within tolerance';
}

/** What the as-grown piece means: predicted ΔT against the target, each zone's verdict, warnings and the doping along the leg. */
export function MeasurementReportView({ report, rows, lengthMm }: MeasurementReportViewProps) {
  const series = useMemo(() => reportSeries(rows, report, lengthMm), [rows, report, lengthMm]);
  const flagged = report.verdicts.some(isFlagged) || report.points.some(isOutside);
  return (
    <View style={styles.wrap} testID="measurement-report">
      <Notice tone={flagged ? 'danger' : 'ok'} title={summaryTitle(report)} testID="report-summary">
        <AppText>{verdictSummary(report)}</AppText>
      </Notice>
      <ReportNumbers report={report} />
      {report.hall ? (
        <Notice tone={report.hall.source === 'none' ? 'warning' : 'info'} title="Hall factor used" testID="report-hall">
          <AppText>{report.hall.note}</AppText>
        </Notice>
      ) : null}
      <ZoneVerdicts verdicts={report.verdicts} rows={rows} />
      <TitledBlock title="Each measurement against its zone's band" testID="report-readings">
        <ReadingTable points={report.points} />
      </TitledBlock>
      {report.warnings.length > 0 ? (
        <Notice tone="warning" title={`${report.warnings.length} ${report.warnings.length === 1 ? 'measurement' : 'measurements'} to look at`} testID="report-warnings">
          {report.warnings.map((w, i) => (
            <AppText key={i}>{w}</AppText>
          ))}
        </Notice>
      ) : null}
      <IssueList kind="warning" issues={report.uploadWarnings ?? []} />
      <TitledBlock title="Target and as-grown doping along the leg" testID="report-plot">
        <SeriesPlot
          series={series}
          xLabel="Position from the cold end x (mm)"
          yLabel="Carrier concentration n (cm⁻³)"
          yScale="log"
          height={240}
          description={`Target doping steps with tolerance band edges and the doping inferred at ${report.points.length} measured positions, ${report.points.filter(isOutside).length} of them with a reading outside its band, against position along the leg`}
          note="As grown: doping inferred from each position's measurements with the family's model; the engine predicts the leg between them. A square marks a position with a reading outside its zone's band."
        />
      </TitledBlock>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
});
