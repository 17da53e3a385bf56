import { StyleSheet, View } from 'react-native';
import type { FamilySummary } from '@/shared/api/families';
import { formatDay } from '@/components/format/date';
import { colors, radii, spacing } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { AppText } from '@/components/ui/text';
import { CarrierTag } from './carrier-tag';
import { kindLabels } from './family-labels';

/** One material family: what it is, which carrier, and where it came from. */
export function FamilyCard({ family }: { family: FamilySummary }) {
  return (
    <View style={styles.card} testID={`family-card-${family.id}`} role="article" aria-label={family.name}>
      <View style={styles.tags}>
        <Badge label={kindLabels[family.kind]} tone="cold" />
        {family.isDemo ? <Badge label="Demo data" tone="heat" /> : null}
      </View>
      <AppText variant="heading">{family.name}</AppText>
      <CarrierTag carrier={family.carrier} />
      {family.summary ? <AppText tone="muted">{family.summary}</AppText> : null}
      <View style={styles.provenance}>
        <ProvenanceLine term="Source" value={family.source} />
        <ProvenanceLine
          term="Added"
          value={`${formatDay(family.createdAt)} by ${family.createdBy}`}
        />
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
  card: {
    flex: 1,
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: spacing.lg,
    gap: spacing.sm,
  },
  tags: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, marginBottom: spacing.xs },
  provenance: {
    marginTop: 'auto',
    paddingTop: spacing.sm,
    borderTopWidth: 1,
    borderTopColor: colors.border,
    gap: spacing.xs,
  },
  line: { flexDirection: 'row', gap: spacing.sm, alignItems: 'baseline' },
  term: { width: 56 },
  value: { flex: 1 },
});
