import { Pressable, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { StagesMark } from './stages-mark';

/** The way from Runs to the Stages page: a card of its own look, not one more button among the filters. */
export function StagesEntry() {
  return (
    <Link href="/stages" asChild>
      <Pressable style={styles.card} aria-label="Stages: cascades and matched couples" testID="stages-link">
        <StagesMark />
        <View style={styles.words}>
          <AppText variant="bodyStrong">Stages</AppText>
          <AppText variant="caption" tone="muted">Cascades and matched couples: stack stages to reach the detector’s temperature.</AppText>
        </View>
        <Glyph name="chevron-right" color={colors.textFaint} />
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, padding: spacing.md, borderRadius: radii.lg, borderWidth: 1, borderColor: colors.border, backgroundColor: colors.surface },
  words: { flex: 1, gap: spacing.xxs },
});
