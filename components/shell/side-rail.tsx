import { StyleSheet, View } from 'react-native';
import { AccountPanel } from '@/components/auth/account-panel';
import { colors, layout, spacing } from '@/components/theme';
import { GradedStrip } from '@/components/ui/graded-strip';
import { AppText } from '@/components/ui/text';
import { BrandMark, brandLegWidth } from './brand-mark';
import { NavItem } from './nav-item';
import { useVisibleTabs } from './use-visible-tabs';

/** Wide-screen navigation: a night-slate rail whose edge runs cold to hot; who is signed in at its foot. */
export function SideRail() {
  const tabs = useVisibleTabs();
  return (
    <View style={styles.rail} testID="nav-side-rail">
      <View style={styles.inner}>
        <View style={styles.brand}>
          <BrandMark />
          <AppText variant="caption" style={styles.tagline}>
            Graded-leg cooler design
          </AppText>
        </View>
        <View role="tablist" aria-label="Main" style={styles.items}>
          {tabs.map((tab) => (
            <NavItem key={tab.name} tab={tab} placement="rail" />
          ))}
        </View>
        <View style={styles.spacer} />
        <AccountPanel />
      </View>
      <GradedStrip direction="column" zones={12} thickness={3} />
    </View>
  );
}

const styles = StyleSheet.create({
  rail: {
    width: layout.railWidth,
    flexDirection: 'row',
    backgroundColor: colors.chrome,
  },
  inner: { flex: 1, paddingVertical: spacing.xl, paddingHorizontal: spacing.md, gap: spacing.xl },
  brand: { paddingHorizontal: spacing.sm, gap: spacing.xs },
  // Lines up with the wordmark, after the little leg and the gap.
  tagline: { color: colors.chromeText, marginLeft: brandLegWidth + spacing.sm },
  items: { gap: spacing.xs },
  spacer: { flex: 1 },
});
