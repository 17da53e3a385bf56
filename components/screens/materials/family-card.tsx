import { Pressable, type PressableStateCallbackType, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import type { FamilySummary } from '@/shared/api/families';
import { formatDay } from '@/components/format/date';
import { colors, radii, spacing } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';
import { CarrierTag } from './carrier-tag';
import { kindLabels } from './family-labels';

/** react-native-web also reports hover, which React Native's types omit. */
type WebPressState = PressableStateCallbackType & { hovered?: boolean };

/** One material family: what it is, which carrier, where it came from; opens its page. */
export function FamilyCard({ family }: { family: FamilySummary }) {
  return (
    <Link href={`/materials/${family.id}`} asChild>
      {/* Link merges its own style into the child's, so the child's style is static and the
          hover outline lives on an inner view. */}
      <Pressable testID={`family-card-${family.id}`} aria-label={family.name} style={styles.pressable}>
        {({ pressed, hovered }: WebPressState) => <CardBody family={family} highlighted={pressed || hovered === true} />}
      </Pressable>
    </Link>
  );
}

function CardBody({ family, highlighted }: { family: FamilySummary; highlighted: boolean }) {
  return (
    <View style={[styles.card, highlighted && styles.hovered]}>
      <View style={styles.tags}>
        <Badge label={kindLabels[family.kind]} tone="cold" />
        <Badge label={`v${family.version}`} />
        {family.archived ? <Badge label="Archived" /> : null}
        {family.isDemo ? <Badge label="Demo data" tone="heat" /> : null}
      </View>
      <View style={styles.titleRow}>
        <AppText variant="heading" style={styles.title}>
          {family.name}
        </AppText>
        <Glyph name="chevron-right" color={colors.textFaint} />
      </View>
      <CarrierTag carrier={family.carrier} />
      {family.summary ? (
        <AppText tone="muted" numberOfLines={3}>
          {family.summary}
        </AppText>
      ) : null}
      <View style={styles.provenance}>
        <ProvenanceLine term="Source" value={family.source} />
        <ProvenanceLine term="Added" value={`${formatDay(family.createdAt)} by ${family.createdBy}`} />
        {family.version > 1 ? (
          <ProvenanceLine term="Changed" value={`${formatDay(family.updatedAt)} · version ${family.version}`} />
        ) : null}
      </View>
    </View>
  );
}

function ProvenanceLine({ term, value }: { term: string; value: string }) {
  return (
    <View style={styles.line}>
      <AppText variant="monoStrong" tone="faint" style={styles.term}>
        {term.toUpperCase()}
      </AppText>
      <AppText variant="caption" tone="muted" style={styles.value}>
        {value}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  pressable: { flex: 1 },
  card: {
    flex: 1,
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: spacing.lg,
    gap: spacing.sm,
  },
  hovered: { borderColor: colors.primary },
  tags: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, marginBottom: spacing.xs },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  title: { flex: 1 },
  provenance: {
    marginTop: 'auto',
    paddingTop: spacing.sm,
    borderTopWidth: 1,
    borderTopColor: colors.border,
    gap: spacing.xs,
  },
  line: { flexDirection: 'row', gap: spacing.sm, alignItems: 'baseline' },
  term: { width: 64 },
  value: { flex: 1 },
});
