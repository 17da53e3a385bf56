import { Pressable, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import type { RunProgress, RunSummary } from '@/shared/api/runs';
import { isFinished } from '@/components/api/runs';
import { colors, spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { BipolarLine } from './bipolar-note';
import { ProgressBar } from './progress-bar';
import { asObjective, formatObjective, objectiveInfo, placeInLine, runName, runProvenance, runTitle } from './run-format';
import { RunStateBadge } from './run-state-badge';
import { coolerBestWords, runKindLabel } from '@/components/screens/stages/cooler-format';

export type RunRowProps = {
  run: RunSummary;
  /** Latest live progress, when the page watches this run. */
  live?: RunProgress;
  /** Show the design's name (lists of several designs). */
  showDesign?: boolean;
  /** A swept value, already formatted with its unit. */
  sweepLabel?: string;
  selection?: { selected: boolean; onToggle: () => void };
};

/** "Best ΔT 87.3 K" or "Best so far ΔT 80.1 K"; a cascade's least power in W. */
function bestText(run: RunSummary, live?: RunProgress): string {
  const objective = asObjective(run.objective);
  const best = live?.best ?? run.best;
  if (run.kind !== 'leg') return coolerBestWords(run.objective, best, isFinished(run.state));
  const prefix = isFinished(run.state) ? 'Best' : 'Best so far';
  return `${prefix} ${objectiveInfo[objective].symbol} ${formatObjective(objective, best)}`;
}

function RowBody({ run, live, showDesign, sweepLabel }: Omit<RunRowProps, 'selection'>) {
  const active = !isFinished(run.state);
  return (
    <View style={styles.body}>
      <View style={styles.top}>
        <AppText variant="bodyStrong" style={styles.grow} numberOfLines={2} testID="run-row-name">
          {[runName(run), showDesign ? run.designName : null, sweepLabel ?? null].filter(Boolean).join(' · ')}
        </AppText>
        <Glyph name="chevron-right" color={colors.textFaint} />
      </View>
      <View style={styles.facts}>
        <RunStateBadge state={run.state} />
        {showDesign ? <AppText variant="caption" tone="muted" testID="run-row-kind">{`${runKindLabel[run.kind]} run`}</AppText> : null}
        <AppText variant="mono">{bestText(run, live)}</AppText>
      </View>
      {active ? (
        <ProgressBar
          compact
          fraction={live?.fractionDone ?? run.fractionDone}
          label={`Progress of ${runTitle(run)}`}
          caption={live?.phase ?? (run.state === 'queued' ? `waiting: ${run.waiting ? placeInLine(run.waiting.position) : 'for a worker'}` : 'running')}
        />
      ) : null}
      {run.state === 'queued' && run.waiting ? (
        <AppText variant="caption" tone="muted" numberOfLines={2}>
          {run.waiting.reason}
        </AppText>
      ) : null}
      <BipolarLine bipolar={run.bipolar} />
      {run.state === 'failed' && run.error ? (
        <AppText variant="caption" tone="danger" numberOfLines={2}>
          {run.error}
        </AppText>
      ) : null}
      <AppText variant="caption" tone="muted" testID="run-row-provenance">{runProvenance(run)}</AppText>
    </View>
  );
}

/** One run in a list: state in words, best objective with its unit, live progress; opens the run. */
export function RunRow({ selection, ...row }: RunRowProps) {
  const { run } = row;
  return (
    <View style={styles.row} testID={`run-row-${run.id}`}>
      <Link href={`/runs/${run.id}`} asChild>
        <Pressable style={styles.link} aria-label={`${runTitle(run)}, ${run.state}`}>
          <RowBody {...row} />
        </Pressable>
      </Link>
      {selection ? (
        <View style={styles.select}>
          <Chip label="Compare" selected={selection.selected} onPress={selection.onToggle} testID={`compare-${run.id}`} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: spacing.md, borderTopWidth: 1, borderTopColor: colors.border, gap: spacing.sm },
  link: { width: '100%' },
  body: { gap: spacing.xs },
  top: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  grow: { flex: 1 },
  facts: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.xxs, alignItems: 'center' },
  select: { flexDirection: 'row' },
});
