import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { GrowthOrderDetail } from '@/shared/api/growth';
import { readReport, type SheetView } from '@/shared/api/growth-documents';
import { measurementReportCsvUrl } from '@/components/api/growth';
import { useRole } from '@/components/auth/session';
import { formatDateTime } from '@/components/format/date';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { DownloadLink } from '@/components/ui/download-link';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { kelvin } from './growth-format';
import { chosenStep } from './growth-sheet-view';
import { isClosed } from './growth-state';
import { MeasurementReportView } from './measurement-report-view';
import { MeasurementUpload } from './measurement-upload';

export type MeasurementsSectionProps = { detail: GrowthOrderDetail; sheet: SheetView | null };

/** Upload (growers, while the order is open and its sheet ready) and the reports of every upload, newest first. */
export function MeasurementsSection({ detail, sheet }: MeasurementsSectionProps) {
  const { can } = useRole();
  const { order, measurements } = detail;
  const [shown, setShown] = useState(0);
  const mayUpload = can('measurements.upload') && !isClosed(order.state) && order.sheetStatus === 'ready' && sheet !== null;
  const picked = measurements[Math.min(shown, measurements.length - 1)];
  const report = picked ? readReport(picked.report) : null;
  const rows = sheet ? chosenStep(sheet, report?.zones ?? order.zones).rows : [];
  return (
    <Section title="As-grown measurements" hint="Position along the grown piece with room-temperature Seebeck and/or conductivity, or Hall carrier concentration." testID="measurements">
      {mayUpload && sheet ? <MeasurementUpload orderId={order.id} lengthMm={sheet.lengthMm} measureTemperature={order.measureTemperature} onSaved={() => setShown(0)} /> : null}
      {measurements.length === 0 ? <AppText tone="muted">Nothing uploaded yet.</AppText> : null}
      {measurements.length > 1 ? (
        <View style={styles.uploads} role="radiogroup" aria-label="Uploads">
          {measurements.map((m, i) => (
            <Chip key={m.id} role="radio" label={`${formatDateTime(m.uploadedAt)}${i === 0 ? ' (latest)' : ''}`} selected={i === Math.min(shown, measurements.length - 1)} onPress={() => setShown(i)} />
          ))}
        </View>
      ) : null}
      {picked ? (
        <View style={styles.provenance}>
          <AppText variant="caption" tone="muted" testID="report-provenance">{`Uploaded by ${picked.uploadedBy} · ${formatDateTime(picked.uploadedAt)} · measured at ${kelvin(picked.temperature)}`}</AppText>
          {report ? <DownloadLink label="Report CSV" url={measurementReportCsvUrl(order.id, picked.id)} testID="report-csv" /> : null}
        </View>
      ) : null}
      {picked && report && sheet ? <MeasurementReportView report={report} rows={rows} lengthMm={sheet.lengthMm} /> : null}
      {picked && !report ? (
        <Notice tone="danger" title="Report not readable">
          <AppText>This upload&apos;s report is not in a shape this version of Frostgrade understands.</AppText>
        </Notice>
      ) : null}
    </Section>
  );
}

const styles = StyleSheet.create({
  uploads: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  provenance: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
});
