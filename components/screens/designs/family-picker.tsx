import { StyleSheet, View } from 'react-native';
import type { FamilySummary } from '@/shared/api/families';
import { useFamilies } from '@/components/api/families';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { ErrorLine } from '@/components/ui/field-parts';
import { AppText } from '@/components/ui/text';
import { designFieldInfo } from './design-fields';
import { FamilyChoiceChips } from './family-choice-chips';

export type FamilyPickerProps = {
  familyId: string;
  /** The version the design keeps (editing), or undefined for "current when saved". */
  familyVersion?: number;
  error?: string;
  onChange: (familyId: string, familyVersion?: number) => void;
};

const carrierWord = (f: FamilySummary) => (f.carrier === 'p' ? 'p-type' : f.carrier === 'n' ? 'n-type' : 'carrier not fixed');

/** Doping-controlled families only: constant properties have nothing to grade. */
const gradable = (f: FamilySummary) => f.kind !== 'constant';

function VersionLine({ family, familyVersion, onChange }: { family: FamilySummary; familyVersion?: number; onChange: FamilyPickerProps['onChange'] }) {
  const kept = familyVersion ?? family.version;
  const newer = familyVersion !== undefined && familyVersion < family.version;
  return (
    <View style={styles.versionRow}>
      <AppText variant="caption" tone="muted">
        {`${carrierWord(family)} · version ${kept}${newer ? ` (version ${family.version} is newer)` : ' (current)'}`}
      </AppText>
      {newer ? <Chip label={`Use version ${family.version}`} selected={false} onPress={() => onChange(family.id, undefined)} /> : null}
    </View>
  );
}

/** One radio chip per gradable family of the team, with its carrier and version in words. */
export function FamilyPicker({ familyId, familyVersion, error, onChange }: FamilyPickerProps) {
  const query = useFamilies('active');
  const chosen = (query.data?.families ?? []).find((f) => f.id === familyId);
  const info = designFieldInfo.familyId;
  return (
    <View style={styles.field}>
      <AppText variant="label" nativeID="familyId-label">
        {info.label}
        <AppText variant="label" tone="muted">
          {' · required'}
        </AppText>
      </AppText>
      <AppText variant="caption" tone="muted">
        {info.help}
      </AppText>
      {query.isPending ? <AppText tone="muted">Loading the team’s families…</AppText> : null}
      {query.isError ? <AppText tone="danger">{`Could not load families: ${query.error.message}`}</AppText> : null}
      <View testID="family-picker">
        <FamilyChoiceChips id="design-family" selectedId={familyId} onPick={(f) => onChange(f.id)} fits={gradable} chipLabel={(f) => `${f.name} (${f.carrier ?? '–'})`} ariaLabel={info.label} />
      </View>
      {chosen ? <VersionLine family={chosen} familyVersion={familyVersion} onChange={onChange} /> : null}
      <ErrorLine message={error} testID="error-familyId" />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  versionRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.sm },
});
