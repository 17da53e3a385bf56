import { Pressable, StyleSheet } from 'react-native';
import { Link, type Href } from 'expo-router';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';

export type BackTarget = { label: string; href: Href };

/** "‹ Materials": back up the stack to the parent page (or open it when there is no history). */
export function BackLink({ label, href }: BackTarget) {
  return (
    <Link href={href} dismissTo asChild>
      <Pressable style={styles.link} accessibilityLabel={`Back to ${label}`}>
        <Glyph name="chevron-left" color={colors.primary} />
        <AppText variant="label" tone="primary">
          {label}
        </AppText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: spacing.xxs,
    paddingVertical: spacing.xs,
    paddingRight: spacing.sm,
    borderRadius: radii.sm,
  },
});
