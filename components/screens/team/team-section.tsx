import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

/** A card of the team page with its heading. */
export function TeamSection({ title, hint, children, testID }: { title: string; hint?: string; children: ReactNode; testID?: string }) {
  return (
    <View style={styles.section} testID={testID}>
      <View style={styles.heading}>
        <AppText variant="heading" role="heading" aria-level={2}>
          {title}
        </AppText>
        {hint ? <AppText tone="muted">{hint}</AppText> : null}
      </View>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  section: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    padding: spacing.lg,
    gap: spacing.lg,
  },
  heading: { gap: spacing.xxs },
});
