import { StyleSheet, View } from 'react-native';
import type { ModuleDesign } from '@/shared/api/modules';
import { useModules } from '@/components/api/modules';
import { ReadOnlyNotice } from '@/components/auth/read-only-notice';
import { withUnit } from '@/components/format/number';
import { quantity } from '@/components/screens/runs/run-format';
import { spacing } from '@/components/theme';
import { FactList, type Fact } from '@/components/ui/fact-list';
import { Section } from '@/components/ui/form-section';
import { moduleFieldInfo } from './module-fields';
import { legSourceWords } from './module-words';

/** The saved settings as text: what a role that cannot save sees instead of the form. */
export function moduleFacts(m: ModuleDesign, names: { p: string | null; n: string | null } | undefined): Fact[] {
  const rows: Fact[] = [
    { key: 'name', label: 'Name', value: m.name },
    { key: 'p', label: 'p-type leg', value: legSourceWords(m.input.p, names?.p ?? null) },
    { key: 'n', label: 'n-type leg', value: legSourceWords(m.input.n, names?.n ?? null) },
  ];
  for (const [key, label, unit] of moduleFieldInfo) {
    const value = m.input[key];
    if (value === undefined) continue;
    rows.push({ key, label: label.replace(/ \(optional\)$/, ''), value: unit === 'couples' ? withUnit(String(value), unit) : quantity(value, unit === '–' ? '' : unit) });
  }
  return rows;
}

/** The module read, not edited, with a short notice why there is no form. */
export function ModuleReadOnly({ module: m }: { module: ModuleDesign }) {
  const list = useModules();
  // Until the list answers, the sources are "…", not "a deleted run".
  const names = list.isPending ? { p: '…', n: '…' } : list.data?.modules.find((s) => s.id === m.id)?.sourceNames;
  return (
    <View style={styles.wrap}>
      <ReadOnlyNotice what="Saving modules" />
      <Section title="Couple and module">
        <FactList facts={moduleFacts(m, names)} label="Module" testID="module-facts" />
      </Section>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.lg },
});
