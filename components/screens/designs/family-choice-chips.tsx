import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import type { FamilySummary } from '@/shared/api/families';
import { useDesigns } from '@/components/api/designs';
import { useFamilies } from '@/components/api/families';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { AppText } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { byRecentUse, familiesOffered, familyChoices } from './family-choice-model';

export type FamilyChoiceChipsProps = {
  /** Prefix of the test ids and the search field's id ("design-family", "p-family"). */
  id: string;
  selectedId: string;
  onPick: (family: FamilySummary) => void;
  /** Which families fit this picker (gradable, the leg's carrier). */
  fits: (family: FamilySummary) => boolean;
  chipLabel: (family: FamilySummary) => string;
  chipTestID?: (family: FamilySummary) => string;
  ariaLabel: string;
};

/**
 * Families as radio chips: active ones, most recently used first, a handful
 * at a time with a search once the team has more; archived ones only on
 * request. Leftover test families stay out of the way without being lost.
 */
export function FamilyChoiceChips({ id, selectedId, onPick, fits, chipLabel, chipTestID, ariaLabel }: FamilyChoiceChipsProps) {
  const [search, setSearch] = useState('');
  const [showAll, setShowAll] = useState(false);
  const [showArchived, setShowArchived] = useState(false);
  const active = useFamilies('active');
  const archived = useFamilies('archived', { enabled: showArchived });
  const designs = useDesigns();
  const all = [...(active.data?.families ?? []), ...(showArchived ? archived.data?.families ?? [] : [])].filter(fits);
  const ordered = byRecentUse(all, designs.data?.designs ?? []);
  const { shown, more } = familyChoices(ordered, { search, showAll, showArchived, chosenId: selectedId });
  const activeCount = all.filter((f) => !f.archived).length;
  return (
    <View style={styles.wrap}>
      {activeCount > familiesOffered || search !== '' ? (
        <TextField id={`${id}-search`} label="Find a family" placeholder="Name, summary or source" value={search} onChangeText={setSearch} />
      ) : null}
      <View style={styles.chips} role="radiogroup" aria-label={ariaLabel} testID={`${id}-choices`}>
        {shown.map((f) => (
          <Chip key={f.id} role="radio" label={f.archived ? `${chipLabel(f)} · archived` : chipLabel(f)} selected={f.id === selectedId} onPress={() => onPick(f)} testID={chipTestID?.(f)} />
        ))}
      </View>
      {search !== '' && shown.length === 0 ? <AppText tone="muted">{`No family matches “${search.trim()}”.`}</AppText> : null}
      <View style={styles.chips}>
        {more > 0 ? <Chip label={`Show all (${more} more)`} selected={false} onPress={() => setShowAll(true)} testID={`${id}-show-all`} /> : null}
        {showAll && !search ? <Chip label="Show fewer" selected={false} onPress={() => setShowAll(false)} testID={`${id}-show-fewer`} /> : null}
        <Chip label="Show archived" selected={showArchived} onPress={() => setShowArchived(!showArchived)} testID={`${id}-show-archived`} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
