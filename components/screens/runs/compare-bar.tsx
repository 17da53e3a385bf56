import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { spacing } from '@/components/theme';
import { Chip } from '@/components/ui/chip';
import { LinkButton } from '@/components/ui/link-button';
import { AppText } from '@/components/ui/text';
import { toggled } from './compare-model';

/** Ticked ids of a list, at most `maxCompared`, for a comparison. */
export function useCompareSelection() {
  const [selected, setSelected] = useState<string[]>([]);
  return { selected, toggle: (id: string) => setSelected((s) => toggled(s, id)), clear: () => setSelected([]) };
}

type Props = {
  count: number;
  /** What to do, shown while nothing is ticked. */
  hint: string;
  /** The way to the comparison, once enough is ticked. */
  link: { label: string; href: string; testID: string } | null;
  onClear: () => void;
  testID: string;
};

/** Above a list: how many are ticked, the link to compare them, and Clear. */
export function CompareBar({ count, hint, link, onClear, testID }: Props) {
  return (
    <View style={styles.bar} testID={testID}>
      <AppText variant="label">{count === 0 ? hint : `${count} selected`}</AppText>
      {link ? <LinkButton label={link.label} href={link.href} testID={link.testID} /> : null}
      {count > 0 ? <Chip label="Clear" selected={false} onPress={onClear} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: spacing.md, minHeight: 40 },
});
