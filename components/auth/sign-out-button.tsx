import { Pressable, StyleSheet } from 'react-native';
import { useSignOut } from '@/components/api/auth';
import { colors, radii, spacing } from '@/components/theme';
import { AppText } from '@/components/ui/text';

/** Ends the session; the auth gate then shows the sign-in page and every cache is dropped. */
export function SignOutButton({ onChrome = false, onDone }: { onChrome?: boolean; onDone?: () => void }) {
  const signOut = useSignOut();
  const busy = signOut.isPending;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityState={{ disabled: busy }}
      disabled={busy}
      testID="sign-out"
      onPress={() => signOut.mutate(undefined, { onSettled: onDone })}
      style={({ pressed }) => [
        styles.button,
        onChrome ? styles.chrome : styles.plain,
        pressed && (onChrome ? styles.chromePressed : styles.plainPressed),
      ]}
    >
      <AppText variant="label" style={onChrome ? styles.chromeLabel : styles.plainLabel}>
        {busy ? 'Signing out…' : 'Sign out'}
      </AppText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  button: {
    alignItems: 'center',
    justifyContent: 'center',
    minHeight: 38,
    borderRadius: radii.md,
    borderWidth: 1,
    paddingHorizontal: spacing.md,
  },
  chrome: { borderColor: colors.chromeRaised, backgroundColor: colors.chrome },
  chromePressed: { backgroundColor: colors.chromeRaised },
  plain: { borderColor: colors.border, backgroundColor: colors.surface },
  plainPressed: { backgroundColor: colors.surfaceSunken },
  chromeLabel: { color: colors.chromeTextActive },
  plainLabel: { color: colors.primary },
});
