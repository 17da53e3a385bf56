import { Pressable, StyleSheet } from 'react-native';
import { Link, type Href } from 'expo-router';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from './text';

export type LinkButtonProps = {
  label: string;
  href: Href;
  variant?: 'primary' | 'quiet';
  testID?: string;
};

/** Looks like a button, is a link (an `<a>` on the web, so it opens in a new tab too). */
export function LinkButton({ label, href, variant = 'primary', testID }: LinkButtonProps) {
  const primary = variant === 'primary';
  return (
    <Link href={href} asChild>
      <Pressable testID={testID} style={primary ? linkStyles.primary : linkStyles.quiet}>
        <AppText variant="label" style={primary ? styles.primaryLabel : styles.quietLabel}>
          {label}
        </AppText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  base: {
    alignSelf: 'flex-start',
    borderRadius: radii.md,
    paddingHorizontal: spacing.lg,
    paddingVertical: spacing.sm,
    minHeight: 40,
    justifyContent: 'center',
  },
  primary: { backgroundColor: colors.primary },
  quiet: { backgroundColor: colors.surface, borderWidth: 1, borderColor: colors.border },
  primaryLabel: { color: colors.onPrimary },
  quietLabel: { color: colors.primary },
});

/**
 * Link merges its own style into its child's by spreading objects, so the
 * child's style must be one flat object (no array, no function).
 */
export const linkStyles = {
  primary: StyleSheet.flatten([styles.base, styles.primary]),
  quiet: StyleSheet.flatten([styles.base, styles.quiet]),
};
