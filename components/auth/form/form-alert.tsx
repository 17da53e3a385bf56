import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph, type GlyphName } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';

export type FormAlertTone = 'danger' | 'ok' | 'info';

const glyphs: Record<FormAlertTone, GlyphName> = { danger: 'cross', ok: 'check', info: 'ring' };
const ink: Record<FormAlertTone, string> = { danger: colors.danger, ok: colors.ok, info: colors.primary };

/** A message for a whole form: its kind said by a sign and a title, not by colour alone. */
export function FormAlert(props: { tone: FormAlertTone; title: string; children?: ReactNode; testID?: string }) {
  const { tone, title, children, testID } = props;
  return (
    <View style={[styles.box, boxes[tone]]} role={tone === 'danger' ? 'alert' : 'status'} testID={testID}>
      <View style={styles.titleRow}>
        <Glyph name={glyphs[tone]} color={ink[tone]} />
        <AppText variant="label" style={[styles.title, { color: ink[tone] }]}>
          {title}
        </AppText>
      </View>
      {typeof children === 'string' ? <AppText>{children}</AppText> : children}
    </View>
  );
}

/** What stopped the form that belongs to no field (e.g. "too many attempts"); nothing when there is none. */
export function FormProblem({ title, problem, testID }: { title: string; problem: string | null; testID?: string }) {
  if (!problem) return null;
  return (
    <FormAlert tone="danger" title={title} testID={testID}>
      {problem}
    </FormAlert>
  );
}

const styles = StyleSheet.create({
  box: { borderRadius: radii.md, borderWidth: 1, padding: spacing.md, gap: spacing.xs },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
  title: { flex: 1 },
});

const boxes = StyleSheet.create({
  danger: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
  ok: { backgroundColor: colors.okSoft, borderColor: colors.ok },
  info: { backgroundColor: colors.primarySoft, borderColor: colors.primary },
});
