import { StyleSheet, View } from 'react-native';
import type { MeasurementPreview as Preview } from '@/shared/growth/parse-measurements';
import { formatNumber } from '@/components/format/number';
import { colors, spacing } from '@/components/theme';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { IssueList } from '../materials/upload/issue-list';
import { kelvin, microVoltPerK, mm, perCm3, siemensPerCm } from './growth-format';

const shownRows = 8;

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
        <View role="table" aria-label="Measured positions" testID="measurement-rows">
          {points.slice(0, shownRows).map((p) => (
            <View key={p.line} role="row" style={styles.row}>
              <AppText variant="mono" tone="muted" style={styles.line}>{`line ${p.line}`}</AppText>
              <AppText variant="mono" style={styles.cell}>{mm(p.positionMm)}</AppText>
              <AppText variant="mono" style={styles.cell}>{p.seebeck !== undefined ? microVoltPerK(p.seebeck * 1e6) : '–'}</AppText>
              <AppText variant="mono" style={styles.cell}>{p.sigma !== undefined ? siemensPerCm(p.sigma / 100) : '–'}</AppText>
              {p.perCm3 !== undefined ? <AppText variant="mono" style={styles.cell}>{perCm3(p.perCm3)}</AppText> : null}
              {p.temperature !== undefined ? <AppText variant="mono" style={styles.cell}>{kelvin(p.temperature)}</AppText> : null}
            </View>
          ))}
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
  row: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, paddingVertical: spacing.xxs, borderTopWidth: 1, borderTopColor: colors.border },
  line: { width: 64 },
  cell: { minWidth: 92 },
});
