import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { FamilySummary } from '@/shared/api/families';
import { familyExportUrl } from '@/components/api/families';
import { useSetArchived } from '@/components/api/family-mutations';
import { useRole } from '@/components/auth/session';
import { spacing } from '@/components/theme';
import { Button } from '@/components/ui/button';
import { DownloadLink } from '@/components/ui/download-link';
import { LinkButton } from '@/components/ui/link-button';
import { Notice } from '@/components/ui/notice';
import { AppText } from '@/components/ui/text';
import { DuplicatePanel } from './duplicate-panel';

export type FamilyActionsProps = {
  family: FamilySummary;
  /** The version on screen: exports are of this version. */
  version: number;
};

/** Edit, duplicate, archive or restore, and download. */
export function FamilyActions({ family, version }: FamilyActionsProps) {
  const [duplicating, setDuplicating] = useState(false);
  const archive = useSetArchived();
  const { can } = useRole();
  const mayWrite = can('families.write');
  const toggleArchive = () => archive.mutate({ id: family.id, archived: !family.archived });
  const exportVersion = version === family.version ? undefined : version;
  return (
    <View style={styles.actions}>
      {mayWrite ? (
        <View style={styles.row}>
          {family.archived ? null : <LinkButton label="Edit" href={`/materials/${family.id}/edit`} testID="edit-family" />}
          <Button label="Duplicate" variant="quiet" onPress={() => setDuplicating(true)} disabled={duplicating} />
          <Button
            label={archive.isPending ? 'Saving…' : family.archived ? 'Restore from archive' : 'Archive'}
            variant="quiet"
            onPress={toggleArchive}
            disabled={archive.isPending}
          />
        </View>
      ) : null}
      {family.archived && mayWrite ? (
        <AppText variant="caption" tone="muted">
          Archived: hidden from the active list and from new designs. Restore it to edit.
        </AppText>
      ) : null}
      {archive.error ? (
        <Notice tone="danger" title="Not changed">
          <AppText>{archive.error.message}</AppText>
        </Notice>
      ) : null}
      {duplicating ? (
        <DuplicatePanel familyId={family.id} familyName={family.name} onClose={() => setDuplicating(false)} />
      ) : null}
      <View style={styles.row}>
        <DownloadLink label="Export CSV" url={familyExportUrl(family.id, 'csv', exportVersion)} testID="export-csv" />
        <DownloadLink label="Export JSON" url={familyExportUrl(family.id, 'json', exportVersion)} testID="export-json" />
      </View>
      <AppText variant="caption" tone="muted">
        {`Exports are of version ${version}. CSV: doping, temperature, S, σ, κ with units in the header (models sampled on a grid). JSON: the material object the engine reads.`}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  actions: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
