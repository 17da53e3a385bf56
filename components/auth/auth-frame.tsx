import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';
import { useSafeAreaInsets } from 'react-native-safe-area-context';
import { BrandMark } from '@/components/shell/brand-mark';
import { useDocumentTitle } from '@/components/shell/document-title';
import { useIsWide } from '@/components/shell/use-is-wide';
import { colors, radii, spacing } from '@/components/theme';
import { GradedStrip } from '@/components/ui/graded-strip';
import { AppText } from '@/components/ui/text';

export type AuthFrameProps = {
  title: string;
  subtitle?: string;
  children: ReactNode;
  /** Links under the form ("New here? …"). */
  footer?: ReactNode;
};

/** A leg of seven zones, cold end up: the picture beside the forms on a wide screen. */
function LegPicture() {
  return (
    <View style={styles.picture} aria-hidden>
      <AppText variant="monoStrong" style={styles.end}>
        COLD END · LOAD
      </AppText>
      <View style={styles.leg}>
        <GradedStrip direction="column" zones={7} thickness={44} />
      </View>
      <AppText variant="monoStrong" style={styles.end}>
        HOT END · HEAT SINK
      </AppText>
    </View>
  );
}

function Story() {
  return (
    <View style={styles.story}>
      <BrandMark />
      <LegPicture />
      <View style={styles.pitch}>
        <AppText variant="heading" tone="inverse">
          Grade the doping for the whole leg, not for each slice.
        </AppText>
        <AppText style={styles.storyText}>
          Physicists search the profile, growers make it, and everyone on the team sees how the grown leg is
          predicted to cool.
        </AppText>
      </View>
    </View>
  );
}

/**
 * The page around the signed-out forms: on a wide screen a night-slate
 * panel with a graded leg beside the form, on a phone a slim brand bar.
 */
export function AuthFrame({ title, subtitle, children, footer }: AuthFrameProps) {
  // Signed-out pages stand outside the app's sections: "Sign in · Frostgrade".
  useDocumentTitle(title, null);
  const wide = useIsWide();
  const insets = useSafeAreaInsets();
  return (
    <View style={wide ? styles.wideRoot : styles.root}>
      {wide ? (
        <View style={styles.side}>
          <Story />
          <GradedStrip direction="column" zones={12} thickness={3} />
        </View>
      ) : (
        <View style={[styles.bar, { paddingTop: insets.top + spacing.md }]}>
          <BrandMark />
        </View>
      )}
      {wide ? null : <GradedStrip direction="row" zones={12} thickness={3} />}
      <ScrollView style={styles.scroll} contentContainerStyle={wide ? styles.centerWide : styles.center}>
        <View style={styles.column}>
          <View style={styles.headings}>
            <AppText variant="title" role="heading" aria-level={1}>
              {title}
            </AppText>
            {subtitle ? <AppText tone="muted">{subtitle}</AppText> : null}
          </View>
          <View style={styles.card}>{children}</View>
          {footer ? <View style={styles.footer}>{footer}</View> : null}
        </View>
      </ScrollView>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { flex: 1, backgroundColor: colors.background },
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: colors.background },
  side: { width: '40%', maxWidth: 480, flexDirection: 'row', backgroundColor: colors.chrome },
  story: { flex: 1, padding: spacing.xxl, gap: spacing.xxl, justifyContent: 'space-between' },
  picture: { alignItems: 'center', gap: spacing.sm },
  leg: { height: 210, flexDirection: 'row', borderRadius: 3, overflow: 'hidden' },
  end: { color: colors.chromeText },
  pitch: { gap: spacing.sm },
  storyText: { color: colors.chromeText },
  bar: { backgroundColor: colors.chrome, paddingHorizontal: spacing.lg, paddingBottom: spacing.md },
  scroll: { flex: 1 },
  center: { padding: spacing.lg, paddingTop: spacing.xl, paddingBottom: spacing.xxl },
  centerWide: { flexGrow: 1, justifyContent: 'center', padding: spacing.xxl },
  column: { width: '100%', maxWidth: 420, alignSelf: 'center', gap: spacing.lg },
  headings: { gap: spacing.xxs },
  card: {
    gap: spacing.lg,
    padding: spacing.lg,
    borderRadius: radii.lg,
    borderWidth: 1,
    borderColor: colors.border,
    backgroundColor: colors.surface,
  },
  footer: { gap: spacing.sm, paddingHorizontal: spacing.xs },
});
