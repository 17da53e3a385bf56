import { StyleSheet, View } from 'react-native';
import type { FamilySummary, FamilyVersion } from '@/shared/api/families';
import { formatDateTime } from '@/components/format/date';
import { colors, spacing } from '@/components/theme';
import { Badge } from '@/components/ui/badge';
import { AppText } from '@/components/ui/text';
import { CarrierTag } from '../carrier-tag';
import { kindLabels } from '../family-labels';

function Fact({ term, value }: { term: string; value: string }) {
  return (
    <View style={styles.fact} role="listitem">
      <AppText variant="monoStrong" tone="faint" style={styles.term}>
        {term.toUpperCase()}
      </AppText>
      <AppText style={styles.value}>{value}</AppText>
    </View>
  );
}

export type FamilyOverviewProps = { family: FamilySummary; version: FamilyVersion };

/** Kind, carrier, version and provenance: who made it, when, from what. */
export function FamilyOverview({ family, version }: FamilyOverviewProps) {
  return (
    <View style={styles.overview} testID="family-overview">
      <View style={styles.tags}>
        <Badge label={kindLabels[family.kind]} tone="cold" />
        <Badge label={`Version ${version.version} of ${family.version}`} />
        {family.archived ? <Badge label="Archived" /> : null}
        {family.isDemo ? <Badge label="Demo data" tone="heat" /> : null}
      </View>
      <CarrierTag carrier={family.carrier} />
      {version.summary ? <AppText>{version.summary}</AppText> : null}
      <View style={styles.facts} role="list" aria-label="Provenance">
        <Fact term="Source" value={version.source} />
        <Fact term="Created" value={`${formatDateTime(family.createdAt)} by ${family.createdBy}`} />
        <Fact term={`Version ${version.version}`} value={`${formatDateTime(version.createdAt)} by ${version.createdBy}`} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  overview: { gap: spacing.md },
  tags: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  facts: { gap: spacing.xs, paddingTop: spacing.sm, borderTopWidth: 1, borderTopColor: colors.border },
  fact: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.xxs },
  term: { width: 96, paddingTop: 3 },
  value: { flex: 1, minWidth: 200 },
});
