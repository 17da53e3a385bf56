import { StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { colors, spacing } from '@/components/theme';
import { GradedStrip } from '@/components/ui/graded-strip';
import { NavItem } from './nav-item';
import { useVisibleTabs } from './use-visible-tabs';

/** Phone navigation: a bottom bar under a cold-to-hot edge. */
export function BottomTabs() {
  const insets = useSafeAreaInsets();
  const tabs = useVisibleTabs();
  return (
    <View style={styles.bar} testID="nav-bottom-tabs">
      <GradedStrip direction="row" zones={12} thickness={3} />
      <View
        role="tablist"
        aria-label="Main"
        style={[styles.items, { paddingBottom: Math.max(insets.bottom, spacing.sm) }]}
      >
        {tabs.map((tab) => (
          <NavItem key={tab.name} tab={tab} placement="bar" />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { backgroundColor: colors.chrome },
  items: { flexDirection: 'row', paddingTop: spacing.sm, paddingHorizontal: spacing.xs },
});
