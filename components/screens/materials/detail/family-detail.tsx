import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import type { FamilyDetailResponse } from '@/shared/api/families';
import type { BackTarget } from '@/components/shell/back-link';
import { ScreenFrame } from '@/components/shell/screen-frame';
import { colors, spacing, type as typeScale } from '@/components/theme';
import { BlockHeading } from '@/components/ui/block-heading';
import { Columns } from '@/components/ui/columns';
import { Section } from '@/components/ui/form-section';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { FamilyPlots } from '../plots/family-plots';
import { FamilyActions } from './family-actions';
import { FamilyOverview } from './family-overview';
import { ParameterTable } from './parameter-table';
import { VersionHistory } from './version-history';

function OlderVersionNotice({ detail }: { detail: FamilyDetailResponse }) {
  return (
    <Notice tone="info" title={`Showing version ${detail.current.version} of ${detail.family.version}`} testID="older-version">
      <AppText>Parameters, plots and exports below are of this older version. Edits always start from the current version.</AppText>
      <Link href={`/materials/${detail.family.id}`} style={styles.link}>
        Show the current version
      </Link>
    </Notice>
  );
}

const plotsHint = {
  band: 'Computed in your browser from the band model. Choose the temperatures to compare.',
  table: 'Measured points and the interpolation between them, computed in your browser.',
  constant: undefined,
} as const;

/** Everything about one family: what it is, its numbers, plots, versions, actions. */
export function FamilyDetail({ detail, back }: { detail: FamilyDetailResponse; back: BackTarget }) {
  const { family, current } = detail;
  const older = current.version !== family.version;
  return (
    <ScreenFrame title={family.name} back={back}>
      {older ? <OlderVersionNotice detail={detail} /> : null}
      <Section title="About this family">
        <FamilyOverview family={family} version={current} />
        <FamilyActions family={family} version={current.version} />
      </Section>
      <Columns>
        <Section title="Parameters" hint="In the units of the trade.">
          <ParameterTable definition={current.definition} />
        </Section>
        <Section title="Versions" hint="A version a run has used is locked; editing adds a new one." testID="versions">
          <VersionHistory familyId={family.id} versions={detail.versions} latest={family.version} viewing={current.version} />
        </Section>
      </Columns>
      <View style={styles.plots} testID="family-plots">
        <BlockHeading title="Plots" hint={plotsHint[current.definition.kind]} />
        <FamilyPlots key={`${family.id}-${current.version}`} definition={current.definition} />
      </View>
    </ScreenFrame>
  );
}

const styles = StyleSheet.create({
  plots: { gap: spacing.md },
  link: { ...typeScale.label, color: colors.primary, textDecorationLine: 'underline' },
});
