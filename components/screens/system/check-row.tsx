import { StyleSheet, View } from 'react-native';
import type { HealthCheck } from '@/shared/api/health';
import { colors, radii, spacing } from '@/components/theme';
import { Glyph } from '@/components/ui/glyph';
import { AppText } from '@/components/ui/text';

export type CheckRowProps = { label: string; check: HealthCheck };

/** One dependency: a sign, a word ("Working" / "Problem") and the detail. */
export function CheckRow({ label, check }: CheckRowProps) {
  const color = check.ok ? colors.ok : colors.danger;
  return (
    <View style={styles.row} role="listitem" aria-label={`${label}: ${check.ok ? 'working' : 'problem'}`}>
      <View style={[styles.sign, check.ok ? styles.signOk : styles.signBad]}>
        <Glyph name={check.ok ? 'check' : 'cross'} color={color} />
      </View>
      <View style={styles.text}>
        <View style={styles.titleLine}>
          <AppText variant="bodyStrong">{label}</AppText>
          <AppText variant="label" tone={check.ok ? 'ok' : 'danger'}>
            {check.ok ? 'Working' : 'Problem'}
          </AppText>
        </View>
        <AppText variant="mono" tone="muted">
          {check.detail}
        </AppText>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    flexDirection: 'row',
    alignItems: 'flex-start',
    gap: spacing.md,
    paddingVertical: spacing.md,
    paddingHorizontal: spacing.lg,
  },
  sign: {
    width: 28,
    height: 28,
    borderRadius: radii.pill,
    alignItems: 'center',
    justifyContent: 'center',
  },
  signOk: { backgroundColor: colors.okSoft },
  signBad: { backgroundColor: colors.dangerSoft },
  text: { flex: 1, gap: spacing.xxs },
  titleLine: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm, alignItems: 'baseline' },
});
