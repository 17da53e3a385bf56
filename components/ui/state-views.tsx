import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { Button } from './button';
import { Glyph } from './glyph';
import { AppText } from './text';

export function LoadingState({ label }: { label: string }) {
  return (
    <View style={styles.box} accessibilityRole="progressbar" accessibilityLabel={label}>
      <ActivityIndicator color={colors.primary} />
      <AppText tone="muted">{label}</AppText>
    </View>
  );
}

export function EmptyState({ title, body }: { title: string; body: string }) {
  return (
    <View style={[styles.box, styles.panel]}>
      <Glyph name="ring" color={colors.textFaint} />
      <AppText variant="heading">{title}</AppText>
      <AppText tone="muted" style={styles.centered}>
        {body}
      </AppText>
    </View>
  );
}

export type ErrorStateProps = {
  title: string;
  message: string;
  onRetry?: () => void;
  retrying?: boolean;
};

/** A failed load: what failed, the API's own message, and a way to retry. */
export function ErrorState({ title, message, onRetry, retrying = false }: ErrorStateProps) {
  return (
    <View style={[styles.box, styles.panel, styles.errorPanel]} accessibilityRole="alert">
      <View style={styles.titleRow}>
        <Glyph name="cross" color={colors.danger} />
        <AppText variant="heading" tone="danger">
          {title}
        </AppText>
      </View>
      <AppText style={styles.centered}>{message}</AppText>
      {onRetry ? (
        <Button
          label={retrying ? 'Trying again…' : 'Try again'}
          onPress={onRetry}
          disabled={retrying}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.md,
    paddingVertical: spacing.xxl,
    paddingHorizontal: spacing.xl,
  },
  panel: {
    backgroundColor: colors.surface,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
  },
  errorPanel: { borderColor: colors.danger, backgroundColor: colors.dangerSoft },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  centered: { textAlign: 'center', maxWidth: 480 },
});
