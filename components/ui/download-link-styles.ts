import { StyleSheet } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';

/** Shared by the device and web download links: a quiet, outlined button. */
export const downloadLinkStyles = StyleSheet.create({
  link: {
    alignSelf: 'flex-start',
    borderRadius: radii.md,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
    paddingHorizontal: spacing.lg,
    paddingVertical: spacing.sm,
    minHeight: 40,
    justifyContent: 'center',
  },
  pressed: { backgroundColor: colors.surfaceSunken },
});
