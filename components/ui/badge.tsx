import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from './text';

export type BadgeTone = 'neutral' | 'heat' | 'cold';

/** A short uppercase tag in mono type, e.g. a family kind or "demo data". */
export function Badge({ label, tone = 'neutral' }: { label: string; tone?: BadgeTone }) {
  return (
    <View style={[styles.badge, toneStyles[tone]]}>
      <AppText variant="monoStrong" style={textStyles[tone]}>
        {label.toUpperCase()}
      </AppText>
    </View>
  );
}

const styles = StyleSheet.create({
  badge: {
    alignSelf: 'flex-start',
    borderRadius: radii.sm,
    borderWidth: 1,
    paddingHorizontal: spacing.sm,
    paddingVertical: spacing.xxs,
  },
});

const toneStyles = StyleSheet.create({
  neutral: { borderColor: colors.border, backgroundColor: colors.surfaceSunken },
  heat: { borderColor: colors.heat, backgroundColor: colors.heatSoft },
  cold: { borderColor: colors.primary, backgroundColor: colors.primarySoft },
});

const textStyles = StyleSheet.create({
  neutral: { color: colors.textMuted },
  heat: { color: colors.heat },
  cold: { color: colors.primary },
});
