import { StyleSheet, View } from 'react-native';
import { Link, usePathname } from 'expo-router';
import { useDocumentTitle } from '@/components/shell/document-title';
import { colors, spacing, type as typeScale } from '@/components/theme';
import { GradedStrip } from '@/components/ui/graded-strip';
import { AppText } from '@/components/ui/text';

/** Any address the app does not know. */
export function NotFoundScreen() {
  const pathname = usePathname();
  useDocumentTitle('Nothing here', null);
  return (
    <View style={styles.root}>
      <View style={styles.box}>
        <GradedStrip zones={8} thickness={4} />
        <AppText variant="title" role="heading" aria-level={1}>
          Nothing here
        </AppText>
        <AppText tone="muted">
          There is no page at <AppText variant="mono">{pathname}</AppText>.
        </AppText>
        <Link href="/" style={styles.link}>
          Go to Materials
        </Link>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: {
    flex: 1,
    alignItems: 'center',
    justifyContent: 'center',
    backgroundColor: colors.background,
    padding: spacing.xl,
  },
  box: { width: '100%', maxWidth: 420, gap: spacing.md },
  link: { ...typeScale.bodyStrong, color: colors.primary, textDecorationLine: 'underline' },
});
