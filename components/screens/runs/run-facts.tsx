import { StyleSheet, View } from 'react-native';
import type { RunDetail } from '@/shared/api/runs';
import { runExportUrl } from '@/components/api/runs';
import { legEndsOfCase } from '@/shared/engine/leg-ends';
import { legEndsWords } from '@/components/format/leg-ends-words';
import { formatScientific } from '@/components/format/number';
import { colors, spacing } from '@/components/theme';
import { DownloadLink } from '@/components/ui/download-link';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { formatDuration, secondsBetween } from './run-format';
import type { RunResult } from './run-result';

type Fact = { key: string; label: string; value: string };

/** What the leg solve found, for the accuracy line: the engine's unknown in words. */
const solvedFor: Record<RunResult['accuracy']['unknown'], string> = {
  coldSide: 'the cold-side temperature Tc',
  heatLoad: 'the heat load Qc',
};

function facts(detail: RunDetail, r: RunResult): Fact[] {
  const wall = secondsBetween(detail.run.startedAt, detail.run.finishedAt);
  const search = r.search;
  const list: Fact[] = [
    { key: 'engine', label: 'Engine version', value: detail.engineVersion },
    { key: 'family', label: 'Material family', value: `${detail.design.familyName}, version ${detail.familyVersion}` },
    // From the case exactly as run: what every number on this page was computed with.
    { key: 'ends', label: 'Computed with', value: legEndsWords(legEndsOfCase(detail.case)) },
    {
      key: 'accuracy',
      label: 'Accuracy',
      value: `estimated relative error ${formatScientific(r.accuracy.relativeError, 2)} of ${solvedFor[r.accuracy.unknown]} (target ${formatScientific(r.accuracy.tolerance, 1)}); energy balance ${formatScientific(r.accuracy.energyBalance, 2)}`,
    },
    { key: 'time', label: 'Time taken', value: wall === null ? formatDuration(r.seconds) : `${formatDuration(wall)} from start to finish` },
  ];
  if (search) {
    list.push({ key: 'search', label: 'Search', value: `${search.startsDone} of ${search.starts} starts done; the best came from start ${search.bestStart + 1}` });
  }
  list.push({ key: 'evaluations', label: 'Leg solves', value: `${r.evaluations} in the winning start (${formatDuration(r.seconds)})` });
  if (detail.run.attempts > 1) list.push({ key: 'attempts', label: 'Workers', value: `${detail.run.attempts} attempts: resumed from a checkpoint after a worker was lost` });
  return list;
}

/** How the result was obtained and how far to trust the numerics; the downloads. */
export function RunFacts({ detail, result }: { detail: RunDetail; result: RunResult }) {
  return (
    <View style={styles.wrap}>
      <View role="list" aria-label="How this result was computed" testID="run-facts">
        {facts(detail, result).map((f, i) => (
          <View key={f.key} role="listitem" style={[styles.row, i > 0 && styles.divided]} testID={`run-fact-${f.key}`}>
            <AppText variant="label" tone="muted" style={styles.label}>
              {f.label}
            </AppText>
            <AppText variant="mono" style={styles.value}>
              {f.value}
            </AppText>
          </View>
        ))}
      </View>
      {result.warnings.length > 0 ? (
        <View style={styles.warnings} testID="run-warnings">
          {result.warnings.map((w) => (
            <View key={w} style={styles.warning}>
              <Glyph name="bang" color={colors.heat} />
              <AppText style={styles.value}>{w}</AppText>
            </View>
          ))}
        </View>
      ) : null}
      <View style={styles.downloads}>
        <DownloadLink label="Export CSV" url={runExportUrl(detail.run.id, 'csv')} testID="export-csv" />
        <DownloadLink label="Export JSON" url={runExportUrl(detail.run.id, 'json')} testID="export-json" />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, paddingVertical: spacing.xs },
  divided: { borderTopWidth: 1, borderTopColor: colors.border },
  label: { width: 140 },
  value: { flex: 1, minWidth: 200 },
  warnings: { gap: spacing.xs },
  warning: { flexDirection: 'row', gap: spacing.xs, alignItems: 'flex-start' },
  downloads: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
