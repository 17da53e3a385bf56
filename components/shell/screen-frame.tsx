import type { ReactNode } from 'react';
import { RefreshControl, ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { AccountMenu } from '@/components/auth/account-menu';
import { colors, layout, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';
import { BackLink, type BackTarget } from './back-link';
import { useDocumentTitle } from './document-title';
import { BrandMark } from './brand-mark';
import { useIsWide } from './use-is-wide';

export type ScreenFrameProps = {
  title: string;
  subtitle?: string;
  /** Shown at the right of the title, e.g. a refresh button. */
  accessory?: ReactNode;
  /** The page's name in the browser tab when the title is too long or too vague for it ("Run 12"); defaults to `title`. */
  tabTitle?: string;
  /** A link up to the parent page, above the title. */
  back?: BackTarget;
  refreshing?: boolean;
  onRefresh?: () => void;
  children: ReactNode;
};

/**
 * A top-level screen: on a phone a slim brand bar, then a scrolling column
 * with the title; on a wide screen the rail carries the brand instead.
 */
export function ScreenFrame(props: ScreenFrameProps) {
  const { title, subtitle, accessory, back, refreshing = false, onRefresh, children, tabTitle } = props;
  useDocumentTitle(tabTitle ?? title);
  const wide = useIsWide();
  const insets = useSafeAreaInsets();
  return (
    <View style={styles.root}>
      {wide ? null : (
        <View style={[styles.appBar, { paddingTop: insets.top + spacing.sm }]}>
          <BrandMark />
          <AccountMenu />
        </View>
      )}
      <ScrollView
        style={styles.scroll}
        contentContainerStyle={wide ? styles.contentWide : styles.content}
        refreshControl={
          onRefresh ? <RefreshControl refreshing={refreshing} onRefresh={onRefresh} /> : undefined
        }
      >
        <View style={styles.column}>
          {back ? <BackLink {...back} /> : null}
          <View style={styles.header}>
            <View style={styles.headings}>
              <AppText variant="title" role="heading" aria-level={1}>
                {title}
              </AppText>
              {subtitle ? <AppText tone="muted">{subtitle}</AppText> : null}
            </View>
            {accessory}
          </View>
          {children}
        </View>
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.background },
  appBar: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    backgroundColor: colors.chrome,
    paddingHorizontal: spacing.lg,
    paddingBottom: spacing.sm,
  },
  scroll: { flex: 1 },
  content: { padding: spacing.lg, paddingBottom: spacing.xxl },
  contentWide: { paddingHorizontal: spacing.xxl, paddingVertical: spacing.xxl },
  column: { width: '100%', maxWidth: layout.contentMaxWidth, alignSelf: 'center', gap: spacing.lg },
  header: { flexDirection: 'row', alignItems: 'flex-end', gap: spacing.lg },
  headings: { flex: 1, gap: spacing.xxs },
});
