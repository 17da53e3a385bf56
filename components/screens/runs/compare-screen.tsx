import { ScrollView, StyleSheet, View } from 'react-native';
import { useLocalSearchParams } from 'expo-router';
import type { RunDetail } from '@/shared/api/runs';
import { useRunDetails } from '@/components/api/runs';
import { SeriesPlot } from '@/components/charts/series-plot';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { colors, spacing } from '@/components/theme';
import { Section } from '@/components/ui/form-section';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { CautionNotice } from './caution-notice';
import { ChartCard } from './chart-card';
import { compared, compareRows, compareSeries, parseIds, type Compared } from './compare-model';

function NumbersTable({ list }: { list: Compared[] }) {
  const rows = compareRows(list);
  return (
    <ScrollView horizontal>
      <View role="table" aria-label="Runs side by side" testID="compare-table">
        <View role="row" style={styles.row}>
          <View style={styles.labelCell} />
          {list.map((c) => (
            <View key={c.detail.run.id} role="columnheader" style={styles.cell}>
              <AppText variant="label">{c.label}</AppText>
              <AppText variant="caption" tone="muted">
                {c.note}
              </AppText>
            </View>
          ))}
        </View>
        {rows.map((r) => (
          <View key={r.key} role="row" style={[styles.row, styles.divided]} testID={`compare-row-${r.key}`}>
            <AppText role="rowheader" variant="label" tone="muted" style={styles.labelCell}>
              {r.label}
            </AppText>
            {r.cells.map((cell, i) => (
              <AppText key={i} role="cell" variant="mono" style={styles.cell}>
                {cell}
              </AppText>
            ))}
          </View>
        ))}
      </View>
    </ScrollView>
  );
}

function Comparison({ details }: { details: RunDetail[] }) {
  const list = compared(details);
  const doping = compareSeries(list, 'doping');
  const temperature = compareSeries(list, 'temperature');
  return (
    <>
      <Section title="Numbers" hint="Each column is one run; every value is a model prediction.">
        <CautionNotice />
        <NumbersTable list={list} />
      </Section>
      <View style={styles.charts}>
        <ChartCard inGrid title="Doping along the leg" testID="compare-doping">
          <SeriesPlot series={doping} xLabel="Position from the cold end x (mm)" yLabel="n (cm⁻³), log scale" yScale="log" description={`Doping profiles of ${doping.length} runs overlaid`} />
        </ChartCard>
        <ChartCard inGrid title="Temperature along the leg" testID="compare-temperature">
          <SeriesPlot series={temperature} xLabel="Position from the cold end x (mm)" yLabel="T (K)" description={`Temperature profiles of ${temperature.length} runs overlaid`} />
        </ChartCard>
      </View>
    </>
  );
}

/** `/runs/compare?ids=a,b`: two to four runs side by side, numbers and overlaid profiles. */
export function CompareScreen() {
  const ids = parseIds(useLocalSearchParams<{ ids?: string }>().ids);
  const queries = useRunDetails(ids);
  const failed = queries.find((q) => q.isError);
  const details = queries.flatMap((q) => (q.data ? [q.data] : []));
  return (
    <ScreenFrame title="Compare runs" subtitle={`${ids.length} runs side by side`} back={{ label: 'Runs', href: '/runs' }}>
      {ids.length < 2 ? <EmptyState title="Pick at least two runs" body="On the Runs page, tick two to four finished runs and choose Compare." /> : null}
      {failed?.error ? <ErrorState title="Could not load a run" message={failed.error.message} onRetry={() => void failed.refetch()} /> : null}
      {ids.length >= 2 && details.length < ids.length && !failed ? <LoadingState label="Loading the runs…" /> : null}
      {ids.length >= 2 && details.length === ids.length ? <Comparison details={details} /> : null}
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'flex-start' },
  divided: { borderTopWidth: 1, borderTopColor: colors.border },
  labelCell: { width: 150, paddingVertical: spacing.xs, paddingRight: spacing.sm },
  cell: { width: 190, paddingVertical: spacing.xs, paddingRight: spacing.md },
  charts: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
});
