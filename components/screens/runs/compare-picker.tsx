import { StyleSheet, View } from 'react-native';
import type { ModuleSummary } from '@/shared/api/modules';
import type { RunSummary } from '@/shared/api/runs';
import { hasResult } from '@/components/api/runs';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { Section } from '@/components/ui/form-section';
import { AppText } from '@/components/ui/text';
import { maxCompared, toggled } from './compare-model';
import { runChoiceLabel } from './run-format';

/** How many recent finished runs the picker offers besides those already chosen. */
const offeredRuns = 8;

type Props = {
  runs: readonly RunSummary[];
  modules: readonly ModuleSummary[];
  runIds: readonly string[];
  moduleIds: readonly string[];
  onChange: (next: { runIds: string[]; moduleIds: string[] }) => void;
};

/** What is in the comparison: recent finished runs and saved modules, up to `maxCompared` of each. */
export function ComparePicker({ runs, modules, runIds, moduleIds, onChange }: Props) {
  // Leg runs: a cascade or couple has no leg profile to overlay (cascades compare on /stages/compare).
  const finished = runs.filter((r) => r.kind === 'leg' && hasResult(r));
  const offered = [...finished.filter((r) => runIds.includes(r.id)), ...finished.filter((r) => !runIds.includes(r.id)).slice(0, offeredRuns)];
  return (
    <Section title="In this comparison" hint={`Up to ${maxCompared} runs and ${maxCompared} modules; at least two things in all.`}>
      <AppText variant="label">Runs</AppText>
      <View style={styles.chips} testID="compare-pick-runs">
        {offered.length === 0 ? <AppText tone="muted">No finished runs yet.</AppText> : null}
        {offered.map((r) => (
          <Chip key={r.id} label={runChoiceLabel(r)} selected={runIds.includes(r.id)} onPress={() => onChange({ runIds: toggled(runIds, r.id), moduleIds: [...moduleIds] })} testID={`pick-run-${r.id}`} />
        ))}
      </View>
      <AppText variant="label">Modules</AppText>
      <View style={styles.chips} testID="compare-pick-modules">
        {modules.length === 0 ? <AppText tone="muted">No saved modules yet: build one from a run's operating curves.</AppText> : null}
        {modules.map((m) => (
          <Chip key={m.id} label={`${m.name} · N = ${m.input.couples ?? 1}`} selected={moduleIds.includes(m.id)} onPress={() => onChange({ runIds: [...runIds], moduleIds: toggled(moduleIds, m.id) })} testID={`pick-module-${m.id}`} />
        ))}
      </View>
    </Section>
  );
}

const styles = StyleSheet.create({
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
