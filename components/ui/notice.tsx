import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph, type GlyphName } from './glyph';
import { boxMark } from './box-mark';
import { AppText } from './text';

export type NoticeTone = 'info' | 'warning' | 'danger' | 'ok';

const toneGlyph: Record<NoticeTone, GlyphName> = { info: 'ring', warning: 'bang', danger: 'cross', ok: 'check' };
const toneWord: Record<NoticeTone, string> = { info: 'Note', warning: 'Warning', danger: 'Error', ok: 'Ready' };

/** A boxed message whose kind is said with a sign and a word, not colour alone. */
export function Notice({ tone, title, children, testID }: { tone: NoticeTone; title?: string; children?: ReactNode; testID?: string }) {
  const color = toneColor[tone];
  return (
    <View style={[styles.box, toneBox[tone]]} role={tone === 'danger' ? 'alert' : 'note'} testID={testID} {...boxMark}>
      <View style={styles.titleRow}>
        <Glyph name={toneGlyph[tone]} color={color} />
        <AppText variant="label" style={{ color }}>
          {title ?? toneWord[tone]}
        </AppText>
      </View>
      {children}
    </View>
  );
}

const toneColor: Record<NoticeTone, string> = {
  info: colors.primary,
  warning: colors.heat,
  danger: colors.danger,
  ok: colors.ok,
};

const styles = StyleSheet.create({
  box: { borderRadius: radii.md, borderWidth: 1, padding: spacing.md, gap: spacing.xs },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs },
});

const toneBox = StyleSheet.create({
  info: { backgroundColor: colors.primarySoft, borderColor: colors.primary },
  warning: { backgroundColor: colors.heatSoft, borderColor: colors.heat },
  danger: { backgroundColor: colors.dangerSoft, borderColor: colors.danger },
  ok: { backgroundColor: colors.okSoft, borderColor: colors.ok },
});
