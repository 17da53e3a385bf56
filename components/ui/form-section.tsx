import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { boxMark } from './box-mark';
import { AppText } from './text';

/** A card with a heading, for a group of fields or a block of a detail page. */
export function Section({ title, hint, children, testID }: { title: string; hint?: string; children: ReactNode; testID?: string }) {
  return (
    <View style={styles.section} testID={testID} {...boxMark}>
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
