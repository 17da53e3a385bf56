import type { ReactNode } from 'react';
import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { useMe } from '@/components/api/auth';
import { BrandMark } from '@/components/shell/brand-mark';
import { colors, spacing } from '@/components/theme';
import { GradedStrip } from '@/components/ui/graded-strip';
import { ErrorState } from '@/components/ui/state-views';
import { AppText } from '@/components/ui/text';
import { SessionProvider } from './session';

function Splash() {
  return (
    <View style={styles.splash} accessibilityRole="progressbar" accessibilityLabel="Checking your session">
      <BrandMark />
      <View style={styles.strip}>
        <GradedStrip zones={8} thickness={3} />
      </View>
      <ActivityIndicator color={colors.coldBright} />
    </View>
  );
}

/**
 * Asks the API who is signed in (`GET /api/auth/me`) once at start and
 * provides the answer to every route. Which routes need a session is
 * decided by their group layouts: `(tabs)` sends the signed-out to
 * `/sign-in`, `(auth)` sends the signed-in home; `/join`, `/confirm-sign-up` and
 * `/reset-password` work either way.
 */
export function AuthGate({ children }: { children: ReactNode }) {
  const me = useMe();
  if (me.isPending) return <Splash />;
  // A failed re-check (say, on window focus while offline) keeps the last answer.
  if (me.data === undefined) {
    return (
      <View style={styles.failed}>
        <ErrorState
          title="Frostgrade is not answering"
          message={me.error?.message ?? 'No answer from the server.'}
          onRetry={() => void me.refetch()}
          retrying={me.isFetching}
        />
        <AppText variant="caption" tone="muted" style={styles.hint}>
          Your work is safe on the server; this page only could not reach it.
        </AppText>
      </View>
    );
  }
  return <SessionProvider session={me.data}>{children}</SessionProvider>;
}

const styles = StyleSheet.create({
  splash: {
    flex: 1,
    alignItems: 'center',
    justifyContent: 'center',
    gap: spacing.lg,
    backgroundColor: colors.chrome,
  },
  strip: { width: 160 },
  failed: { flex: 1, justifyContent: 'center', padding: spacing.xl, gap: spacing.md, backgroundColor: colors.background },
  hint: { textAlign: 'center' },
});
