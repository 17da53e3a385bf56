import { StyleSheet, View } from 'react-native';
import type { MeasuredPoint, MeasurementPreview as Preview } from '@/shared/growth/parse-measurements';
import { formatNumber, formatScientific } from '@/components/format/number';
import { spacing } from '@/components/theme';
import { DataTable, type DataColumn } from '@/components/ui/data-table';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { IssueList } from '../materials/upload/issue-list';
import { mm } from './growth-format';

const shownRows = 8;

const orDash = (v: number | undefined, f: (v: number) => string) => (v === undefined ? '–' : f(v));

/** Line and position, S and σ, and n and T when the file has them; units in the heads. */
function pointColumns(points: MeasuredPoint[]): DataColumn<MeasuredPoint>[] {
  const num = { width: 92, mono: true, align: 'right' } as const;
  const columns: DataColumn<MeasuredPoint>[] = [
    { key: 'line', head: 'Line', unit: '', width: 48, mono: true, cell: (p) => String(p.line) },
    { key: 'x', head: 'x', unit: 'mm', ...num, cell: (p) => formatNumber(p.positionMm, 3) },
    { key: 'S', head: 'S', unit: 'µV/K', ...num, cell: (p) => orDash(p.seebeck, (v) => formatNumber(v * 1e6, 3)) },
    { key: 'sigma', head: 'σ', unit: 'S/cm', ...num, cell: (p) => orDash(p.sigma, (v) => formatNumber(v / 100, 3)) },
  ];
  if (points.some((p) => p.perCm3 !== undefined)) columns.push({ key: 'n', head: 'n', unit: 'cm⁻³', ...num, width: 112, cell: (p) => orDash(p.perCm3, (v) => formatScientific(v, 3)) });
  if (points.some((p) => p.temperature !== undefined)) columns.push({ key: 'T', head: 'T', unit: 'K', ...num, cell: (p) => orDash(p.temperature, (v) => formatNumber(v, 4)) });
  return columns;
}

/** The positions read from the file, in the trade's units, before anything is saved. */
export function MeasurementPreview({ preview }: { preview: Preview }) {
  const { points } = preview;
  const span = points.length > 0 ? `${mm(Math.min(...points.map((p) => p.positionMm)))} to ${mm(Math.max(...points.map((p) => p.positionMm)))}` : '';
  return (
    <View style={styles.wrap} testID="measurement-preview">
      {preview.ok ? (
        <Notice tone="ok" title="Ready to upload" testID="measurement-status">
          <AppText>{`${points.length} ${points.length === 1 ? 'position' : 'positions'} from ${span}; columns ${preview.columns.map((c) => `${c.header} (${c.unit})`).join(', ')}.`}</AppText>
        </Notice>
      ) : (
        <Notice tone="danger" title="This file cannot be uploaded" testID="measurement-status">
          <AppText>{`${preview.errors.length} ${preview.errors.length === 1 ? 'error' : 'errors'} below, each with its line and column. Nothing is saved until every row reads.`}</AppText>
        </Notice>
      )}
      <IssueList kind="error" issues={preview.errors} />
      <IssueList kind="warning" issues={preview.warnings} />
      {preview.ok ? (
        <View style={styles.rows}>
          <DataTable
            label="Measured positions"
            testID="measurement-rows"
            columns={pointColumns(points)}
            rows={points.slice(0, shownRows)}
            rowKey={(p) => String(p.line)}
            rowTestID={(p) => `measurement-row-${p.line}`}
          />
          {points.length > shownRows ? (
            <AppText variant="caption" tone="muted">{`…and ${formatNumber(points.length - shownRows, 4)} more positions.`}</AppText>
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  rows: { gap: spacing.xs },
});
