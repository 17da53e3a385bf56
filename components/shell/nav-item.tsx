import { Pressable, type PressableStateCallbackType, StyleSheet, View } from 'react-native';
import { useTabTrigger } from 'expo-router/ui';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { TabIcon } from './tab-icon';
import type { TabSpec } from './tabs';

/** react-native-web also reports hover, which React Native's types omit. */
type WebPressState = PressableStateCallbackType & { hovered?: boolean };

export type NavItemProps = { tab: TabSpec; placement: 'rail' | 'bar' };

/**
 * One destination in the side rail (icon beside label) or the bottom bar
 * (icon above label). On the web it is a real link, so it can be opened in
 * a new tab; a plain click switches tabs in place.
 */
export function NavItem({ tab, placement }: NavItemProps) {
  const { trigger, triggerProps } = useTabTrigger({ name: tab.name });
  const focused = triggerProps.isFocused;
  const inRail = placement === 'rail';
  // `href` is understood by react-native-web (renders an <a>), not typed by RN.
  const webLink = { href: trigger?.resolvedHref };
  return (
    <Pressable
      {...webLink}
      role="tab"
      aria-selected={focused}
      accessibilityLabel={tab.label}
      onPress={triggerProps.onPress}
      onLongPress={triggerProps.onLongPress}
      style={({ pressed, hovered }: WebPressState) => [
        inRail ? styles.railItem : styles.barItem,
        (hovered || pressed) && styles.hovered,
        focused && styles.focused,
      ]}
    >
      {inRail ? <View style={[styles.marker, focused && styles.markerOn]} /> : null}
      <TabIcon name={tab.icon} color={focused ? colors.coldBright : colors.chromeText} />
      <AppText
        variant={inRail ? 'bodyStrong' : 'caption'}
        style={focused ? styles.labelOn : styles.label}
      >
        {tab.label}
      </AppText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  railItem: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.md,
    minHeight: 44,
    paddingRight: spacing.md,
    borderRadius: radii.md,
  },
  barItem: {
    flex: 1,
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.xxs,
    minHeight: 52,
    marginHorizontal: spacing.xs,
    borderRadius: radii.md,
  },
  hovered: { backgroundColor: colors.chromeBorder },
  focused: { backgroundColor: colors.chromeRaised },
  marker: { width: 3, alignSelf: 'stretch', borderRadius: 2, marginVertical: spacing.sm },
  markerOn: { backgroundColor: colors.heatBright },
  label: { color: colors.chromeText },
  labelOn: { color: colors.chromeTextActive },
});
