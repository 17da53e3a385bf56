import { Pressable, type PressableStateCallbackType, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import type { Design } from '@/shared/api/designs';
import { formatDay } from '@/components/format/date';
import { colors, radii, spacing } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { objectiveInfo, quantity } from '../runs/run-format';

/** react-native-web also reports hover, which React Native's types omit. */
type WebPressState = PressableStateCallbackType & { hovered?: boolean };

/** "L 1.5 mm · A 1 mm² · Th 300 K": the leg at a glance, in trade units. */
export function geometryLine(d: Pick<Design, 'lengthMm' | 'areaMm2' | 'hotSide'>): string {
  return `L ${quantity(d.lengthMm, 'mm')} · A ${quantity(d.areaMm2, 'mm²')} · Th ${quantity(d.hotSide, 'K')}`;
}

/** One design in the list; opens its page. */
export function DesignCard({ design }: { design: Design }) {
  return (
    <Link href={`/designs/${design.id}`} asChild>
      <Pressable testID={`design-card-${design.id}`} aria-label={design.name} style={styles.pressable}>
        {({ pressed, hovered }: WebPressState) => <CardBody design={design} highlighted={pressed || hovered === true} />}
      </Pressable>
    </Link>
  );
}

function CardBody({ design, highlighted }: { design: Design; highlighted: boolean }) {
  return (
    <View style={[styles.card, highlighted && styles.hovered]}>
      <View style={styles.titleRow}>
        <AppText variant="heading" style={styles.title}>
          {design.name}
        </AppText>
        {design.following ? <Badge label="Following" tone="cold" /> : null}
        <Glyph name="chevron-right" color={colors.textFaint} />
      </View>
      <AppText tone="muted">{`${design.familyName} · v${design.familyVersion}${design.carrier ? ` · ${design.carrier}-type` : ''}`}</AppText>
      <View style={styles.facts}>
        <AppText variant="label">{objectiveInfo[design.objective].goal}</AppText>
        <AppText variant="mono" tone="muted">
          {geometryLine(design)}
        </AppText>
      </View>
      <AppText variant="caption" tone="faint">{`Changed ${formatDay(design.updatedAt)} · created by ${design.createdBy}`}</AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  pressable: { width: '100%' },
  card: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: spacing.lg,
    gap: spacing.xs,
  },
  hovered: { borderColor: colors.primary },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  title: { flex: 1 },
  facts: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.lg, rowGap: spacing.xxs, alignItems: 'baseline' },
});
