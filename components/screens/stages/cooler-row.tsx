import { Pressable, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import type { CoolerSummary } from '@/shared/api/coolers';
import { formatDateTime } from '@/components/format/date';
import { RunStateBadge } from '@/components/screens/runs/run-state-badge';
import { colors, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { coolerKindLabel, coolerSettingsWords, latestRunWords } from './cooler-format';
import { StagesMark } from './stages-mark';

/** One saved cascade or matched couple: its kind, settings in words and its latest run; opens the cooler. */
export function CoolerRow({ cooler: c }: { cooler: CoolerSummary }) {
  const latest = c.latestRun;
  return (
    <View style={styles.row} testID={`cooler-row-${c.id}`}>
      <Link href={`/stages/${c.id}`} asChild>
        <Pressable style={styles.link} aria-label={`${coolerKindLabel[c.kind]} ${c.name}`}>
          <View style={styles.top}>
            {c.kind === 'cascade' ? <StagesMark size={28} /> : null}
            <View style={styles.grow}>
              <AppText variant="caption" tone="muted">{coolerKindLabel[c.kind]}</AppText>
              <AppText variant="bodyStrong" numberOfLines={2}>{c.name}</AppText>
            </View>
            <Glyph name="chevron-right" color={colors.textFaint} />
          </View>
          <AppText variant="mono">{coolerSettingsWords(c.input)}</AppText>
          <View style={styles.latest} testID={`cooler-latest-${c.id}`}>
            {latest ? (
              <>
                <RunStateBadge state={latest.state} />
                <AppText variant="mono">{latestRunWords(latest)}</AppText>
              </>
            ) : (
              <AppText variant="caption" tone="muted">Not run yet</AppText>
            )}
          </View>
          <AppText variant="caption" tone="muted">{`${formatDateTime(c.updatedAt)} · ${c.createdBy}`}</AppText>
        </Pressable>
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { paddingVertical: spacing.md, borderTopWidth: 1, borderTopColor: colors.border },
  link: { width: '100%', gap: spacing.xs },
  top: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  grow: { flex: 1 },
  latest: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', columnGap: spacing.md, rowGap: spacing.xxs },
});
