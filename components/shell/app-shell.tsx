import { StyleSheet, View } from 'react-native';
import { TabSlot, useTabsWithTriggers } from 'expo-router/ui';
import { colors } from '@/components/theme';
import { BottomTabs } from './bottom-tabs';
import { RoleGate } from './role-gate';
import { SideRail } from './side-rail';
import { tabTriggers } from './tabs';
import { useIsWide } from './use-is-wide';

/**
 * The tab navigator with our own chrome: bottom tabs on a phone, a side
 * rail from `layout.wideMinWidth` up. Both render the same `tabs` list.
 */
export function AppShell() {
  const { NavigationContent } = useTabsWithTriggers({ triggers: tabTriggers });
  const wide = useIsWide();
  return (
    <NavigationContent>
      <View style={wide ? styles.wide : styles.phone}>
        {wide ? <SideRail /> : null}
        <View style={styles.content}>
          <RoleGate layer="tabs">
            <TabSlot />
          </RoleGate>
        </View>
        {wide ? null : <BottomTabs />}
      </View>
    </NavigationContent>
  );
}

const styles = StyleSheet.create({
  phone: { flex: 1, flexDirection: 'column', backgroundColor: colors.background },
  wide: { flex: 1, flexDirection: 'row', backgroundColor: colors.background },
  content: { flex: 1 },
});
