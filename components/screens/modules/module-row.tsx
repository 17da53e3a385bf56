import { Pressable, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import type { ModuleSummary } from '@/shared/api/modules';
import { formatDateTime } from '@/components/format/date';
import { colors, spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { legSourceWords, moduleSettingsWords } from './module-words';

type Props = { module: ModuleSummary; selection?: { selected: boolean; onToggle: () => void } };

/** One saved module in a list: its settings and both legs' sources in words; opens the module. */
export function ModuleRow({ module: m, selection }: Props) {
  return (
    <View style={styles.row} testID={`module-row-${m.id}`}>
      <Link href={`/modules/${m.id}`} asChild>
        <Pressable style={styles.link} aria-label={`Module ${m.name}`}>
          <View style={styles.top}>
            <AppText variant="bodyStrong" style={styles.grow} numberOfLines={2}>
              {m.name}
            </AppText>
            <Glyph name="chevron-right" color={colors.textFaint} />
          </View>
          <AppText variant="mono">{moduleSettingsWords(m)}</AppText>
          <AppText variant="caption">{`p: ${legSourceWords(m.input.p, m.sourceNames.p)}`}</AppText>
          <AppText variant="caption">{`n: ${legSourceWords(m.input.n, m.sourceNames.n)}`}</AppText>
          <AppText variant="caption" tone="muted">{`${formatDateTime(m.updatedAt)} · ${m.createdBy}`}</AppText>
        </Pressable>
      </Link>
      {selection ? (
        <View style={styles.select}>
          <Chip label="Compare" selected={selection.selected} onPress={selection.onToggle} testID={`compare-module-${m.id}`} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: spacing.md, borderTopWidth: 1, borderTopColor: colors.border, gap: spacing.sm },
  link: { width: '100%', gap: spacing.xxs },
  top: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  grow: { flex: 1 },
  select: { flexDirection: 'row' },
});
